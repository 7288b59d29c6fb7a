import { describe, expect, it } from "vitest";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { foldedSheet } from "@/lib/geometry/shapes/folded-sheet";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";
import { computeLivePieces } from "@/lib/studio/live-pieces";
import { SeamSet } from "@/lib/studio/seam-set";
import { suggestSharpSeams } from "@/lib/studio/sharp-suggestions";
import { createStretchEstimator } from "@/lib/studio/stretch-estimate";
import { stretchLimitOf, suggestDarts } from "@/lib/studio/dart-suggestions";
import { pendingSuggestions } from "@/lib/studio/suggestion";
import { buildStudioMesh } from "@/lib/studio/studio-mesh";
import { chainPairs, ring, seamFlags, transformed } from "./fixtures";

describe("sharp ridge and valley suggestions", () => {
  it("a cube with a 30° threshold suggests its 12 edges as ridges, one run per edge", () => {
    const size = 3, n = 3;
    const sm = buildStudioMesh(cube({ size, subdivisions: n }));
    const s = suggestSharpSeams(sm, { thresholdDeg: 30 });
    expect(s.length).toBe(12);
    const seen = new Set<number>();
    for (const r of s) {
      expect(r.kind).toBe("ridge");
      expect(r.edges.length).toBe(n);
      expect(r.length).toBeCloseTo(size, 12);
      // Source: a cube's faces meet at 90° inside, so 270° measured outside (dihedral-angles.ts convention)
      expect(r.meanDihedral).toBeCloseTo(270, 9);
      for (const e of r.edges) seen.add(e);
      // every vertex on a cube edge: two coordinates at ±size/2
      for (const v of r.vertices) {
        const onFace = [0, 1, 2].filter((k) => Math.abs(Math.abs(sm.mesh.positions[3 * v + k]) - size / 2) < 1e-12).length;
        expect(onFace).toBeGreaterThanOrEqual(2);
      }
    }
    expect(seen.size).toBe(12 * n);
    expect(new Set(s.map((r) => r.id)).size).toBe(12);
  });

  it("above the turn of the cube edges (90°) nothing is suggested; ids are stable between calls", () => {
    const sm = buildStudioMesh(cube({ size: 1, subdivisions: 2 }));
    expect(suggestSharpSeams(sm, { thresholdDeg: 91 })).toEqual([]);
    expect(suggestSharpSeams(sm, { thresholdDeg: 10 }).map((r) => r.id)).toEqual(suggestSharpSeams(sm, { thresholdDeg: 60 }).map((r) => r.id));
  });

  it("edges already on a seam are not suggested again", () => {
    const sm = buildStudioMesh(cube({ size: 1, subdivisions: 1 }));
    const all = suggestSharpSeams(sm);
    const set = new SeamSet(sm);
    set.acceptSuggestion(all[0]);
    const again = suggestSharpSeams(sm, { onSeam: set.onSeam });
    expect(again.length).toBe(11);
    expect(again.map((r) => r.id)).not.toContain(all[0].id);
    expect(pendingSuggestions(all, (id) => set.decision(id)).length).toBe(11);
  });

  it("a folded sheet's crease is a valley when folded towards the normals and a ridge when folded away", () => {
    const nx = 5, ny = 2, cols = nx + 1;
    const crease = Array.from({ length: cols }, (_, i) => ny * cols + i);
    for (const [fold, kind, dihedral] of [["up", "valley", 120], ["down", "ridge", 240]] as const) {
      const sm = buildStudioMesh(foldedSheet({ width: 5, depth: 1, dihedralDeg: 120, fold, cellsAlong: nx, cellsAcross: ny }));
      const s = suggestSharpSeams(sm, { thresholdDeg: 30 });
      expect(s.length).toBe(1);
      expect(s[0].kind).toBe(kind);
      expect(Array.from(s[0].vertices)).toEqual(crease);
      // Source: foldedSheet builds the fold with this dihedral; "up" is concave seen from outside
      expect(s[0].meanDihedral).toBeCloseTo(dihedral, 9);
      expect(s[0].length).toBeCloseTo(5, 12);
      // a 60° turn is under a 70° threshold
      expect(suggestSharpSeams(sm, { thresholdDeg: 70 })).toEqual([]);
    }
  });
});

describe("dart suggestions from the stretch estimate", () => {
  const eva = stretchLimitOf("eva");

  it("a hemisphere of a sphere is over the EVA limit and gets a dart from its rim to near its pole", () => {
    const B = 16, S = 32;
    const sm = buildStudioMesh(uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S }));
    const flags = seamFlags(sm, chainPairs(ring(S, B / 2)));
    const live = computeLivePieces(sm, flags);
    const est = createStretchEstimator(sm).estimate(live, flags);
    expect(est.length).toBe(2);
    for (const e of est) {
      // Source: Bertrand–Diguet–Puiseux, ε = K d²/6 with K = 1/R² and d = πR/2 (pole to equator): π²/24 ≈ 0.41
      expect(e.estimatedStretch).toBeGreaterThan(0.3);
      expect(e.estimatedStretch).toBeLessThan(0.45);
      // Source: Gauss–Bonnet, a hemisphere carries 2π of curvature; the rim vertices are excluded, so a bit less
      expect(e.totalCurvature).toBeGreaterThan(0.8 * 2 * Math.PI);
      expect(e.totalCurvature).toBeLessThan(2 * Math.PI);
    }
    const darts = suggestDarts(sm, est, eva);
    expect(darts.length).toBe(2);
    for (const d of darts) {
      expect(d.kind).toBe("dart");
      const start = d.vertices[0], tipZ = Math.abs(sm.mesh.positions[3 * d.vertices[d.vertices.length - 1] + 2]);
      expect(Math.abs(sm.mesh.positions[3 * start + 2])).toBeLessThan(1e-9); // starts on the equator seam
      expect(tipZ).toBeGreaterThan(0.9); // ends near a pole
      expect(d.reason).toMatch(/^Piece [AB] is curved enough to stretch about \d+ %/);
    }
    // accepting the dart cuts into the piece: the estimate of that piece drops
    const set = new SeamSet(sm);
    set.addRuns(chainPairs(ring(S, B / 2)).map((p) => p));
    set.acceptSuggestion(darts[0]);
    const live2 = computeLivePieces(sm, set.onSeam);
    const est2 = createStretchEstimator(sm).estimate(live2, set.onSeam);
    const piece = est.find((e) => e.label === darts[0].piece)!;
    expect(est2[piece.piece].estimatedStretch).toBeLessThan(piece.estimatedStretch);
  });

  it("a cylinder cut open along a line is developable: estimate 0, no dart", () => {
    const sm = buildStudioMesh(cylinderTube({ radius: 1, height: 3, segments: 16, bands: 6 }));
    const line = Array.from({ length: 7 }, (_, i) => 16 * i);
    const flags = seamFlags(sm, chainPairs(line));
    const live = computeLivePieces(sm, flags);
    expect(Array.from(live.isDisk)).toEqual([1]);
    const est = createStretchEstimator(sm).estimate(live, flags);
    // Source: Theorema Egregium, a cylinder has K = 0 (each interior vertex's corner angles sum to 2π)
    expect(est[0].totalCurvature).toBeLessThan(1e-9);
    expect(est[0].estimatedStretch).toBeLessThan(1e-9);
    expect(suggestDarts(sm, est, eva)).toEqual([]);
  });

  it("a closed piece is not a dart candidate (its problem is topology)", () => {
    const sm = buildStudioMesh(uvSphere({ radius: 1, latitudeBands: 6, longitudeSegments: 8 }));
    const flags = new Uint8Array(sm.edgeCount);
    const est = createStretchEstimator(sm).estimate(computeLivePieces(sm, flags), flags);
    expect(Number.isNaN(est[0].estimatedStretch)).toBe(true);
    expect(suggestDarts(sm, est, eva)).toEqual([]);
    expect(stretchLimitOf("no-such-foam")).toBe(0.02);
  });

  it("the estimate tracks the flattening's real stretch on spherical caps (30° and 60°)", () => {
    const B = 24, S = 48;
    const mesh = uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S });
    const sm = buildStudioMesh(mesh);
    const estimator = createStretchEstimator(sm);
    for (const k of [4, 8]) {
      const pairs = chainPairs(ring(S, k));
      const flags = seamFlags(sm, pairs);
      const est = estimator.estimate(computeLivePieces(sm, flags), flags)[0];
      // Source: flattenPiece (LSCM + length-preserving refinement) on the same cap: its measured max stretch
      const flat = flattenPiece(cutPieces(mesh, new Uint32Array(pairs.flat()))[0]);
      const ratio = est.estimatedStretch / flat.metrics.maxStretch;
      expect(ratio).toBeGreaterThan(0.9);
      expect(ratio).toBeLessThan(1.5);
      // Source: Bertrand–Diguet–Puiseux on a unit sphere, ε = θ²/6 for a cap of polar angle θ (the mesh is a bit flatter)
      const theta = (Math.PI * k) / B;
      expect(est.estimatedStretch).toBeLessThan((theta * theta) / 6);
      expect(est.estimatedStretch).toBeGreaterThan(0.8 * ((theta * theta) / 6));
    }
  });

  it("the estimate and the dart do not change when the mesh is scaled by 1e±6 and moved", () => {
    const base = uvSphere({ radius: 1, latitudeBands: 12, longitudeSegments: 24 });
    const pairs = chainPairs(ring(24, 6));
    const run = (mesh: typeof base) => {
      const sm = buildStudioMesh(mesh);
      const flags = seamFlags(sm, pairs);
      const est = createStretchEstimator(sm).estimate(computeLivePieces(sm, flags), flags);
      const unit = Math.hypot(...mesh.positions.subarray(0, 3).map((x, k) => x - mesh.positions[3 * (mesh.positions.length / 3 - 1) + k])) / 2;
      // the tip and the dart length; which of the equally short meridians the dart takes may differ by rounding
      return { est: est.map((e) => e.estimatedStretch), darts: suggestDarts(sm, est, eva).map((d) => [d.vertices[d.vertices.length - 1], d.length / unit]).sort((a, b) => a[0] - b[0]) };
    };
    const ref = run(base);
    for (const s of [1e-6, 1e6]) {
      const got = run(transformed(base, s, 5 * s, 0, -3 * s));
      got.est.forEach((x, i) => expect(x).toBeCloseTo(ref.est[i], 9));
      expect(got.darts.map((d) => d[0])).toEqual(ref.darts.map((d) => d[0]));
      got.darts.forEach((d, i) => expect(d[1]).toBeCloseTo(ref.darts[i][1], 9));
    }
  });
});
