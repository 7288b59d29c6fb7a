import { describe, expect, it } from "vitest";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";

describe("spherical gores", () => {
  it("a UV sphere cut along meridians into n gores: each gore's width follows (2πR/n)·cos φ", () => {
    const n = 12, perGore = 4, B = 36, S = n * perGore, R = 2;
    const m = uvSphere({ radius: R, latitudeBands: B, longitudeSegments: S });
    const south = m.positions.length / 3 - 1;
    const ring = (k: number, j: number) => 1 + (k - 1) * S + (j % S);
    const seam: number[] = [];
    for (let j = 0; j < S; j += perGore) {
      seam.push(0, ring(1, j));
      for (let k = 1; k < B - 1; k++) seam.push(ring(k, j), ring(k + 1, j));
      seam.push(ring(B - 1, j), south);
    }
    const pieces = cutPieces(m, new Uint32Array(seam));
    expect(pieces.length).toBe(n);
    expect(pieces.every((p) => p.topology.isDisk)).toBe(true);
    const p = pieces[0];
    const flat = flattenPiece(p);
    expect(flat.metrics.flippedTriangles).toBe(0);
    const local = new Map<number, number>();
    p.vertexIds.forEach((w, i) => { if (!local.has(w)) local.set(w, i); });
    const d = (a: number, b: number) => Math.hypot(flat.uv[2 * a] - flat.uv[2 * b], flat.uv[2 * a + 1] - flat.uv[2 * b + 1]);
    // Source: the sinusoidal (Sanson–Flamsteed) gore used for globe gores: width at latitude φ = (2πR/n)·cos φ,
    // central meridian true length πR (Snyder 1987, "Map Projections — A Working Manual", USGS PP 1395, §30).
    // A sphere is not developable: any flat gore distorts lengths by a fraction of order α²/3 for half-width
    // α = π/n (here 0.023, and the measured max stretch is of that size), so widths are checked to that fraction
    // of the equator width. The polygonal sphere adds only 1 − sin(x)/x, x = π/S (1.8e−4).
    const alpha = Math.PI / n;
    const tol = (alpha * alpha) / 3;
    const equatorWidth = (2 * Math.PI * R) / n;
    // gore 0 spans ring vertices j = 0 … perGore; its flat width at ring k is the flat length of that ring polyline
    for (let k = 1; k < B; k++) {
      const phi = Math.PI / 2 - (Math.PI * k) / B;
      let width = 0;
      for (let j = 0; j < perGore; j++) width += d(local.get(ring(k, j))!, local.get(ring(k, j + 1))!);
      expect(Math.abs(width - equatorWidth * Math.cos(phi)) / equatorWidth).toBeLessThan(tol);
    }
    // central meridian (j = perGore/2) from pole to pole ≈ πR
    let meridian = d(local.get(0)!, local.get(ring(1, perGore / 2))!) + d(local.get(ring(B - 1, perGore / 2))!, local.get(south)!);
    for (let k = 1; k < B - 1; k++) meridian += d(local.get(ring(k, perGore / 2))!, local.get(ring(k + 1, perGore / 2))!);
    expect(Math.abs(meridian - Math.PI * R) / (Math.PI * R)).toBeLessThan(tol);
    expect(flat.metrics.maxStretch).toBeLessThan(tol);
    expect(flat.metrics.maxStretch).toBeGreaterThan(0.1 * tol); // a sphere really is not developable
  });
});
