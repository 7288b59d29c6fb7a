import { describe, expect, it } from "vitest";
import { factorLdlt } from "@/lib/geometry/sparse/ldlt";
import { factorLdltInThread } from "@/lib/geometry/sparse/ldlt-thread";
import { nestedDissection } from "@/lib/geometry/sparse/nested-dissection";
import { csrFromTriplets, TripletList } from "@/lib/geometry/sparse/triplets";

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

describe("LDLᵀ on a helper thread", () => {
  it("gives the sequential factor bit for bit when the thread does the work", () => {
    const a = gridLaplacian(50, 1e-3);
    const perm = nestedDissection(a.n, a.rowPtr, a.colIdx);
    const pending = factorLdltInThread(a, perm, { minUnknowns: 0, waitForThread: true });
    const f = pending.join();
    expect(pending.ranOn()).toBe("thread");
    const g = factorLdlt(a, perm);
    expect(f.nnzL).toBe(g.nnzL);
    expect(Array.from(f.lp)).toEqual(Array.from(g.lp));
    expect(Array.from(f.li)).toEqual(Array.from(g.li));
    expect(Array.from(f.lx)).toEqual(Array.from(g.lx));
    expect(Array.from(f.d)).toEqual(Array.from(g.d));
    expect(pending.join()).toBe(f); // joining twice returns the same factor
  });

  it("factorises on the caller when the thread has not started, with the same result", () => {
    const a = gridLaplacian(30, 1e-2);
    const pending = factorLdltInThread(a, undefined, { minUnknowns: 0 });
    const f = pending.join(); // at once: the caller claims the work unless the thread already did
    expect(["thread", "caller"]).toContain(pending.ranOn());
    expect(Array.from(f.lx)).toEqual(Array.from(factorLdlt(a).lx));
  });

  it("stays sequential below the size threshold", () => {
    const a = gridLaplacian(10, 1e-2);
    const pending = factorLdltInThread(a);
    expect(pending.ranOn()).toBe("pending");
    pending.join();
    expect(pending.ranOn()).toBe("sequential");
  });

  it("reports a matrix that is not positive definite from the thread as factorLdlt does", () => {
    const a = gridLaplacian(20, 0); // singular: constants are in the null space
    let expected = "";
    try { factorLdlt(a); } catch (e) { expected = (e as Error).message; }
    expect(expected).toMatch(/not positive definite/);
    const pending = factorLdltInThread(a, undefined, { minUnknowns: 0, waitForThread: true });
    expect(() => pending.join()).toThrow(expected);
    expect(pending.ranOn()).toBe("thread");
  });
});
