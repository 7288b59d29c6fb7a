/**
 * Each triangle in its own plane: corner 0 at (0, 0), corner 1 at (a, 0) on the +x axis, corner 2 at (bx, by)
 * with by ≥ 0. Also the three corner cotangents and the area. Everything downstream (cotan weights, LSCM, ARAP,
 * stretch) works from these, so results are invariant under rigid motions of the 3D mesh by construction.
 */
export interface TriangleFrames {
  /** #F×3 (a, bx, by) per triangle, units */
  local: Float64Array;
  /** #F×3 cotangent of the interior angle at corner k (opposite the edge from corner k+1 to k+2) */
  cot: Float64Array;
  /** #F triangle areas, units² */
  area: Float64Array;
}

/**
 * Cotangents are cot θ = (u·v)/|u×v|. A sliver with |u×v| below 1e−12 of its longest edge² is given that floor so
 * its weights stay finite (intake drops exact degenerates; this only guards near-degenerates).
 *
 * @param positions #V×3 positions, units
 * @param triangles #F×3 vertex indices
 */
export function triangleFrames(positions: Float64Array, triangles: Uint32Array): TriangleFrames {
  const nf = triangles.length / 3;
  const local = new Float64Array(3 * nf);
  const cot = new Float64Array(3 * nf);
  const area = new Float64Array(nf);
  for (let f = 0; f < nf; f++) {
    const i0 = 3 * triangles[3 * f], i1 = 3 * triangles[3 * f + 1], i2 = 3 * triangles[3 * f + 2];
    const e1x = positions[i1] - positions[i0], e1y = positions[i1 + 1] - positions[i0 + 1], e1z = positions[i1 + 2] - positions[i0 + 2];
    const e2x = positions[i2] - positions[i0], e2y = positions[i2 + 1] - positions[i0 + 1], e2z = positions[i2 + 2] - positions[i0 + 2];
    const a = Math.sqrt(e1x * e1x + e1y * e1y + e1z * e1z);
    const bx = a > 0 ? (e1x * e2x + e1y * e2y + e1z * e2z) / a : 0;
    const cx = e1y * e2z - e1z * e2y, cy = e1z * e2x - e1x * e2z, cz = e1x * e2y - e1y * e2x;
    const twiceArea = Math.sqrt(cx * cx + cy * cy + cz * cz);
    const by = a > 0 ? twiceArea / a : 0;
    local[3 * f] = a; local[3 * f + 1] = bx; local[3 * f + 2] = by;
    area[f] = twiceArea / 2;
    // local corners q0 = (0,0), q1 = (a,0), q2 = (bx,by)
    const l01 = a * a, l02 = bx * bx + by * by, l12 = (bx - a) * (bx - a) + by * by;
    const floor = 1e-12 * Math.max(l01, l02, l12);
    const c2 = Math.max(a * by, floor);
    cot[3 * f] = (a * bx) / c2; // at q0: (q1−q0)·(q2−q0)
    cot[3 * f + 1] = (-a * (bx - a)) / c2; // at q1: (q0−q1)·(q2−q1)
    cot[3 * f + 2] = (-bx * (a - bx) + by * by) / c2; // at q2: (q0−q2)·(q1−q2)
  }
  return { local, cot, area };
}
