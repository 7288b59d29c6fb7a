import { describe, expect, it } from "vitest";
import { coneLateral } from "@/lib/geometry/shapes/cone-lateral";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { foldedSheet } from "@/lib/geometry/shapes/folded-sheet";
import { frustumLateral } from "@/lib/geometry/shapes/frustum-lateral";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";
import type { PieceMesh } from "@/lib/geometry/topology/piece-mesh";

const dist = (uv: Float64Array, a: number, b: number) => Math.hypot(uv[2 * a] - uv[2 * b], uv[2 * a + 1] - uv[2 * b + 1]);
/** local copies of a working vertex */
const copies = (p: PieceMesh, w: number) => Array.from(p.vertexIds.keys()).filter((i) => p.vertexIds[i] === w);
/** seam along generator j = 0 of a ring-structured mesh: vertices first, first + step, … */
function generator(first: number, step: number, edges: number): Uint32Array {
  const s: number[] = [];
  for (let i = 0; i < edges; i++) s.push(first + i * step, first + (i + 1) * step);
  return new Uint32Array(s);
}
/** Sum over the triangles at local vertex `v` of their flat interior angle at v. */
function flatAngleAt(p: PieceMesh, uv: Float64Array, v: number): number {
  let total = 0;
  const t = p.triangles;
  for (let f = 0; f < t.length; f += 3) {
    for (let k = 0; k < 3; k++) {
      if (t[f + k] !== v) continue;
      const a = t[f + ((k + 1) % 3)], b = t[f + ((k + 2) % 3)];
      const ax = uv[2 * a] - uv[2 * v], ay = uv[2 * a + 1] - uv[2 * v + 1];
      const bx = uv[2 * b] - uv[2 * v], by = uv[2 * b + 1] - uv[2 * v + 1];
      total += Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
    }
  }
  return total;
}

describe("developable surfaces flatten exactly", () => {
  it("an N-gon tube cut along one generator becomes a rectangle N·2r·sin(π/N) × h", () => {
    // Source: sheet-metal pattern development, stretchout = perimeter of the cross-section (e.g. any sheet-metal
    // layout handbook, parallel-line development of a prism); perimeter of a regular N-gon of circumradius r =
    // N·2r·sin(π/N) (elementary geometry).
    const N = 24, r = 1.5, h = 4, bands = 6;
    const mesh = cylinderTube({ radius: r, height: h, segments: N, bands });
    const [p] = cutPieces(mesh, generator(0, N, bands));
    expect(p.topology.isDisk).toBe(true);
    const flat = flattenPiece(p);
    const W = N * 2 * r * Math.sin(Math.PI / N);
    const [b0, b1] = copies(p, 0);
    const [t0, t1] = copies(p, N * bands);
    const rel = (x: number, y: number) => Math.abs(x - y) / y;
    expect(rel(dist(flat.uv, b0, b1), W)).toBeLessThan(1e-6);
    expect(rel(dist(flat.uv, t0, t1), W)).toBeLessThan(1e-6);
    expect(rel(dist(flat.uv, b0, t0), h)).toBeLessThan(1e-6);
    expect(rel(dist(flat.uv, b1, t1), h)).toBeLessThan(1e-6);
    expect(rel(dist(flat.uv, b0, t1), Math.hypot(W, h))).toBeLessThan(1e-6); // right angles
    expect(flat.metrics.maxStretch).toBeLessThan(1e-6);
    expect(flat.metrics.maxCompress).toBeLessThan(1e-6);
    expect(flat.metrics.flippedTriangles).toBe(0);
    // LSCM alone is already exact on a developable piece (a conformal isometry exists), after area scaling
    expect(flat.lscmMetrics.maxStretch).toBeLessThan(1e-6);
  });

  it("a cone cut along a generator becomes a sector of radius s and angle Σ apex angles ≈ 360°·r/s", () => {
    const N = 96, r = 1, H = 2.5, bands = 4;
    const s = Math.hypot(r, H);
    const mesh = coneLateral({ radius: r, height: H, segments: N, bands });
    // seam: apex → ring-1 vertex 1, then down the generator through vertex 1 of every ring
    const [p] = cutPieces(mesh, new Uint32Array([0, 1, ...generator(1, N, bands - 1)]));
    expect(p.topology.isDisk).toBe(true);
    const flat = flattenPiece(p);
    const apex = copies(p, 0);
    expect(apex.length).toBe(1);
    // every base-ring vertex lies at the slant height from the apex
    for (let j = 0; j < N; j++) {
      for (const v of copies(p, 1 + (bands - 1) * N + j)) expect(Math.abs(dist(flat.uv, apex[0], v) - s) / s).toBeLessThan(1e-6);
    }
    // polygonal cone: each apex triangle has apex angle 2·asin(r·sin(π/N)/s) (isosceles, chord 2r·sin(π/N))
    const polygonal = 2 * N * Math.asin((r * Math.sin(Math.PI / N)) / s);
    const sector = flatAngleAt(p, flat.uv, apex[0]);
    expect(Math.abs(sector - polygonal) / polygonal).toBeLessThan(1e-6);
    // Source: development of a right circular cone, sector angle θ = 360°·r/s (radial-line development, any
    // sheet-metal layout handbook). The inscribed N-gon cone differs by O(1/N²): 1 − sin(x)/x, x = π/N → 1.8e−4.
    const smooth = (2 * Math.PI * r) / s;
    expect(Math.abs(sector - smooth) / smooth).toBeLessThan(2e-4);
    expect(flat.metrics.maxStretch).toBeLessThan(1e-6);
  });

  it("frustum worked example: Ø5 in and Ø8 in, 4 in apart → radii 7.12 in and 11.39 in, sector 126.4°", () => {
    // Source: radial-line development of a frustum (standard sheet-metal layout): slant = √(4² + 1.5²) = 4.272 in,
    // R2 = slant·r2/(r2 − r1) = 4.272·4/1.5 = 11.39 in, R1 = 11.39 − 4.272 = 7.12 in, angle = 360°·r2/R2 = 126.4°.
    const N = 256, bands = 3;
    const mesh = frustumLateral({ r1: 2.5, r2: 4, height: 4, segments: N, bands });
    const [p] = cutPieces(mesh, generator(0, N, bands));
    const flat = flattenPiece(p);
    const [b0, b1] = copies(p, 0);
    const [t0, t1] = copies(p, N * bands);
    // the two flat copies of the seam edge: pair each bottom copy with the top copy on the same side (slant apart)
    const sameSide = Math.abs(dist(flat.uv, b0, t0) - Math.hypot(4, 1.5)) < 1e-6;
    const [u0, u1] = sameSide ? [t0, t1] : [t1, t0];
    // pattern centre = intersection of the two seam lines b0→u0 and b1→u1: O = b0 + t·d1
    const P = (i: number) => [flat.uv[2 * i], flat.uv[2 * i + 1]];
    const [ax, ay] = P(b0), [bx, by] = P(u0), [cx, cy] = P(b1), [dx, dy] = P(u1);
    const d1x = bx - ax, d1y = by - ay, d2x = dx - cx, d2y = dy - cy;
    const den = d1x * d2y - d1y * d2x;
    const tt = ((cx - ax) * d2y - (cy - ay) * d2x) / den;
    const ox = ax + tt * d1x, oy = ay + tt * d1y;
    const R1 = Math.hypot(ax - ox, ay - oy), R2 = Math.hypot(bx - ox, by - oy);
    const angle = (Math.acos(((ax - ox) * (cx - ox) + (ay - oy) * (cy - oy)) / (R1 * Math.hypot(cx - ox, cy - oy))) * 180) / Math.PI;
    expect(Math.abs(R1 - 7.12)).toBeLessThan(0.005);
    expect(Math.abs(R2 - 11.39)).toBeLessThan(0.005);
    expect(Math.abs(angle - 126.4)).toBeLessThan(0.05);
    expect(flat.metrics.maxStretch).toBeLessThan(1e-6);
  });

  it("a folded sheet (one crease) flattens to its two rectangles with no stretch, up or down", () => {
    for (const fold of ["up", "down"] as const) {
      const m = foldedSheet({ width: 3, depth: 1, dihedralDeg: 70, fold, cellsAlong: 6, cellsAcross: 3 });
      const [p] = cutPieces(m, new Uint32Array());
      const flat = flattenPiece(p);
      expect(flat.metrics.maxStretch).toBeLessThan(1e-6);
      expect(flat.metrics.maxCompress).toBeLessThan(1e-6);
      const last = p.vertexIds.length - 1; // far corner of the second rectangle; vertex 0 is the first's far corner
      expect(Math.abs(dist(flat.uv, 0, last) - Math.hypot(3, 2))).toBeLessThan(1e-6);
    }
  });
});
