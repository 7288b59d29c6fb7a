import type { StretchMetrics } from "../report-types";
import { weightedPercentile } from "./weighted-percentile";

/**
 * Per-triangle singular values s1 ≥ s2 ≥ 0 of the Jacobian J of the affine map from the triangle (in its own
 * plane, see triangleFrames) to its flat image. s = 1 is length-preserving; s1 > 1 stretch, s2 < 1 compression.
 * Closed form for 2×2 matrices: with E = (J11+J22)/2, F = (J11−J22)/2, G = (J21+J12)/2, H = (J21−J12)/2,
 * s1 = √(E²+H²) + √(F²+G²), s2 = |√(E²+H²) − √(F²+G²)| (Blinn 1996, "Consider the lowly 2×2 matrix").
 *
 * @param local #F×3 triangle frames (a, bx, by)
 * @param triangles #F×3
 * @param uv #V×2 flat positions
 * @param s1 #F output, s2 #F output
 * @returns number of flipped triangles (signed area of the image ≤ 0)
 */
export function triangleSingularValues(
  local: Float64Array, triangles: Uint32Array, uv: Float64Array, s1: Float64Array, s2: Float64Array,
): number {
  const nf = triangles.length / 3;
  let flipped = 0;
  for (let f = 0; f < nf; f++) {
    const i0 = 2 * triangles[3 * f], i1 = 2 * triangles[3 * f + 1], i2 = 2 * triangles[3 * f + 2];
    const a = local[3 * f], bx = local[3 * f + 1], by = local[3 * f + 2];
    const du1 = uv[i1] - uv[i0], dv1 = uv[i1 + 1] - uv[i0 + 1];
    const du2 = uv[i2] - uv[i0], dv2 = uv[i2 + 1] - uv[i0 + 1];
    const ia = a > 0 ? 1 / a : 0, iby = by > 0 ? 1 / by : 0;
    const j11 = du1 * ia, j21 = dv1 * ia;
    const j12 = (du2 - du1 * bx * ia) * iby, j22 = (dv2 - dv1 * bx * ia) * iby;
    const e = (j11 + j22) / 2, ff = (j11 - j22) / 2, g = (j21 + j12) / 2, h = (j21 - j12) / 2;
    const q = Math.sqrt(e * e + h * h), r = Math.sqrt(ff * ff + g * g);
    s1[f] = q + r;
    s2[f] = Math.abs(q - r);
    if (!(du1 * dv2 - du2 * dv1 > 0)) flipped++;
  }
  return flipped;
}

/**
 * Aggregates per-triangle singular values into StretchMetrics (area-weighted where the report says so).
 * @param area #F 3D triangle areas (weights)
 */
export function stretchMetrics(s1: Float64Array, s2: Float64Array, area: Float64Array, flipped: number): StretchMetrics {
  const nf = s1.length;
  let maxS1 = 0, minS2 = Infinity, maxConf = 1, sumConf = 0, sumA = 0;
  for (let f = 0; f < nf; f++) {
    if (s1[f] > maxS1) maxS1 = s1[f];
    if (s2[f] < minS2) minS2 = s2[f];
    const c = s2[f] > 0 ? s1[f] / s2[f] : Infinity;
    if (c > maxConf) maxConf = c;
    sumConf += area[f] * c;
    sumA += area[f];
  }
  return {
    maxStretch: maxS1 - 1,
    p95Stretch: nf > 0 ? weightedPercentile(s1, area, 0.95) - 1 : 0,
    maxCompress: nf > 0 ? 1 - minS2 : 0,
    meanConformal: sumA > 0 ? sumConf / sumA : 1,
    maxConformal: maxConf,
    flippedTriangles: flipped,
  };
}
