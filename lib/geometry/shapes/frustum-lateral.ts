import type { TriMesh } from "../mesh";
import { requireInteger, requirePositive } from "./check-params";

export interface FrustumOptions {
  /** radius of the bottom ring (z = 0), units */
  r1: number;
  /** radius of the top ring (z = height), units */
  r2: number;
  /** distance between the two rings along z, units */
  height: number;
  /** segments around (the rings are regular N-gons), ≥ 3 */
  segments: number;
  /** bands along the height (vertex rings = bands + 1), ≥ 1; default 1 */
  bands?: number;
}

/**
 * Open lateral surface of a frustum of a right circular cone (no caps), axis = +z, bottom ring at z = 0.
 * Vertex (ring i, segment j) has index i·N + j and angle 2πj/N; every quad is split into two planar triangles,
 * so the mesh is exactly developable. Triangles are counter-clockwise seen from outside (normals point away from
 * the axis).
 *
 * @returns #V = N·(bands+1), #F = 2·N·bands
 */
export function frustumLateral(opts: FrustumOptions): TriMesh {
  const { r1, r2, height, segments: n } = opts;
  const bands = opts.bands ?? 1;
  requirePositive("r1", r1);
  requirePositive("r2", r2);
  requirePositive("height", height);
  requireInteger("segments", n, 3);
  requireInteger("bands", bands, 1);
  const positions = new Float64Array(3 * n * (bands + 1));
  for (let i = 0; i <= bands; i++) {
    const t = i / bands;
    const r = r1 + (r2 - r1) * t;
    for (let j = 0; j < n; j++) {
      const a = (2 * Math.PI * j) / n;
      const v = i * n + j;
      positions[3 * v] = r * Math.cos(a);
      positions[3 * v + 1] = r * Math.sin(a);
      positions[3 * v + 2] = height * t;
    }
  }
  const triangles = new Uint32Array(6 * n * bands);
  let f = 0;
  for (let i = 0; i < bands; i++) {
    for (let j = 0; j < n; j++) {
      const a = i * n + j;
      const b = i * n + ((j + 1) % n);
      const c = b + n;
      const d = a + n;
      triangles[f++] = a; triangles[f++] = b; triangles[f++] = c;
      triangles[f++] = a; triangles[f++] = c; triangles[f++] = d;
    }
  }
  return { positions, triangles };
}
