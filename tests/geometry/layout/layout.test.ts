import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { convexHull } from "@/lib/geometry/layout/convex-hull";
import { minAreaRect } from "@/lib/geometry/layout/min-area-rect";
import { boundaryLoops, loopArea } from "@/lib/geometry/layout/boundary-loops";
import { layoutPieces, outerBoundary } from "@/lib/geometry/layout/layout-pieces";
import { packRows } from "@/lib/geometry/layout/pack-rows";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";

/** Brute force: try every hull edge direction. */
function bruteMinArea(xy: Float64Array): number {
  const hull = convexHull(xy);
  let best = Infinity;
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i], b = hull[(i + 1) % hull.length];
    const ex = xy[2 * b] - xy[2 * a], ey = xy[2 * b + 1] - xy[2 * a + 1], l = Math.hypot(ex, ey);
    let minE = Infinity, maxE = -Infinity, minN = Infinity, maxN = -Infinity;
    for (let j = 0; j < xy.length; j += 2) {
      const e = (xy[j] * ex + xy[j + 1] * ey) / l, n = (-xy[j] * ey + xy[j + 1] * ex) / l;
      minE = Math.min(minE, e); maxE = Math.max(maxE, e); minN = Math.min(minN, n); maxN = Math.max(maxN, n);
    }
    best = Math.min(best, (maxE - minE) * (maxN - minN));
  }
  return best;
}

function aabbArea(xy: Float64Array): number {
  let minX = Infinity, maxX = -Infinity, minY = Infinity, maxY = -Infinity;
  for (let j = 0; j < xy.length; j += 2) {
    minX = Math.min(minX, xy[j]); maxX = Math.max(maxX, xy[j]); minY = Math.min(minY, xy[j + 1]); maxY = Math.max(maxY, xy[j + 1]);
  }
  return (maxX - minX) * (maxY - minY);
}

/** A grid disk turned by `angle` and stretched to an oblong. */
function oblong(angle: number, w: number, h: number) {
  const g = flatGrid({ faces: 200, size: 1 });
  const n = g.positions.length / 3, uv = new Float64Array(2 * n);
  const c = Math.cos(angle), s = Math.sin(angle);
  for (let v = 0; v < n; v++) {
    const x = g.positions[3 * v] * w, y = g.positions[3 * v + 1] * h;
    uv[2 * v] = c * x - s * y + 7;
    uv[2 * v + 1] = s * x + c * y - 3;
  }
  return { uv, triangles: g.triangles };
}

describe("convex hull and minimum-area rectangle", () => {
  it("hull of a square with inner points is its 4 corners, counter-clockwise", () => {
    const xy = new Float64Array([0, 0, 1, 0, 1, 1, 0, 1, 0.5, 0.5, 0.2, 0.7, 0.5, 0]);
    const h = convexHull(xy);
    expect(Array.from(h).sort()).toEqual([0, 1, 2, 3]);
    expect(loopArea(xy, h)).toBeCloseTo(1, 12);
  });

  it("rotating calipers equals brute force over hull edges and never beats it (random point sets)", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.double({ min: -10, max: 10, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true })), { minLength: 3, maxLength: 60 }), (pts) => {
        const xy = new Float64Array(pts.flat());
        const hull = convexHull(xy);
        if (hull.length < 3) return;
        const r = minAreaRect(xy, hull);
        const brute = bruteMinArea(xy);
        expect(r.area).toBeLessThanOrEqual(brute * (1 + 1e-9) + 1e-9);
        expect(r.area).toBeGreaterThanOrEqual(brute * (1 - 1e-9) - 1e-9);
        // the rotated box area is never more than the unrotated one
        expect(r.area).toBeLessThanOrEqual(aabbArea(xy) * (1 + 1e-9) + 1e-9);
      }),
      { numRuns: 200, seed: 42 },
    );
  });

  it("a turned 10×2 oblong comes back to 10×2 (area 20 < its turned box)", () => {
    const { uv, triangles } = oblong(0.6, 10, 2);
    const [laid] = layoutPieces([{ uv, triangles, onSheet: true }], { gap: 1 });
    expect(laid.placement.width).toBeCloseTo(10, 9);
    expect(laid.placement.height).toBeCloseTo(2, 9);
    expect(laid.placement.width * laid.placement.height).toBeLessThanOrEqual(aabbArea(uv));
  });
});

describe("layout", () => {
  it("outline is the outer boundary, counter-clockwise, not closed", () => {
    const { uv, triangles } = oblong(0, 4, 3);
    const loop = outerBoundary(uv, triangles);
    expect(loopArea(uv, loop)).toBeCloseTo(12, 9);
    expect(boundaryLoops(triangles, uv.length / 2).length).toBe(1);
    const [laid] = layoutPieces([{ uv, triangles, onSheet: true }], { gap: 1 });
    let a = 0;
    const o = laid.outline;
    for (let i = 0; i < o.length; i++) a += o[i][0] * o[(i + 1) % o.length][1] - o[(i + 1) % o.length][0] * o[i][1];
    expect(a / 2).toBeCloseTo(12, 9);
    expect(o[0]).not.toEqual(o[o.length - 1]);
  });

  it("pieces do not overlap and keep the gap; shapes are moved rigidly", () => {
    const parts = [oblong(0.2, 10, 2), oblong(1.0, 5, 5), oblong(-0.4, 3, 1), oblong(2, 8, 4)];
    const laid = layoutPieces(parts.map((p) => ({ ...p, onSheet: true })), { gap: 0.5, sheetWidth: 16 });
    for (let i = 0; i < laid.length; i++) {
      const a = laid[i].placement;
      expect(a.x + a.width).toBeLessThanOrEqual(16 + 1e-9);
      for (let j = i + 1; j < laid.length; j++) {
        const b = laid[j].placement;
        const apart = a.x + a.width + 0.5 <= b.x + 1e-9 || b.x + b.width + 0.5 <= a.x + 1e-9 || a.y + a.height + 0.5 <= b.y + 1e-9 || b.y + b.height + 0.5 <= a.y + 1e-9;
        expect(apart).toBe(true);
      }
      // rigid: edge lengths unchanged
      const t = parts[i].triangles, u0 = parts[i].uv, u1 = laid[i].uv;
      for (let f = 0; f < t.length; f += 3) {
        const d0 = Math.hypot(u0[2 * t[f]] - u0[2 * t[f + 1]], u0[2 * t[f] + 1] - u0[2 * t[f + 1] + 1]);
        const d1 = Math.hypot(u1[2 * t[f]] - u1[2 * t[f + 1]], u1[2 * t[f] + 1] - u1[2 * t[f + 1] + 1]);
        expect(d1).toBeCloseTo(d0, 9);
      }
    }
  });

  it("rows: tallest first, wrap at the sheet width", () => {
    const c = packRows([{ width: 4, height: 1 }, { width: 4, height: 3 }, { width: 4, height: 2 }], 1, 9);
    expect([c[2], c[3]]).toEqual([0, 0]);
    expect([c[4], c[5]]).toEqual([5, 0]);
    expect([c[0], c[1]]).toEqual([0, 4]);
  });
});
