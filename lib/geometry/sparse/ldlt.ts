import { GeometryError } from "../errors";
import type { CsrMatrix } from "./csr-matrix";
import { invertPermutation } from "./nested-dissection";

/**
 * Sparse LDLᵀ factorisation P·A·Pᵀ = L·D·Lᵀ of a symmetric positive definite matrix, up-looking by rows with the
 * elimination tree (Davis 2005, "Algorithm 849: A concise sparse Cholesky factorization package", ACM TOMS 31(4)).
 * Factor once, solve many times (the ARAP global step reuses one factor every iteration).
 */
export interface LdltFactor {
  n: number;
  /** perm[new] = old */
  perm: Uint32Array;
  /** column pointers of the strictly lower triangular L (CSC), n+1 */
  lp: Uint32Array;
  li: Uint32Array;
  lx: Float64Array;
  d: Float64Array;
  /** non-zeros of L (fill) */
  nnzL: number;
}

/**
 * Symbolic part of the factorisation: the upper triangle of P·A·Pᵀ in CSC, the elimination tree and the column
 * pointers of L. Everything the numeric part needs, as flat typed arrays (so it can be handed to another thread).
 */
export interface LdltSymbolic {
  n: number;
  perm: Uint32Array;
  /** upper triangle of P·A·Pᵀ, CSC: column j holds rows i ≤ j */
  cp: Uint32Array;
  ci: Uint32Array;
  cx: Float64Array;
  /** elimination tree, −1 for a root */
  parent: Int32Array;
  /** n+1 column pointers of L */
  lp: Uint32Array;
  nnzL: number;
}

/**
 * @param a symmetric matrix, both triangles stored
 * @param perm fill-reducing ordering, perm[new] = old (identity when omitted)
 */
export function analyseLdlt(a: CsrMatrix, perm?: Uint32Array): LdltSymbolic {
  const n = a.n;
  const p = perm ?? Uint32Array.from({ length: n }, (_, i) => i);
  const pinv = invertPermutation(p);
  // upper triangle of P·A·Pᵀ in CSC: column j holds rows i ≤ j
  const cp = new Uint32Array(n + 1);
  for (let r = 0; r < n; r++) {
    const i = pinv[r];
    for (let q = a.rowPtr[r]; q < a.rowPtr[r + 1]; q++) {
      const j = pinv[a.colIdx[q]];
      if (i <= j) cp[j + 1]++;
    }
  }
  for (let j = 0; j < n; j++) cp[j + 1] += cp[j];
  const ci = new Uint32Array(cp[n]);
  const cx = new Float64Array(cp[n]);
  const fill = cp.slice(0, n);
  for (let r = 0; r < n; r++) {
    const i = pinv[r];
    for (let q = a.rowPtr[r]; q < a.rowPtr[r + 1]; q++) {
      const j = pinv[a.colIdx[q]];
      if (i <= j) { const k = fill[j]++; ci[k] = i; cx[k] = a.values[q]; }
    }
  }
  // elimination tree and column counts
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
  return { n, perm: p, cp, ci, cx, parent, lp, nnzL: lp[n] };
}

/**
 * Numeric part (up-looking by rows, Davis 2005): fills li, lx (length nnzL) and d (length n).
 * @returns −1 on success, else the index of the first pivot that is not positive
 */
export function factorLdltNumeric(s: LdltSymbolic, li: Uint32Array, lx: Float64Array, d: Float64Array): number {
  const { n, cp, ci, cx, parent, lp } = s;
  const flag = new Int32Array(n);
  const lnz = new Uint32Array(n);
  const y = new Float64Array(n);
  const pattern = new Int32Array(n);
  let maxDiag = 0;
  for (let k = 0; k < n; k++) {
    y[k] = 0;
    let top = n;
    flag[k] = k;
    lnz[k] = 0;
    for (let q = cp[k]; q < cp[k + 1]; q++) {
      let i = ci[q];
      y[i] += cx[q];
      let len = 0;
      for (; flag[i] !== k; i = parent[i]) { pattern[len++] = i; flag[i] = k; }
      while (len > 0) pattern[--top] = pattern[--len];
    }
    let dk = y[k];
    if (dk > maxDiag) maxDiag = dk;
    y[k] = 0;
    for (; top < n; top++) {
      const i = pattern[top];
      const yi = y[i];
      y[i] = 0;
      const p2 = lp[i] + lnz[i];
      for (let q = lp[i]; q < p2; q++) y[li[q]] -= lx[q] * yi;
      const lki = yi / d[i];
      dk -= lki * yi;
      li[p2] = k;
      lx[p2] = lki;
      lnz[i]++;
    }
    if (!(dk > 1e-14 * maxDiag) || !Number.isFinite(dk)) return k;
    d[k] = dk;
  }
  return -1;
}

/** The error factorLdlt throws for a pivot that is not positive. */
export function notPositiveDefinite(pivot: number, n: number): GeometryError {
  return new GeometryError("SOLVER_FAILED", `Sparse factorisation failed at pivot ${pivot} of ${n}: the system is not positive definite (degenerate or badly connected triangles?).`);
}

/**
 * @param a symmetric matrix, both triangles stored
 * @param perm fill-reducing ordering, perm[new] = old (identity when omitted)
 * @throws GeometryError SOLVER_FAILED when a pivot is not positive (matrix not positive definite)
 */
export function factorLdlt(a: CsrMatrix, perm?: Uint32Array): LdltFactor {
  const s = analyseLdlt(a, perm);
  const li = new Uint32Array(s.nnzL);
  const lx = new Float64Array(s.nnzL);
  const d = new Float64Array(s.n);
  const bad = factorLdltNumeric(s, li, lx, d);
  if (bad >= 0) throw notPositiveDefinite(bad, s.n);
  return { n: s.n, perm: s.perm, lp: s.lp, li, lx, d, nnzL: s.nnzL };
}

/**
 * Solves A·x = b with the factor. `work` is a scratch vector of length n. b and x may alias.
 */
export function solveLdlt(f: LdltFactor, b: Float64Array, x: Float64Array, work: Float64Array): void {
  const { n, perm, lp, li, lx, d } = f;
  for (let i = 0; i < n; i++) work[i] = b[perm[i]];
  for (let j = 0; j < n; j++) {
    const wj = work[j];
    if (wj !== 0) for (let q = lp[j]; q < lp[j + 1]; q++) work[li[q]] -= lx[q] * wj;
  }
  for (let j = 0; j < n; j++) work[j] /= d[j];
  for (let j = n - 1; j >= 0; j--) {
    let s = work[j];
    for (let q = lp[j]; q < lp[j + 1]; q++) s -= lx[q] * work[li[q]];
    work[j] = s;
  }
  for (let i = 0; i < n; i++) x[perm[i]] = work[i];
}

/**
 * Solves A·X = B for two right-hand sides at once (one pass over L for both; used for the u and v coordinates).
 * `work` is a scratch vector of length 2n.
 */
export function solveLdltPair(
  f: LdltFactor, b0: Float64Array, b1: Float64Array, x0: Float64Array, x1: Float64Array, work: Float64Array,
): void {
  const { n, perm, lp, li, lx, d } = f;
  for (let i = 0; i < n; i++) { work[2 * i] = b0[perm[i]]; work[2 * i + 1] = b1[perm[i]]; }
  for (let j = 0; j < n; j++) {
    const w0 = work[2 * j], w1 = work[2 * j + 1];
    for (let q = lp[j]; q < lp[j + 1]; q++) {
      const r = 2 * li[q], l = lx[q];
      work[r] -= l * w0;
      work[r + 1] -= l * w1;
    }
  }
  for (let j = 0; j < n; j++) { work[2 * j] /= d[j]; work[2 * j + 1] /= d[j]; }
  for (let j = n - 1; j >= 0; j--) {
    let s0 = work[2 * j], s1 = work[2 * j + 1];
    for (let q = lp[j]; q < lp[j + 1]; q++) {
      const r = 2 * li[q], l = lx[q];
      s0 -= l * work[r];
      s1 -= l * work[r + 1];
    }
    work[2 * j] = s0; work[2 * j + 1] = s1;
  }
  for (let i = 0; i < n; i++) { x0[perm[i]] = work[2 * i]; x1[perm[i]] = work[2 * i + 1]; }
}
