import { describe, expect, it } from "vitest";
import { mirrorTwins, pieceMoments } from "@/lib/geometry/layout/mirror-plane";
import { cube } from "@/lib/geometry/shapes/cube";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";

function cubeEdges(): Uint32Array {
  const e: number[] = [];
  for (let a = 0; a < 8; a++) for (const bit of [4, 2, 1]) if (!(a & bit)) e.push(a, a | bit);
  return new Uint32Array(e);
}

describe("mirror twins", () => {
  const m = cube({ size: 2 });
  const pieces = cutPieces(m, cubeEdges());
  const moments = pieces.map((p) => pieceMoments(m.positions, m.triangles, p.faces));
  const diag = Math.sqrt(12);

  it("cube faces across x = 0: the ±x faces are twins (cut 2, one mirrored), the other four are self-symmetric", () => {
    const r = mirrorTwins(moments, { axis: "x", offset: 0 }, diag);
    const twins = r.count.map((c, i) => ({ c, i, cx: moments[i].cx })).filter((t) => Math.abs(t.cx) > 0.5);
    expect(twins.length).toBe(2);
    const first = Math.min(twins[0].i, twins[1].i), second = Math.max(twins[0].i, twins[1].i);
    expect(r.count[first]).toBe(2);
    expect(r.mirrored[first]).toBe(true);
    expect(r.count[second]).toBe(0);
    expect(r.mirrorOf[second]).toBe(first);
    const self = r.count.filter((c, i) => i !== first && i !== second);
    expect(self).toEqual([1, 1, 1, 1]);
    expect(r.unmatched).toEqual([]);
  });

  it("a plane off the symmetry finds no twins; half model cuts every piece twice", () => {
    const off = mirrorTwins(moments, { axis: "x", offset: 0.7 }, diag);
    expect(off.count.every((c) => c === 1)).toBe(true);
    expect(off.unmatched.length).toBe(6);
    const half = mirrorTwins(moments, { axis: "z", offset: 5, half: true }, diag);
    expect(half.count).toEqual([2, 2, 2, 2, 2, 2]);
    expect(half.mirrored.every(Boolean)).toBe(true);
  });
});
