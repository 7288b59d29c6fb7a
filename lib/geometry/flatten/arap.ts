import type { SolverStats } from "../report-types";
import type { CsrMatrix } from "../sparse/csr-matrix";
import { factorLdlt, solveLdltPair, type LdltFactor } from "../sparse/ldlt";
import { csrFromTriplets, TripletList } from "../sparse/triplets";
import type { TriangleFrames } from "./triangle-frames";

export interface ArapOptions {
  /** iteration cap; default 100 */
  maxIterations?: number;
  /** stop when |E_prev − E| ≤ tolerance·E_prev; default 1e−5 */
  tolerance?: number;
  /** reject or shorten steps that flip triangles; default true (false only to measure what the guard prevents) */
  flipGuard?: boolean;
  /**
   * The global-step system from arapSystem (same triangles, frames, order) and its factor, e.g. started early on
   * another thread (factorLdltInThread); both are computed here when omitted.
   */
  prepared?: { system: ArapSystem; factor: { join(): LdltFactor } };
}

/** Global-step system of the refinement: cotan Laplacian with one vertex pinned, rows in fill-reducing order. */
export interface ArapSystem {
  /** the pinned vertex: the last one in the fill-reducing order */
  pin: number;
  /** #V: row of each vertex, −1 for the pin */
  freeIndex: Int32Array;
  /** the pinned Laplacian, (#V−1)×(#V−1) */
  lap: CsrMatrix;
  /** L_{i,pin} per free row */
  pinCoupling: Float64Array;
  /** Σ |w|·|Δx|² over corners (units²), for an absolute stopping floor */
  scaleRef: number;
}

/**
 * Assembles the ARAP global-step matrix. It depends on the 3D geometry only (not on the start map), so it can be
 * built and factorised before or while LSCM runs.
 *
 * @param triangles #F×3
 * @param frames triangle frames and cotangents
 * @param order perm[new] = old vertex (fill-reducing)
 */
export function arapSystem(triangles: Uint32Array, frames: TriangleFrames, order: Uint32Array): ArapSystem {
  const nv = order.length;
  const nf = triangles.length / 3;
  const { local, cot } = frames;
  const pin = order[nv - 1];
  const freeIndex = new Int32Array(nv).fill(-1);
  let nFree = 0;
  for (let k = 0; k < nv; k++) if (order[k] !== pin) freeIndex[order[k]] = nFree++;
  const trip = new TripletList(12 * nf);
  const pinCoupling = new Float64Array(nFree);
  let scaleRef = 0;
  for (let f = 0; f < nf; f++) {
    const a = local[3 * f], bx = local[3 * f + 1], by = local[3 * f + 2];
    for (let k = 0; k < 3; k++) {
      const i = triangles[3 * f + ((k + 1) % 3)], j = triangles[3 * f + ((k + 2) % 3)];
      const w = 0.5 * cot[3 * f + k];
      const fi = freeIndex[i], fj = freeIndex[j];
      if (fi >= 0) trip.add(fi, fi, w);
      if (fj >= 0) trip.add(fj, fj, w);
      if (fi >= 0 && fj >= 0) { trip.add(fi, fj, -w); trip.add(fj, fi, -w); }
      else if (fi >= 0) pinCoupling[fi] -= w;
      else if (fj >= 0) pinCoupling[fj] -= w;
      const ex = k === 0 ? bx - a : k === 1 ? -bx : a, ey = k === 0 ? by : k === 1 ? -by : 0;
      scaleRef += Math.abs(w) * (ex * ex + ey * ey);
    }
  }
  return { pin, freeIndex, lap: csrFromTriplets(nFree, trip), pinCoupling, scaleRef };
}

export interface ArapResult {
  /** #V×2 refined flat positions */
  uv: Float64Array;
  solver: SolverStats;
  /** ARAP energy at the start (LSCM input) and at exit, units² */
  initialEnergy: number;
  energy: number;
  /** energy / Σ_t area_t: dimensionless, scale-free (reported as solver.residual) */
  relativeEnergy: number;
  /** iterations whose step had to be shortened (or rejected) to avoid flipping triangles */
  backtracks: number;
  /** flipped triangles in the result (never more than in the input) */
  flipped: number;
}

/** Signed-area test: number of triangles with non-positive area in uv. */
export function countFlips(triangles: Uint32Array, uv: Float64Array): number {
  let n = 0;
  for (let f = 0; f < triangles.length; f += 3) {
    const i0 = 2 * triangles[f], i1 = 2 * triangles[f + 1], i2 = 2 * triangles[f + 2];
    const c = (uv[i1] - uv[i0]) * (uv[i2 + 1] - uv[i0 + 1]) - (uv[i2] - uv[i0]) * (uv[i1 + 1] - uv[i0 + 1]);
    if (!(c > 0)) n++;
  }
  return n;
}

/**
 * As-rigid-as-possible refinement (Liu, Zhang, Xu, Gotsman & Gortler 2008, "A Local/Global Approach to Mesh
 * Parameterization", SGP), energy E = ½ Σ_t Σ_(i,j)∈t ½cot θ_ij ‖(u_i − u_j) − R_t(x_i − x_j)‖².
 * Local step: R_t = the rotation closest to the cotan-weighted covariance S_t (for 2×2, angle
 * atan2(S21 − S12, S11 + S22); always a proper rotation, never a reflection). Global step: L·u = b with the
 * cotan Laplacian, one vertex pinned, factorised once (nested dissection + LDLᵀ; flattenPiece starts that factor
 * on a helper thread before LSCM, see `prepared`) and solved for u and v together.
 * Flip guard: a step that increases the number of flipped triangles is halved up to 6 times toward the previous
 * iterate; if it still flips, refinement stops at the previous iterate (so the result never has more flipped
 * triangles than the LSCM start). solver.residual is the final energy divided by the 3D area (scale-free).
 *
 * @param triangles #F×3
 * @param frames triangle frames (x_i in each triangle's plane) and cotangents
 * @param uv0 #V×2 start (LSCM)
 * @param order perm[new] = old vertex (fill-reducing)
 */
export function arapRefine(
  triangles: Uint32Array,
  frames: TriangleFrames,
  uv0: Float64Array,
  order: Uint32Array,
  opts: ArapOptions = {},
): ArapResult {
  const t0 = performance.now();
  const maxIt = opts.maxIterations ?? 100;
  const tol = opts.tolerance ?? 1e-5;
  const nv = uv0.length / 2;
  const nf = triangles.length / 3;
  const { local, cot } = frames;
  const system = opts.prepared?.system ?? arapSystem(triangles, frames, order);
  const { pin, freeIndex, pinCoupling, scaleRef } = system;
  const nFree = system.lap.n;
  const factor = opts.prepared ? opts.prepared.factor.join() : factorLdlt(system.lap);
  const uv = Float64Array.from(uv0);
  const pinU = uv[2 * pin], pinV = uv[2 * pin + 1];
  const rot = new Float64Array(2 * nf); // cos, sin per triangle
  const bu = new Float64Array(nFree), bv = new Float64Array(nFree);
  const xu = new Float64Array(nFree), xv = new Float64Array(nFree);
  const work = new Float64Array(2 * nFree);
  const prev = new Float64Array(2 * nv);
  const cand = new Float64Array(2 * nv);

  /** local step on `p`: rotations into `rot`, returns the energy at p with those rotations */
  const localStep = (p: Float64Array): number => {
    let energy = 0;
    for (let f = 0; f < nf; f++) {
      const a = local[3 * f], bx = local[3 * f + 1], by = local[3 * f + 2];
      const i0 = 2 * triangles[3 * f], i1 = 2 * triangles[3 * f + 1], i2 = 2 * triangles[3 * f + 2];
      // edges opposite corner k: k=0: 1→2, k=1: 2→0, k=2: 0→1 (x_i − x_j with i = k+1, j = k+2)
      const w0 = 0.5 * cot[3 * f], w1 = 0.5 * cot[3 * f + 1], w2 = 0.5 * cot[3 * f + 2];
      const x0 = a - bx, y0 = -by, x1 = bx, y1 = by, x2 = -a, y2 = 0;
      const u0 = p[i1] - p[i2], v0 = p[i1 + 1] - p[i2 + 1];
      const u1 = p[i2] - p[i0], v1 = p[i2 + 1] - p[i0 + 1];
      const u2 = p[i0] - p[i1], v2 = p[i0 + 1] - p[i1 + 1];
      const s11 = w0 * u0 * x0 + w1 * u1 * x1 + w2 * u2 * x2;
      const s12 = w0 * u0 * y0 + w1 * u1 * y1 + w2 * u2 * y2;
      const s21 = w0 * v0 * x0 + w1 * v1 * x1 + w2 * v2 * x2;
      const s22 = w0 * v0 * y0 + w1 * v1 * y1 + w2 * v2 * y2;
      const tc = s11 + s22, ts = s21 - s12;
      const r = Math.sqrt(tc * tc + ts * ts);
      const c = r > 0 ? tc / r : 1, s = r > 0 ? ts / r : 0;
      rot[2 * f] = c; rot[2 * f + 1] = s;
      const d0u = u0 - (c * x0 - s * y0), d0v = v0 - (s * x0 + c * y0);
      const d1u = u1 - (c * x1 - s * y1), d1v = v1 - (s * x1 + c * y1);
      const d2u = u2 - (c * x2 - s * y2), d2v = v2 - (s * x2 + c * y2);
      energy += 0.5 * (w0 * (d0u * d0u + d0v * d0v) + w1 * (d1u * d1u + d1v * d1v) + w2 * (d2u * d2u + d2v * d2v));
    }
    return energy;
  };

  const globalStep = (out: Float64Array) => {
    bu.fill(0); bv.fill(0);
    for (let f = 0; f < nf; f++) {
      const a = local[3 * f], bx = local[3 * f + 1], by = local[3 * f + 2];
      const c = rot[2 * f], s = rot[2 * f + 1];
      for (let k = 0; k < 3; k++) {
        const i = triangles[3 * f + ((k + 1) % 3)], j = triangles[3 * f + ((k + 2) % 3)];
        const w = 0.5 * cot[3 * f + k];
        const ex = k === 0 ? a - bx : k === 1 ? bx : -a, ey = k === 0 ? -by : k === 1 ? by : 0;
        const ru = w * (c * ex - s * ey), rv = w * (s * ex + c * ey);
        const fi = freeIndex[i], fj = freeIndex[j];
        if (fi >= 0) { bu[fi] += ru; bv[fi] += rv; }
        if (fj >= 0) { bu[fj] -= ru; bv[fj] -= rv; }
      }
    }
    for (let i = 0; i < nFree; i++) { bu[i] -= pinCoupling[i] * pinU; bv[i] -= pinCoupling[i] * pinV; }
    solveLdltPair(factor, bu, bv, xu, xv, work);
    for (let v = 0; v < nv; v++) {
      const fi = freeIndex[v];
      if (fi >= 0) { out[2 * v] = xu[fi]; out[2 * v + 1] = xv[fi]; }
      else { out[2 * v] = pinU; out[2 * v + 1] = pinV; }
    }
  };

  let energy = localStep(uv);
  const initialEnergy = energy;
  let flips = countFlips(triangles, uv);
  let it = 0, converged = false, backtracks = 0;
  const floor = 1e-24 * scaleRef;
  while (it < maxIt) {
    if (energy <= floor) { converged = true; break; }
    prev.set(uv);
    globalStep(cand);
    it++;
    let accepted = false;
    let t = 1;
    for (let tries = 0; tries < 7; tries++) {
      if (tries > 0) {
        t *= 0.5;
        backtracks++;
        for (let d = 0; d < 2 * nv; d++) cand[d] = prev[d] + 0.5 * (cand[d] - prev[d]);
      }
      const fl = countFlips(triangles, cand);
      if (fl <= flips || opts.flipGuard === false) { flips = fl; accepted = true; break; }
    }
    if (!accepted) { uv.set(prev); break; }
    uv.set(cand);
    const e = localStep(uv);
    const change = Math.abs(energy - e);
    const before = energy;
    energy = e;
    if (change <= tol * before || e <= floor) { converged = true; break; }
  }
  if (!converged) energy = localStep(uv);
  let totalArea = 0;
  for (let f = 0; f < nf; f++) totalArea += frames.area[f];
  const relativeEnergy = totalArea > 0 ? energy / totalArea : 0;
  return {
    uv,
    relativeEnergy,
    solver: { converged, iterations: it, residual: relativeEnergy, ms: performance.now() - t0 },
    initialEnergy,
    energy,
    backtracks,
    flipped: flips,
  };
}
