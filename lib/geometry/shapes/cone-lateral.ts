import type { TriMesh } from "../mesh";
import { requireInteger, requirePositive } from "./check-params";

export interface ConeOptions {
  /** base ring radius (circumradius of the N-gon), units; the base ring lies in z = 0 */
  radius: number;
  /** apex height above the base, units; apex at (0, 0, height) */
  height: number;
  /** segments around, ≥ 3 */
  segments: number;
  /** bands from apex to base (vertex rings = bands, plus the apex), ≥ 1; default 1 */
  bands?: number;
}

/**
 * Lateral surface of a right circular cone (no base cap). Vertex 0 is the apex; ring i (1…bands) has radius
 * radius·i/bands, vertex 1 + (i−1)·N + j at angle 2πj/N. All quads between rings are planar (they lie in the
 * plane of one apex triangle), so the mesh is exactly developable. Outward normals.
 */
export function coneLateral(opts: ConeOptions): TriMesh {
  const { radius, height, segments: n } = opts;
  const bands = opts.bands ?? 1;
  requirePositive("radius", radius);
  requirePositive("height", height);
  requireInteger("segments", n, 3);
  requireInteger("bands", bands, 1);
  const positions = new Float64Array(3 * (1 + n * bands));
  positions[2] = height;
  for (let i = 1; i <= bands; i++) {
    const t = i / bands;
    for (let j = 0; j < n; j++) {
      const a = (2 * Math.PI * j) / n;
      const v = 1 + (i - 1) * n + j;
      positions[3 * v] = radius * t * Math.cos(a);
      positions[3 * v + 1] = radius * t * Math.sin(a);
      positions[3 * v + 2] = height * (1 - t);
    }
  }
  const triangles = new Uint32Array(3 * n * (2 * bands - 1));
  let f = 0;
  for (let j = 0; j < n; j++) {
    triangles[f++] = 0; triangles[f++] = 1 + j; triangles[f++] = 1 + ((j + 1) % n);
  }
  for (let i = 1; i < bands; i++) {
    for (let j = 0; j < n; j++) {
      // ring i is above ring i+1
      const d = 1 + (i - 1) * n + j;
      const c = 1 + (i - 1) * n + ((j + 1) % n);
      const a = d + n;
      const b = c + n;
      triangles[f++] = a; triangles[f++] = b; triangles[f++] = c;
      triangles[f++] = a; triangles[f++] = c; triangles[f++] = d;
    }
  }
  return { positions, triangles };
}
