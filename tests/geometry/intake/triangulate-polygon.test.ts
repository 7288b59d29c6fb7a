import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { GrowableU32 } from "@/lib/geometry/intake/growable";
import { MAX_EAR_CLIP_CORNERS, triangulatePolygon } from "@/lib/geometry/intake/triangulate-polygon";

/** Signed area of the polygon (shoelace formula; Source: Gauss's area formula) and of the triangles, in the xy plane. */
function shoelace(xs: number[], ys: number[]): number {
  let a = 0;
  for (let k = 0; k < xs.length; k++) {
    const j = (k + 1) % xs.length;
    a += xs[k] * ys[j] - xs[j] * ys[k];
  }
  return a / 2;
}

describe("triangulatePolygon", () => {
  it("tiles random simple (star-shaped) polygons with n − 2 triangles of the polygon's orientation, on a tilted plane", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ jitter: fc.double({ min: 0, max: 0.8, noNaN: true }), r: fc.double({ min: 0.1, max: 1, noNaN: true }) }), { minLength: 3, maxLength: 24 }),
        fc.boolean(),
        (pts, reverse) => {
          // corner k at angle (k + jitter)/n turns: star-shaped around the origin, so simple; radii vary, so
          // many are concave
          const m = pts.length;
          const order = reverse ? [...pts.keys()].reverse() : [...pts.keys()];
          const xs = order.map((k) => pts[k].r * Math.cos((2 * Math.PI * (k + pts[k].jitter)) / m));
          const ys = order.map((k) => pts[k].r * Math.sin((2 * Math.PI * (k + pts[k].jitter)) / m));
          const polygonArea = shoelace(xs, ys);
          // embed in the plane z = 0.3x + 0.2y (areas in xy projection are what we compare)
          const n = xs.length;
          const positions = new Float64Array(3 * n);
          for (let k = 0; k < n; k++) {
            positions[3 * k] = xs[k];
            positions[3 * k + 1] = ys[k];
            positions[3 * k + 2] = 0.3 * xs[k] + 0.2 * ys[k];
          }
          const corners = Uint32Array.from({ length: n }, (_, k) => k);
          const out = new GrowableU32(4);
          triangulatePolygon(positions, corners, n, out);
          expect(out.length).toBe(3 * (n - 2));
          let sum = 0;
          let sumAbs = 0;
          for (let k = 0; k < out.length; k += 3) {
            const a = out.data[k], b = out.data[k + 1], c = out.data[k + 2];
            const s = shoelace([xs[a], xs[b], xs[c]], [ys[a], ys[b], ys[c]]);
            expect(Math.sign(s) === Math.sign(polygonArea) || Math.abs(s) < 1e-12 * Math.abs(polygonArea)).toBe(true);
            sum += s;
            sumAbs += Math.abs(s);
          }
          // same total and no overlap (|Σ| = Σ|·|)
          expect(sum).toBeCloseTo(polygonArea, 9);
          expect(sumAbs).toBeCloseTo(Math.abs(polygonArea), 9);
        },
      ),
      { numRuns: 500 },
    );
  });

  it("falls back to a fan for a polygon with no area", () => {
    const positions = new Float64Array([0, 0, 0, 1, 0, 0, 2, 0, 0, 3, 0, 0]);
    const out = new GrowableU32(4);
    triangulatePolygon(positions, new Uint32Array([0, 1, 2, 3]), 4, out);
    expect(Array.from(out.data.subarray(0, out.length))).toEqual([0, 1, 2, 0, 2, 3]);
  });

  it("gives n − 2 triangles for a self-crossing polygon (a bow tie) without looping", () => {
    const positions = new Float64Array([0, 0, 0, 1, 1, 0, 1, 0, 0, 0, 1, 0, 0.5, 2, 0]);
    const out = new GrowableU32(4);
    triangulatePolygon(positions, new Uint32Array([0, 1, 2, 3, 4]), 5, out);
    expect(out.length).toBe(9);
  });
});

describe("triangulatePolygon on hostile input", () => {
  it("reads a file full of large self-crossing polygons in bounded time", async () => {
    const { parseObj } = await import("@/lib/geometry/intake/parse-obj");
    // 2000 polygons of 64 corners each on a zig-zag star that crosses itself everywhere
    const lines: string[] = [];
    for (let k = 0; k < 64; k++) {
      const a = (2 * Math.PI * k * 29) / 64; // step 29/64 of a turn: a star polygon {64/29}
      lines.push(`v ${Math.cos(a)} ${Math.sin(a)} 0`);
    }
    const face = "f " + Array.from({ length: 64 }, (_, k) => k + 1).join(" ");
    for (let p = 0; p < 2000; p++) lines.push(face);
    const text = new TextEncoder().encode(lines.join("\n"));
    const t0 = performance.now();
    const r = parseObj(text);
    const ms = performance.now() - t0;
    expect(r.triangles.length).toBe(2000 * 62 * 3);
    expect(ms).toBeLessThan(5000);
  });

  // The L-shaped hexagon of parse-obj.test.ts, written from the corner whose fan covers the notch.
  const L = new Float64Array([2, 1, 0, 1, 1, 0, 1, 2, 0, 0, 2, 0, 0, 0, 0, 2, 0, 0]);
  const fanOfSix = [0, 1, 2, 0, 2, 3, 0, 3, 4, 0, 4, 5];

  it("ear-clips while the file's budget lasts, then fans", () => {
    const corners = new Uint32Array([0, 1, 2, 3, 4, 5]);
    const clipped = new GrowableU32(4);
    const budget = { remaining: 1000 };
    triangulatePolygon(L, corners, 6, clipped, budget);
    expect(Array.from(clipped.data.subarray(0, 12))).not.toEqual(fanOfSix);
    expect(budget.remaining).toBeLessThan(1000);
    const fanned = new GrowableU32(4);
    triangulatePolygon(L, corners, 6, fanned, { remaining: 0 });
    expect(Array.from(fanned.data.subarray(0, 12))).toEqual(fanOfSix);
  });

  it("fans polygons with more corners than MAX_EAR_CLIP_CORNERS", () => {
    const n = MAX_EAR_CLIP_CORNERS + 1;
    const positions = new Float64Array(3 * n);
    for (let k = 0; k < n; k++) {
      const r = k % 2 === 0 ? 1 : 0.5; // a concave star
      positions[3 * k] = r * Math.cos((2 * Math.PI * k) / n);
      positions[3 * k + 1] = r * Math.sin((2 * Math.PI * k) / n);
    }
    const out = new GrowableU32(4);
    triangulatePolygon(positions, Uint32Array.from({ length: n }, (_, k) => k), n, out, { remaining: 1e9 });
    for (let t = 0; t < n - 2; t++) expect(Array.from(out.data.subarray(3 * t, 3 * t + 3))).toEqual([0, t + 1, t + 2]);
  });
});
