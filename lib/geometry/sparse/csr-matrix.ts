/**
 * Square sparse matrix in compressed sparse row form. Column indices within a row are ascending and unique.
 * For symmetric matrices both triangles are stored (so the CSR arrays are also the CSC arrays).
 */
export interface CsrMatrix {
  /** number of rows = number of columns */
  n: number;
  /** n+1 row offsets into colIdx / values */
  rowPtr: Uint32Array;
  /** column index per stored entry */
  colIdx: Uint32Array;
  /** value per stored entry */
  values: Float64Array;
}

/** y = A·x (y must not alias x). */
export function csrMatVec(a: CsrMatrix, x: Float64Array, y: Float64Array): void {
  const { n, rowPtr, colIdx, values } = a;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let p = rowPtr[i], end = rowPtr[i + 1]; p < end; p++) s += values[p] * x[colIdx[p]];
    y[i] = s;
  }
}

/** ‖b − A·x‖₂ / ‖b‖₂ (or the absolute residual when b = 0). `scratch` has length n. */
export function relativeResidual(a: CsrMatrix, x: Float64Array, b: Float64Array, scratch: Float64Array): number {
  csrMatVec(a, x, scratch);
  let r2 = 0, b2 = 0;
  for (let i = 0; i < a.n; i++) {
    const d = b[i] - scratch[i];
    r2 += d * d;
    b2 += b[i] * b[i];
  }
  return b2 > 0 ? Math.sqrt(r2 / b2) : Math.sqrt(r2);
}

/** Largest |A_ij − A_ji| over stored entries (0 for an exactly symmetric matrix). O(nnz·log(row length)). */
export function asymmetry(a: CsrMatrix): number {
  let worst = 0;
  for (let i = 0; i < a.n; i++) {
    for (let p = a.rowPtr[i]; p < a.rowPtr[i + 1]; p++) {
      const j = a.colIdx[p];
      worst = Math.max(worst, Math.abs(a.values[p] - entry(a, j, i)));
    }
  }
  return worst;
}

/** A_ij (0 when not stored), binary search in row i. */
export function entry(a: CsrMatrix, i: number, j: number): number {
  let lo = a.rowPtr[i], hi = a.rowPtr[i + 1] - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = a.colIdx[mid];
    if (c === j) return a.values[mid];
    if (c < j) lo = mid + 1; else hi = mid - 1;
  }
  return 0;
}

/** Storage position of A_ij, or −1 when not stored (binary search in row i). */
export function entryIndex(a: CsrMatrix, i: number, j: number): number {
  let lo = a.rowPtr[i], hi = a.rowPtr[i + 1] - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = a.colIdx[mid];
    if (c === j) return mid;
    if (c < j) lo = mid + 1; else hi = mid - 1;
  }
  return -1;
}
