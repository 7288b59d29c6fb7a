import type { TriMesh } from "../mesh";
import { requireInteger, requirePositive } from "./check-params";

export interface UvSphereOptions {
  /** radius, units; centre at the origin */
  radius: number;
  /** latitude bands from pole to pole, ≥ 2 */
  latitudeBands: number;
  /** longitude segments around the axis, ≥ 3 */
  longitudeSegments: number;
}

/**
 * Closed UV sphere, axis +z. Vertex 0 is the north pole (0, 0, R), the last vertex the south pole; ring k
 * (1…B−1) at polar angle πk/B holds vertices 1 + (k−1)·S + j at longitude 2πj/S. Meridian j is the vertex chain
 * north pole, 1 + j, 1 + S + j, …, south pole. Outward normals.
 *
 * @returns #V = S·(B−1) + 2, #F = 2·S·(B−1)
 */
export function uvSphere(opts: UvSphereOptions): TriMesh {
  const { radius, latitudeBands: bands, longitudeSegments: s } = opts;
  requirePositive("radius", radius);
  requireInteger("latitudeBands", bands, 2);
  requireInteger("longitudeSegments", s, 3);
  const nv = s * (bands - 1) + 2;
  const south = nv - 1;
  const positions = new Float64Array(3 * nv);
  positions[2] = radius;
  positions[3 * south + 2] = -radius;
  for (let k = 1; k < bands; k++) {
    const theta = (Math.PI * k) / bands;
    for (let j = 0; j < s; j++) {
      const phi = (2 * Math.PI * j) / s;
      const v = 1 + (k - 1) * s + j;
      positions[3 * v] = radius * Math.sin(theta) * Math.cos(phi);
      positions[3 * v + 1] = radius * Math.sin(theta) * Math.sin(phi);
      positions[3 * v + 2] = radius * Math.cos(theta);
    }
  }
  const triangles = new Uint32Array(6 * s * (bands - 1));
  let f = 0;
  const ring = (k: number, j: number) => 1 + (k - 1) * s + (j % s);
  for (let j = 0; j < s; j++) {
    triangles[f++] = 0; triangles[f++] = ring(1, j); triangles[f++] = ring(1, j + 1);
  }
  for (let k = 1; k < bands - 1; k++) {
    for (let j = 0; j < s; j++) {
      const d = ring(k, j), c = ring(k, j + 1), a = ring(k + 1, j), b = ring(k + 1, j + 1);
      triangles[f++] = a; triangles[f++] = b; triangles[f++] = c;
      triangles[f++] = a; triangles[f++] = c; triangles[f++] = d;
    }
  }
  for (let j = 0; j < s; j++) {
    triangles[f++] = south; triangles[f++] = ring(bands - 1, j + 1); triangles[f++] = ring(bands - 1, j);
  }
  return { positions, triangles };
}
