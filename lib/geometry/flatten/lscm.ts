import { GeometryError } from "../errors";
import type { SolverStats } from "../report-types";
import { entryIndex } from "../sparse/csr-matrix";
import { factorHermitian, solveHermitianRefined } from "../sparse/ldlt-hermitian";
import { csrFromTriplets, TripletList } from "../sparse/triplets";
import type { TriangleFrames } from "./triangle-frames";

export interface LscmResult {
  /** #V×2 flat positions, scaled so the total flat area equals the 3D area, pin 0 at the origin */
  uv: Float64Array;
  /** the two pinned vertices (local ids) */
  pins: [number, number];
  solver: SolverStats;
  /** non-zeros of the Cholesky factor (fill) */
  factorNonZeros: number;
}

/**
 * Least squares conformal map (Lévy, Petitjean, Ray & Maillot 2002, "Least Squares Conformal Maps for Automatic
 * Texture Atlas Generation", SIGGRAPH). The conformal energy is assembled in its equivalent form
 * E_C(u, v) = E_D(u) + E_D(v) − A(u, v): Dirichlet energy (cotan Laplacian) minus the signed area of the image,
 * which depends only on boundary vertices (Mullen, Tong, Alliez & Desbrun 2008, "Spectral Conformal
 * Parameterization", §3; Hutchinson 1991). The 2V×2V real system is the real form of a V×V complex Hermitian
 * one, z = u + i·v, which is what is factorised (LDLᴴ, nested-dissection vertex order). Two far-apart boundary
 * vertices are pinned at (0, 0) and (d, 0), d their 3D distance; the reduced positive definite system is solved
 * directly with iterative refinement. Finally the map is scaled by √(A3D / A2D) so
 * total flat area = 3D area (the conformal map fixes shape, not size).
 *
 * @param positions #V×3 (only for choosing pins)
 * @param triangles #F×3
 * @param frames per-triangle frames and cotangents
 * @param boundary boundary loop (local vertex chain, hole on the left, i.e. clockwise around the piece)
 * @param order perm[new] = old vertex (fill-reducing)
 */
export function lscm(
  positions: Float64Array,
  triangles: Uint32Array,
  frames: TriangleFrames,
  boundary: Uint32Array,
  order: Uint32Array,
): LscmResult {
  const t0 = performance.now();
  const nv = positions.length / 3;
  const nf = triangles.length / 3;
  if (boundary.length < 3) throw new GeometryError("BAD_PARAMETER", "LSCM needs a piece with a boundary loop of at least 3 vertices.");
  // pins: double sweep over boundary vertices by 3D distance
  const farFrom = (v: number) => {
    let best = boundary[0], bd = -1;
    for (let i = 0; i < boundary.length; i++) {
      const w = boundary[i];
      const dx = positions[3 * w] - positions[3 * v], dy = positions[3 * w + 1] - positions[3 * v + 1], dz = positions[3 * w + 2] - positions[3 * v + 2];
      const d = dx * dx + dy * dy + dz * dz;
      if (d > bd) { bd = d; best = w; }
    }
    return { v: best, d: Math.sqrt(bd) };
  };
  const p0 = farFrom(boundary[0]).v;
  const far = farFrom(p0);
  const p1 = far.v;
  // complex unknown z = u + i·v per vertex; pins z_p0 = 0, z_p1 = d
  const pinnedRe = new Float64Array(nv);
  pinnedRe[p1] = far.d;
  const freeIndex = new Int32Array(nv).fill(-1);
  let nFree = 0;
  for (let k = 0; k < nv; k++) {
    const v = order[k];
    if (v !== p0 && v !== p1) freeIndex[v] = nFree++;
  }
  // H = L + i·A': L the cotan Laplacian (w = ½cot per corner), A' from the area term. With x = (u, v) the real
  // form of H is [[L, −A'], [A', L]]; −A(u, v) = −½ Σ_ccw edges i→j (u_i v_j − u_j v_i) gives A'_ij = ½, A'_ji = −½.
  const trip = new TripletList(12 * nf + 2 * boundary.length);
  const rhsRe = new Float64Array(nFree), rhsIm = new Float64Array(nFree);
  const cot = frames.cot;
  for (let f = 0; f < nf; f++) {
    for (let k = 0; k < 3; k++) {
      const i = triangles[3 * f + ((k + 1) % 3)], j = triangles[3 * f + ((k + 2) % 3)];
      const w = 0.5 * cot[3 * f + k];
      const fi = freeIndex[i], fj = freeIndex[j];
      if (fi >= 0) trip.add(fi, fi, w);
      if (fj >= 0) trip.add(fj, fj, w);
      if (fi >= 0 && fj >= 0) { trip.add(fi, fj, -w); trip.add(fj, fi, -w); }
      else if (fi >= 0) rhsRe[fi] += w * pinnedRe[j];
      else if (fj >= 0) rhsRe[fj] += w * pinnedRe[i];
    }
  }
  const re = csrFromTriplets(nFree, trip);
  const im = new Float64Array(re.values.length);
  // the boundary runs clockwise (hole on the left); the counter-clockwise edge i → j is reversed chain order
  const nb = boundary.length;
  for (let s = 0; s < nb; s++) {
    const j = boundary[s], i = boundary[(s + 1) % nb];
    const fi = freeIndex[i], fj = freeIndex[j];
    if (fi >= 0 && fj >= 0) {
      im[entryIndex(re, fi, fj)] += 0.5;
      im[entryIndex(re, fj, fi)] -= 0.5;
    } else if (fi >= 0) {
      rhsIm[fi] -= 0.5 * pinnedRe[j]; // b_i −= (i·½)·z_j
    } else if (fj >= 0) {
      rhsIm[fj] += 0.5 * pinnedRe[i]; // b_j −= (−i·½)·z_i
    }
  }
  const h = { re, im };
  const factor = factorHermitian(h);
  const zr = new Float64Array(nFree), zi = new Float64Array(nFree);
  const stats = solveHermitianRefined(h, factor, rhsRe, rhsIm, zr, zi);
  const uv = new Float64Array(2 * nv);
  for (let v = 0; v < nv; v++) {
    const fi = freeIndex[v];
    if (fi >= 0) { uv[2 * v] = zr[fi]; uv[2 * v + 1] = zi[fi]; }
    else { uv[2 * v] = pinnedRe[v]; uv[2 * v + 1] = 0; }
  }
  // scale to the 3D area
  let a2 = 0, a3 = 0;
  for (let f = 0; f < nf; f++) {
    const i0 = 2 * triangles[3 * f], i1 = 2 * triangles[3 * f + 1], i2 = 2 * triangles[3 * f + 2];
    a2 += 0.5 * ((uv[i1] - uv[i0]) * (uv[i2 + 1] - uv[i0 + 1]) - (uv[i2] - uv[i0]) * (uv[i1 + 1] - uv[i0 + 1]));
    a3 += frames.area[f];
  }
  if (!(Math.abs(a2) > 0) || !Number.isFinite(a2)) {
    throw new GeometryError("SOLVER_FAILED", "The conformal map collapsed to zero area; the piece may be degenerate.");
  }
  const scale = Math.sqrt(a3 / Math.abs(a2));
  for (let d = 0; d < 2 * nv; d++) uv[d] *= scale;
  stats.ms = performance.now() - t0;
  return { uv, pins: [p0, p1], solver: stats, factorNonZeros: factor.nnzL };
}
