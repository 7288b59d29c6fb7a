import type { TriMesh } from "../mesh";
import { requireInteger, requirePositive } from "./check-params";

export interface CubeOptions {
  /** edge length, units; centred at the origin */
  size: number;
  /** grid cells per cube edge, ≥ 1; default 1 (8 vertices, 12 triangles) */
  subdivisions?: number;
}

/**
 * Closed cube surface, welded (shared vertices along edges and corners), outward normals. With subdivisions = 1
 * the vertices are the corners, index = 4·ix + 2·iy + iz for ix, iy, iz ∈ {0, 1} (coordinate −size/2 or +size/2).
 */
export function cube(opts: CubeOptions): TriMesh {
  const size = opts.size;
  const n = opts.subdivisions ?? 1;
  requirePositive("size", size);
  requireInteger("subdivisions", n, 1);
  const m = n + 1;
  const index = new Int32Array(m * m * m).fill(-1);
  const pos: number[] = [];
  const tri: number[] = [];
  const vid = (i: number, j: number, k: number): number => {
    const key = (i * m + j) * m + k;
    if (index[key] < 0) {
      index[key] = pos.length / 3;
      pos.push((i / n - 0.5) * size, (j / n - 0.5) * size, (k / n - 0.5) * size);
    }
    return index[key];
  };
  if (n === 1) {
    for (let i = 0; i < 2; i++) for (let j = 0; j < 2; j++) for (let k = 0; k < 2; k++) vid(i, j, k);
  }
  // each face: fixed axis `ax` at level 0 or n; tangent axes (t1, t2) with t1 × t2 = outward normal
  const faces: [number, number, number, number][] = [
    [0, n, 1, 2], [0, 0, 2, 1], [1, n, 2, 0], [1, 0, 0, 2], [2, n, 0, 1], [2, 0, 1, 0],
  ];
  const c = [0, 0, 0];
  const at = (ax: number, lvl: number, t1: number, a: number, t2: number, b: number) => {
    c[ax] = lvl; c[t1] = a; c[t2] = b;
    return vid(c[0], c[1], c[2]);
  };
  for (const [ax, lvl, t1, t2] of faces) {
    for (let a = 0; a < n; a++) {
      for (let b = 0; b < n; b++) {
        const p00 = at(ax, lvl, t1, a, t2, b);
        const p10 = at(ax, lvl, t1, a + 1, t2, b);
        const p11 = at(ax, lvl, t1, a + 1, t2, b + 1);
        const p01 = at(ax, lvl, t1, a, t2, b + 1);
        tri.push(p00, p10, p11, p00, p11, p01);
      }
    }
  }
  return { positions: new Float64Array(pos), triangles: new Uint32Array(tri) };
}
