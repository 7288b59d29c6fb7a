import { describe, expect, it } from "vitest";
import { cube } from "@/lib/geometry/shapes/cube";
import { foldedSheet } from "@/lib/geometry/shapes/folded-sheet";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { dihedralAngles } from "@/lib/geometry/marks/dihedral-angles";
import { seamEdgeFaces } from "@/lib/geometry/marks/seam-edge-faces";
import { buildSeamRuns } from "@/lib/geometry/marks/seam-runs";
import { pieceFaceIndex } from "@/lib/geometry/marks/piece-face-index";
import { bevelFromDihedral, classifyBevel, STRAIGHT_BEVEL_DEG } from "@/lib/geometry/marks/bevel-kind";
import type { TriMesh } from "@/lib/geometry/mesh";

/** The 12 edges of a unit cube with corner ids 4·ix + 2·iy + iz. */
function cubeEdges(): Uint32Array {
  const e: number[] = [];
  for (let a = 0; a < 8; a++) for (const bit of [4, 2, 1]) if (!(a & bit)) e.push(a, a | bit);
  return new Uint32Array(e);
}

function angles(mesh: TriMesh, seams: Uint32Array): Float64Array {
  const sef = seamEdgeFaces(mesh.triangles, mesh.positions.length / 3, seams);
  return dihedralAngles(mesh.positions, mesh.triangles, sef.a, sef.b, sef.faceAB, sef.faceBA);
}

function crease(cellsAlong: number, cellsAcross: number): Uint32Array {
  const cols = cellsAlong + 1, r = cellsAcross, e: number[] = [];
  for (let i = 0; i < cellsAlong; i++) e.push(r * cols + i, r * cols + i + 1);
  return new Uint32Array(e);
}

describe("dihedral angles, measured outside (180 = flat)", () => {
  it("cube edges: 90° corners read 270° outside, bevel 45° per side, ridge", () => {
    // Source: the dihedral angle of a cube is 90° (regular polyhedra tables); outside it is 360° − 90° = 270°.
    // Source: a mitre splits the corner in two: each side of a 90° corner is cut at 45° (mitre joint rule).
    const m = cube({ size: 2 });
    const d = angles(m, cubeEdges());
    expect(d.length).toBe(12);
    for (const a of d) {
      expect(a).toBeCloseTo(270, 9);
      expect(Math.abs(bevelFromDihedral(a))).toBeCloseTo(45, 9);
      expect(classifyBevel(a)).toEqual({ kind: "ridge", opensTo: "inner" });
    }
  });

  it("unchanged when the cube is scaled by 1e±6 or moved", () => {
    for (const s of [1e-6, 1e6]) {
      const m = cube({ size: s });
      for (let i = 0; i < m.positions.length; i++) m.positions[i] += (i % 3 === 0 ? 123.4 : -7) * s;
      for (const a of angles(m, cubeEdges())) expect(a).toBeCloseTo(270, 6);
    }
  });

  for (const deg of [30, 90, 135, 170]) {
    it(`folded sheet built with a ${deg}° fold reads ${deg}° as a valley and ${360 - deg}° as a ridge`, () => {
      // The fixture is built with this dihedral (foldedSheet: "up" folds towards the normals = concave outside).
      const up = foldedSheet({ width: 4, depth: 1, dihedralDeg: deg, fold: "up", cellsAlong: 4, cellsAcross: 2 });
      const down = foldedSheet({ width: 4, depth: 1, dihedralDeg: deg, fold: "down", cellsAlong: 4, cellsAcross: 2 });
      for (const a of angles(up, crease(4, 2))) expect(a).toBeCloseTo(deg, 9);
      for (const a of angles(down, crease(4, 2))) expect(a).toBeCloseTo(360 - deg, 9);
      const bevel = (180 - deg) / 2;
      expect(classifyBevel(deg).kind).toBe(bevel < STRAIGHT_BEVEL_DEG ? "straight" : "valley");
      expect(classifyBevel(360 - deg).kind).toBe(bevel < STRAIGHT_BEVEL_DEG ? "straight" : "ridge");
    });
  }

  it("a flat seam reads 180° and is straight; the threshold sits at 5° per side", () => {
    const flat = foldedSheet({ width: 1, depth: 1, dihedralDeg: 180, fold: "up" });
    for (const a of angles(flat, crease(1, 1))) expect(a).toBeCloseTo(180, 9);
    expect(classifyBevel(180)).toEqual({ kind: "straight", opensTo: "none" });
    expect(classifyBevel(180 - 2 * 4.9).kind).toBe("straight");
    expect(classifyBevel(180 - 2 * 5.1).kind).toBe("valley");
  });

  it("a seam on the mesh border has no dihedral", () => {
    const flat = foldedSheet({ width: 1, depth: 1, dihedralDeg: 120, fold: "up" });
    expect(Number.isNaN(angles(flat, new Uint32Array([0, 1]))[0])).toBe(true);
  });
});

describe("seam runs", () => {
  it("cube cut on all 12 edges: 6 pieces, 12 runs of one edge, each between two different pieces", () => {
    const m = cube({ size: 1 });
    const seams = cubeEdges();
    const pieces = cutPieces(m, seams);
    expect(pieces.length).toBe(6);
    const sef = seamEdgeFaces(m.triangles, 8, seams);
    const { facePiece } = pieceFaceIndex(pieces, m.triangles.length / 3);
    const runs = buildSeamRuns(sef, facePiece, 8);
    expect(runs.count).toBe(12);
    const pairs = new Set<string>();
    for (let r = 0; r < runs.count; r++) {
      expect(runs.edgeStart[r + 1] - runs.edgeStart[r]).toBe(1);
      expect(runs.pieceL[r]).not.toBe(runs.pieceR[r]);
      pairs.add([runs.pieceL[r], runs.pieceR[r]].sort().join("-"));
    }
    expect(pairs.size).toBe(12);
  });

  it("folded sheet crease of 4 edges is one open run; splitting the seam list order does not change it", () => {
    const m = foldedSheet({ width: 4, depth: 1, dihedralDeg: 100, fold: "down", cellsAlong: 4, cellsAcross: 1 });
    const seams = crease(4, 1);
    const shuffled = new Uint32Array([seams[4], seams[5], seams[0], seams[1], seams[7], seams[6], seams[2], seams[3]]);
    for (const s of [seams, shuffled]) {
      const pieces = cutPieces(m, s);
      const sef = seamEdgeFaces(m.triangles, m.positions.length / 3, s);
      const runs = buildSeamRuns(sef, pieceFaceIndex(pieces, m.triangles.length / 3).facePiece, m.positions.length / 3);
      expect(runs.count).toBe(1);
      expect(runs.closed[0]).toBe(0);
      expect(runs.edgeStart[1]).toBe(4);
    }
  });

  it("a ring seam around a tube is one closed run between the two halves, starting at its smallest vertex", () => {
    const N = 12, m = cylinderTube({ radius: 5, height: 4, segments: N, bands: 2 });
    const ring: number[] = [];
    for (let j = N - 1; j >= 0; j--) ring.push(N + j, N + ((j + 1) % N));
    const seams = new Uint32Array(ring);
    const pieces = cutPieces(m, seams);
    expect(pieces.length).toBe(2);
    const sef = seamEdgeFaces(m.triangles, m.positions.length / 3, seams);
    const runs = buildSeamRuns(sef, pieceFaceIndex(pieces, m.triangles.length / 3).facePiece, m.positions.length / 3);
    expect(runs.count).toBe(1);
    expect(runs.closed[0]).toBe(1);
    expect(runs.edgeStart[1]).toBe(N);
    expect(new Set([runs.pieceL[0], runs.pieceR[0]])).toEqual(new Set([0, 1]));
    const first = runs.forward[0] ? sef.a[runs.edges[0]] : sef.b[runs.edges[0]];
    expect(first).toBe(N);
  });

  it("a run splits where a third seam branches off", () => {
    // crease plus a cut across the first rectangle at x = 2: the crease vertex at x = 2 has three seam edges
    const m = foldedSheet({ width: 4, depth: 1, dihedralDeg: 100, fold: "down", cellsAlong: 4, cellsAcross: 1 });
    const seams = new Uint32Array([...crease(4, 1), 2, 7]);
    const pieces = cutPieces(m, seams);
    expect(pieces.length).toBe(3);
    const sef = seamEdgeFaces(m.triangles, m.positions.length / 3, seams);
    const runs = buildSeamRuns(sef, pieceFaceIndex(pieces, m.triangles.length / 3).facePiece, m.positions.length / 3);
    expect(runs.count).toBe(3);
  });
});
