import type { TriMesh } from "../mesh";
import { GeometryError } from "../errors";
import { requireInteger, requirePositive } from "./check-params";

export interface FlatGridOptions {
  /** wanted number of triangles (the result has 2·n·n ≈ faces with n = round(√(faces/2))), ≥ 2 */
  faces: number;
  /** side length of the square, units; default 1 */
  size?: number;
  /**
   * height of a smooth bump z = bump·sin(πx/size)·sin(πy/size), units; default 0 (planar). A bump makes the piece
   * non-developable so the length-preserving refinement has work to do (benchmarks).
   */
  bump?: number;
}

/**
 * Square grid in the xy plane from (0, 0) to (size, size), normals +z, alternating diagonals so the mesh has no
 * preferred direction. Vertex (column i, row r) = r·(n + 1) + i. A topological disk: used for benchmarks (10k,
 * 100k, 1M faces) and for planar reproduction tests.
 */
export function flatGrid(opts: FlatGridOptions): TriMesh {
  requireInteger("faces", opts.faces, 2);
  const size = opts.size ?? 1;
  const bump = opts.bump ?? 0;
  requirePositive("size", size);
  if (!Number.isFinite(bump)) throw new GeometryError("BAD_PARAMETER", `bump must be a finite number (got ${bump}).`);
  const n = Math.max(1, Math.round(Math.sqrt(opts.faces / 2)));
  const m = n + 1;
  const positions = new Float64Array(3 * m * m);
  for (let r = 0; r < m; r++) {
    for (let i = 0; i < m; i++) {
      const v = r * m + i;
      const x = (i / n) * size, y = (r / n) * size;
      positions[3 * v] = x;
      positions[3 * v + 1] = y;
      positions[3 * v + 2] = bump === 0 ? 0 : bump * Math.sin((Math.PI * x) / size) * Math.sin((Math.PI * y) / size);
    }
  }
  const triangles = new Uint32Array(6 * n * n);
  let f = 0;
  for (let r = 0; r < n; r++) {
    for (let i = 0; i < n; i++) {
      const a = r * m + i, b = a + 1, c = a + m + 1, d = a + m;
      if ((r + i) & 1) {
        triangles[f++] = a; triangles[f++] = b; triangles[f++] = d;
        triangles[f++] = b; triangles[f++] = c; triangles[f++] = d;
      } else {
        triangles[f++] = a; triangles[f++] = b; triangles[f++] = c;
        triangles[f++] = a; triangles[f++] = c; triangles[f++] = d;
      }
    }
  }
  return { positions, triangles };
}
