import { GeometryError } from "../errors";
import type { SolverStats } from "../report-types";
import type { CsrMatrix } from "./csr-matrix";
import { invertPermutation } from "./nested-dissection";

/**
 * Complex Hermitian positive definite matrix H = re + i·im on one CSR pattern (`re` carries the pattern;
 * `im[p]` is the imaginary part of the entry stored at position p). Both triangles stored, H_ji = conj(H_ij).
 */
export interface HermitianCsr {
  re: CsrMatrix;
  im: Float64Array;
}

/**
 * LDLᴴ factor P·H·Pᵀ = L·D·Lᴴ (L complex unit lower triangular, D real positive), same up-looking row algorithm
 * and elimination tree as the real factor (Davis 2005, ACM TOMS 31(4)). Used for LSCM, whose 2V×2V real system
 * is the real form of a V×V Hermitian one: one complex unknown u + i·v per vertex halves the index work and the
 * fill against the interleaved real system.
 */
export interface HermitianFactor {
  n: number;
  perm: Uint32Array;
  lp: Uint32Array;
  li: Uint32Array;
  /** L entries interleaved (re, im) per stored position: one stream instead of two in the factor and solve loops */
  lz: Float64Array;
  d: Float64Array;
  nnzL: number;
}

/** @throws GeometryError SOLVER_FAILED when a pivot is not positive */
export function factorHermitian(h: HermitianCsr, perm?: Uint32Array): HermitianFactor {
  const a = h.re;
  const n = a.n;
  const p = perm ?? Uint32Array.from({ length: n }, (_, i) => i);
  const pinv = invertPermutation(p);
  const cp = new Uint32Array(n + 1);
  for (let r = 0; r < n; r++) {
    const i = pinv[r];
    for (let q = a.rowPtr[r]; q < a.rowPtr[r + 1]; q++) if (i <= pinv[a.colIdx[q]]) cp[pinv[a.colIdx[q]] + 1]++;
  }
  for (let j = 0; j < n; j++) cp[j + 1] += cp[j];
  const ci = new Uint32Array(cp[n]);
  const cr = new Float64Array(cp[n]);
  const cim = new Float64Array(cp[n]);
  const fill = cp.slice(0, n);
  for (let r = 0; r < n; r++) {
    const i = pinv[r];
    for (let q = a.rowPtr[r]; q < a.rowPtr[r + 1]; q++) {
      const j = pinv[a.colIdx[q]];
      if (i <= j) { const k = fill[j]++; ci[k] = i; cr[k] = a.values[q]; cim[k] = h.im[q]; }
    }
  }
  const parent = new Int32Array(n);
  const flag = new Int32Array(n);
  const lnz = new Uint32Array(n);
  for (let k = 0; k < n; k++) {
    parent[k] = -1; flag[k] = k; lnz[k] = 0;
    for (let q = cp[k]; q < cp[k + 1]; q++) {
      let i = ci[q];
      if (i >= k) continue;
      for (; flag[i] !== k; i = parent[i]) {
        if (parent[i] === -1) parent[i] = k;
        lnz[i]++;
        flag[i] = k;
      }
    }
  }
  const lp = new Uint32Array(n + 1);
  for (let k = 0; k < n; k++) lp[k + 1] = lp[k] + lnz[k];
  const nnzL = lp[n];
  const li = new Uint32Array(nnzL);
  const lz = new Float64Array(2 * nnzL);
  const d = new Float64Array(n);
  // accumulator of row k, interleaved (re, im) like lz
  const y = new Float64Array(2 * n);
  const pattern = new Int32Array(n);
  const colComplex = new Uint8Array(n);
  let maxDiag = 0;
  for (let k = 0; k < n; k++) {
    let top = n;
    flag[k] = k;
    lnz[k] = 0;
    for (let q = cp[k]; q < cp[k + 1]; q++) {
      let i = ci[q];
      y[2 * i] += cr[q];
      y[2 * i + 1] += cim[q];
      let len = 0;
      for (; flag[i] !== k; i = parent[i]) { pattern[len++] = i; flag[i] = k; }
      while (len > 0) pattern[--top] = pattern[--len];
    }
    let dk = y[2 * k];
    if (dk > maxDiag) maxDiag = dk;
    y[2 * k] = 0; y[2 * k + 1] = 0;
    for (; top < n; top++) {
      const i = pattern[top];
      const wr = y[2 * i], wi = y[2 * i + 1];
      y[2 * i] = 0; y[2 * i + 1] = 0;
      const p2 = lp[i] + lnz[i];
      if (colComplex[i] === 0) {
        // column i of L is real so far (most columns below the boundary-free parts of the tree): cheaper update
        if (wi === 0) {
          for (let q = lp[i]; q < p2; q++) y[2 * li[q]] -= lz[2 * q] * wr;
        } else {
          for (let q = lp[i]; q < p2; q++) {
            const r = 2 * li[q], ar = lz[2 * q];
            y[r] -= ar * wr;
            y[r + 1] -= ar * wi;
          }
        }
      } else {
        for (let q = lp[i]; q < p2; q++) {
          const r = 2 * li[q], ar = lz[2 * q], ai = lz[2 * q + 1];
          y[r] -= ar * wr - ai * wi;
          y[r + 1] -= ar * wi + ai * wr;
        }
      }
      const di = d[i];
      // L_ki = conj(w_i) / D_i; D_k −= |w_i|² / D_i
      li[p2] = k;
      lz[2 * p2] = wr / di;
      lz[2 * p2 + 1] = -wi / di;
      if (wi !== 0) colComplex[i] = 1;
      dk -= (wr * wr + wi * wi) / di;
      lnz[i]++;
    }
    if (!(dk > 1e-14 * maxDiag) || !Number.isFinite(dk)) {
      throw new GeometryError("SOLVER_FAILED", `Sparse factorisation failed at pivot ${k} of ${n}: the conformal system is not positive definite (degenerate triangles?).`);
    }
    d[k] = dk;
  }
  return { n, perm: p, lp, li, lz, d, nnzL };
}

/** Solves H·z = b (complex, split in real/imaginary arrays). `work` has length 2n. b and z may alias. */
export function solveHermitian(
  f: HermitianFactor, br: Float64Array, bi: Float64Array, zr: Float64Array, zi: Float64Array, work: Float64Array,
): void {
  const { n, perm, lp, li, lz, d } = f;
  for (let i = 0; i < n; i++) { work[2 * i] = br[perm[i]]; work[2 * i + 1] = bi[perm[i]]; }
  for (let j = 0; j < n; j++) {
    const wr = work[2 * j], wi = work[2 * j + 1];
    for (let q = lp[j]; q < lp[j + 1]; q++) {
      const r = 2 * li[q], ar = lz[2 * q], ai = lz[2 * q + 1];
      work[r] -= ar * wr - ai * wi;
      work[r + 1] -= ar * wi + ai * wr;
    }
  }
  for (let j = 0; j < n; j++) { work[2 * j] /= d[j]; work[2 * j + 1] /= d[j]; }
  for (let j = n - 1; j >= 0; j--) {
    let sr = work[2 * j], si = work[2 * j + 1];
    for (let q = lp[j]; q < lp[j + 1]; q++) {
      const r = 2 * li[q], ar = lz[2 * q], ai = lz[2 * q + 1];
      const xr = work[r], xi = work[r + 1];
      // conj(L_rj)·z_r
      sr -= ar * xr + ai * xi;
      si -= ar * xi - ai * xr;
    }
    work[2 * j] = sr; work[2 * j + 1] = si;
  }
  for (let i = 0; i < n; i++) { zr[perm[i]] = work[2 * i]; zi[perm[i]] = work[2 * i + 1]; }
}

/** y = H·z */
export function hermitianMatVec(h: HermitianCsr, zr: Float64Array, zi: Float64Array, yr: Float64Array, yi: Float64Array): void {
  const { n, rowPtr, colIdx, values } = h.re;
  const im = h.im;
  for (let i = 0; i < n; i++) {
    let sr = 0, si = 0;
    for (let q = rowPtr[i]; q < rowPtr[i + 1]; q++) {
      const c = colIdx[q], ar = values[q], ai = im[q];
      sr += ar * zr[c] - ai * zi[c];
      si += ar * zi[c] + ai * zr[c];
    }
    yr[i] = sr; yi[i] = si;
  }
}

/**
 * Direct solve with iterative refinement until ‖b − Hz‖/‖b‖ ≤ tol (at most maxRefine corrections).
 */
export function solveHermitianRefined(
  h: HermitianCsr, f: HermitianFactor, br: Float64Array, bi: Float64Array, zr: Float64Array, zi: Float64Array,
  tol = 1e-10, maxRefine = 3,
): SolverStats {
  const t0 = performance.now();
  const n = h.re.n;
  const work = new Float64Array(2 * n);
  const rr = new Float64Array(n), ri = new Float64Array(n), dr = new Float64Array(n), di = new Float64Array(n);
  let b2 = 0;
  for (let i = 0; i < n; i++) b2 += br[i] * br[i] + bi[i] * bi[i];
  const residual = () => {
    hermitianMatVec(h, zr, zi, rr, ri);
    let r2 = 0;
    for (let i = 0; i < n; i++) {
      rr[i] = br[i] - rr[i]; ri[i] = bi[i] - ri[i];
      r2 += rr[i] * rr[i] + ri[i] * ri[i];
    }
    return b2 > 0 ? Math.sqrt(r2 / b2) : Math.sqrt(r2);
  };
  solveHermitian(f, br, bi, zr, zi, work);
  let res = residual();
  let it = 0;
  while (res > tol && it < maxRefine) {
    solveHermitian(f, rr, ri, dr, di, work);
    for (let i = 0; i < n; i++) { zr[i] += dr[i]; zi[i] += di[i]; }
    res = residual();
    it++;
  }
  return { converged: res <= tol, iterations: it + 1, residual: res, ms: performance.now() - t0 };
}
