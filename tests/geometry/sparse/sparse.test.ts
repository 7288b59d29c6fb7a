import { describe, expect, it } from "vitest";
import { asymmetry, csrMatVec, entry } from "@/lib/geometry/sparse/csr-matrix";
import { factorLdlt, solveLdlt, solveLdltPair } from "@/lib/geometry/sparse/ldlt";
import { nestedDissection } from "@/lib/geometry/sparse/nested-dissection";
import { solveSpd } from "@/lib/geometry/sparse/solve-spd";
import { csrFromTriplets, TripletList } from "@/lib/geometry/sparse/triplets";
import { factorHermitian, hermitianMatVec, solveHermitianRefined } from "@/lib/geometry/sparse/ldlt-hermitian";

/** 2D grid Laplacian (5-point) plus `shift` on the diagonal: SPD for shift > 0. */
function gridLaplacian(k: number, shift: number) {
  const n = k * k;
  const t = new TripletList(5 * n);
  for (let r = 0; r < k; r++) for (let c = 0; c < k; c++) {
    const i = r * k + c;
    t.add(i, i, shift);
    for (const [dr, dc] of [[0, 1], [1, 0]]) {
      if (r + dr >= k || c + dc >= k) continue;
      const j = (r + dr) * k + c + dc;
      t.add(i, i, 1); t.add(j, j, 1); t.add(i, j, -1); t.add(j, i, -1);
    }
  }
  return csrFromTriplets(n, t);
}

describe("CSR assembly and products", () => {
  it("sums duplicate triplets and sorts columns", () => {
    const t = new TripletList(2);
    t.add(0, 1, 2); t.add(1, 0, 3); t.add(0, 1, 0.5); t.add(0, 0, 1); t.add(2, 2, 4); t.add(0, 0, -1);
    const a = csrFromTriplets(3, t);
    expect(Array.from(a.rowPtr)).toEqual([0, 2, 3, 4]);
    expect(Array.from(a.colIdx)).toEqual([0, 1, 0, 2]);
    expect(entry(a, 0, 1)).toBe(2.5);
    expect(entry(a, 0, 0)).toBe(0);
    const y = new Float64Array(3);
    csrMatVec(a, new Float64Array([1, 2, 3]), y);
    expect(Array.from(y)).toEqual([5, 3, 12]);
  });
});

describe("nested dissection + LDLᵀ", () => {
  it("returns a permutation", () => {
    const a = gridLaplacian(40, 0.1);
    const p = nestedDissection(a.n, a.rowPtr, a.colIdx);
    const seen = new Uint8Array(a.n);
    for (const v of p) seen[v]++;
    expect(seen.every((s) => s === 1)).toBe(true);
  });

  it("reduces fill against the natural order and solves to a small residual", () => {
    const a = gridLaplacian(60, 1e-3);
    expect(asymmetry(a)).toBe(0);
    const natural = factorLdlt(a);
    const nd = factorLdlt(a, nestedDissection(a.n, a.rowPtr, a.colIdx));
    expect(nd.nnzL).toBeLessThan(0.6 * natural.nnzL);
    const xTrue = Float64Array.from({ length: a.n }, (_, i) => Math.sin(i * 0.37) + 0.1 * i);
    const b = new Float64Array(a.n);
    csrMatVec(a, xTrue, b);
    const x = new Float64Array(a.n);
    const stats = solveSpd(a, nd, b, x, 1e-12);
    expect(stats.converged).toBe(true);
    expect(stats.residual).toBeLessThan(1e-12);
    let err = 0;
    for (let i = 0; i < a.n; i++) err = Math.max(err, Math.abs(x[i] - xTrue[i]));
    expect(err).toBeLessThan(1e-6 * Math.max(...xTrue));
    // pair solve agrees with two single solves
    const b2 = b.map((v, i) => v * 0.5 + i);
    const x0 = new Float64Array(a.n), x1 = new Float64Array(a.n), s0 = new Float64Array(a.n), s1 = new Float64Array(a.n);
    solveLdltPair(nd, b, b2, x0, x1, new Float64Array(2 * a.n));
    solveLdlt(nd, b, s0, new Float64Array(a.n));
    solveLdlt(nd, b2, s1, new Float64Array(a.n));
    for (let i = 0; i < a.n; i++) { expect(x0[i]).toBeCloseTo(s0[i], 9); expect(x1[i]).toBeCloseTo(s1[i], 9); }
  });

  it("refuses a matrix that is not positive definite", () => {
    const a = gridLaplacian(5, 0); // singular: constants are in the null space
    expect(() => factorLdlt(a)).toThrow(/not positive definite/);
  });
});

describe("Hermitian LDLᴴ", () => {
  it("agrees with the real 2n×2n form [[Hr, −Hi], [Hi, Hr]] solved by LDLᵀ, with a small residual", () => {
    const k = 20, n = k * k;
    const re = gridLaplacian(k, 0.05);
    const im = new Float64Array(re.values.length);
    // antisymmetric imaginary part on the edges of the first grid row and column (like LSCM's boundary term)
    for (let i = 0; i < n; i++) {
      for (let q = re.rowPtr[i]; q < re.rowPtr[i + 1]; q++) {
        const j = re.colIdx[q];
        const onEdge = (i < k && j < k) || (i % k === 0 && j % k === 0);
        if (onEdge && i !== j) im[q] = i < j ? 0.4 : -0.4;
      }
    }
    const h = { re, im };
    const perm = nestedDissection(n, re.rowPtr, re.colIdx);
    const f = factorHermitian(h, perm);
    const br = Float64Array.from({ length: n }, (_, i) => Math.cos(0.3 * i));
    const bi = Float64Array.from({ length: n }, (_, i) => Math.sin(0.7 * i) - 0.2);
    const zr = new Float64Array(n), zi = new Float64Array(n);
    const stats = solveHermitianRefined(h, f, br, bi, zr, zi, 1e-12);
    expect(stats.converged).toBe(true);
    expect(stats.residual).toBeLessThan(1e-12);
    const yr = new Float64Array(n), yi = new Float64Array(n);
    hermitianMatVec(h, zr, zi, yr, yi);
    for (let i = 0; i < n; i++) { expect(yr[i]).toBeCloseTo(br[i], 9); expect(yi[i]).toBeCloseTo(bi[i], 9); }
    // real form
    const t = new TripletList(4 * re.values.length);
    for (let i = 0; i < n; i++) for (let q = re.rowPtr[i]; q < re.rowPtr[i + 1]; q++) {
      const j = re.colIdx[q];
      t.add(i, j, re.values[q]); t.add(n + i, n + j, re.values[q]);
      if (im[q] !== 0) { t.add(i, n + j, -im[q]); t.add(n + i, j, im[q]); }
    }
    const big = csrFromTriplets(2 * n, t);
    expect(asymmetry(big)).toBe(0);
    const x = new Float64Array(2 * n), b = new Float64Array(2 * n);
    b.set(br); b.set(bi, n);
    solveSpd(big, factorLdlt(big), b, x, 1e-12);
    for (let i = 0; i < n; i++) { expect(zr[i]).toBeCloseTo(x[i], 9); expect(zi[i]).toBeCloseTo(x[n + i], 9); }
  });
});
