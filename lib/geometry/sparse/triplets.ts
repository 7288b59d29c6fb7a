import type { CsrMatrix } from "./csr-matrix";

/** Growable list of (row, column, value) triplets, typed arrays underneath. Preallocate with a good estimate. */
export class TripletList {
  rows: Uint32Array;
  cols: Uint32Array;
  vals: Float64Array;
  length = 0;

  constructor(capacity: number) {
    const c = Math.max(16, capacity);
    this.rows = new Uint32Array(c);
    this.cols = new Uint32Array(c);
    this.vals = new Float64Array(c);
  }

  add(i: number, j: number, v: number): void {
    if (this.length === this.rows.length) this.grow();
    const k = this.length++;
    this.rows[k] = i; this.cols[k] = j; this.vals[k] = v;
  }

  private grow(): void {
    const c = this.rows.length * 2;
    const r = new Uint32Array(c); r.set(this.rows); this.rows = r;
    const k = new Uint32Array(c); k.set(this.cols); this.cols = k;
    const v = new Float64Array(c); v.set(this.vals); this.vals = v;
  }
}

/**
 * Assembles an n×n CSR matrix from triplets, summing duplicates. O(n + #triplets + Σ row² for sorting rows, which
 * are short for mesh matrices).
 */
export function csrFromTriplets(n: number, t: TripletList): CsrMatrix {
  const m = t.length;
  const count = new Uint32Array(n + 1);
  for (let k = 0; k < m; k++) count[t.rows[k] + 1]++;
  for (let i = 0; i < n; i++) count[i + 1] += count[i];
  const bucketCol = new Uint32Array(m);
  const bucketVal = new Float64Array(m);
  const fill = count.slice(0, n);
  for (let k = 0; k < m; k++) {
    const p = fill[t.rows[k]]++;
    bucketCol[p] = t.cols[k];
    bucketVal[p] = t.vals[k];
  }
  // merge duplicates per row with a column marker
  const mark = new Int32Array(n).fill(-1);
  const rowPtr = new Uint32Array(n + 1);
  const colIdx = new Uint32Array(m);
  const values = new Float64Array(m);
  let nnz = 0;
  for (let i = 0; i < n; i++) {
    const start = nnz;
    for (let p = count[i]; p < count[i + 1]; p++) {
      const j = bucketCol[p];
      if (mark[j] >= start) {
        values[mark[j]] += bucketVal[p];
      } else {
        mark[j] = nnz;
        colIdx[nnz] = j;
        values[nnz++] = bucketVal[p];
      }
    }
    // insertion sort of the (short) row by column
    for (let p = start + 1; p < nnz; p++) {
      const c = colIdx[p], v = values[p];
      let q = p - 1;
      while (q >= start && colIdx[q] > c) { colIdx[q + 1] = colIdx[q]; values[q + 1] = values[q]; q--; }
      colIdx[q + 1] = c; values[q + 1] = v;
    }
    rowPtr[i + 1] = nnz;
  }
  return { n, rowPtr, colIdx: colIdx.slice(0, nnz), values: values.slice(0, nnz) };
}
