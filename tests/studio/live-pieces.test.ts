import { describe, expect, it } from "vitest";
import type { TriMesh } from "@/lib/geometry/mesh";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { computeLivePieces, explainPiece } from "@/lib/studio/live-pieces";
import { pieceOutlineEdges } from "@/lib/studio/piece-outline";
import { buildStudioMesh, edgeBetween } from "@/lib/studio/studio-mesh";
import { chainPairs, meridian, ring, seamFlags } from "./fixtures";

/** Live pieces must equal cutPieces piece by piece: label, face set, counts, topology sentence. */
function expectSameAsCutPieces(mesh: TriMesh, pairs: [number, number][]): void {
  const sm = buildStudioMesh(mesh);
  const live = computeLivePieces(sm, seamFlags(sm, pairs));
  const ref = cutPieces(mesh, new Uint32Array(pairs.flat()));
  expect(live.count).toBe(ref.length);
  ref.forEach((piece, p) => {
    expect(live.labels[p]).toBe(piece.label);
    expect(Array.from(live.pieceFaces.subarray(live.pieceFaceStart[p], live.pieceFaceStart[p + 1]))).toEqual(Array.from(piece.faces));
    expect(live.vertices[p]).toBe(piece.vertexIds.length);
    expect(live.isDisk[p] === 1).toBe(piece.topology.isDisk);
    expect(live.boundaryLoops[p]).toBe(piece.topology.boundaryLoops);
    expect(live.eulerCharacteristic[p]).toBe(piece.topology.eulerCharacteristic);
    expect(live.genus[p]).toBe(piece.topology.genus);
    expect(explainPiece(sm, live, p)).toEqual(piece.topology);
    for (const f of piece.faces) expect(live.facePiece[f]).toBe(p);
  });
}

describe("live pieces equal cutPieces", () => {
  const B = 8, S = 12;
  const sphere = uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S });
  const cases: [string, TriMesh, [number, number][]][] = [
    ["closed sphere, no seams", sphere, []],
    ["sphere cut at the equator (two hemispheres)", sphere, chainPairs(ring(S, B / 2))],
    ["sphere with one meridian (closed piece with a slit)", sphere, chainPairs(meridian(B, S, 0))],
    ["sphere with two meridians (two gores)", sphere, [...chainPairs(meridian(B, S, 0)), ...chainPairs(meridian(B, S, 6))]],
    ["sphere: equator and three rings (five bands, two caps)", sphere, [...chainPairs(ring(S, 2)), ...chainPairs(ring(S, 4)), ...chainPairs(ring(S, 6))]],
    ["sphere: a one-edge slit and a two-edge slit inside a piece", sphere, [[13, 14], [37, 38], [38, 39]]],
    ["cube with the 7 edges of a spanning tree", cube({ size: 2 }), [[0, 1], [0, 2], [0, 4], [1, 3], [2, 6], [4, 5], [6, 7]]],
    ["cube: all 12 edges (six faces)", cube({ size: 2 }), [[0, 1], [0, 2], [0, 4], [1, 3], [1, 5], [2, 3], [2, 6], [3, 7], [4, 5], [4, 6], [5, 7], [6, 7]]],
    ["open cylinder (two loops), no seams", cylinderTube({ radius: 1, height: 2, segments: 10, bands: 3 }), []],
    ["cylinder cut along a line (disk)", cylinderTube({ radius: 1, height: 2, segments: 10, bands: 3 }), [[0, 10], [10, 20], [20, 30]]],
    ["cylinder with a ring cut (two tubes)", cylinderTube({ radius: 1, height: 2, segments: 10, bands: 3 }), chainPairs([10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 10])],
    ["grid with an interior slit", flatGrid({ faces: 72 }), [[8, 9], [9, 10], [10, 11]]],
  ];
  for (const [name, mesh, pairs] of cases) it(name, () => expectSameAsCutPieces(mesh, pairs));

  it("a mesh with a non-manifold edge takes the rebuilt path and still matches", () => {
    const positions = new Float64Array([0, 0, 0, 1, 0, 0, 0, 1, 0, 0, -1, 0, 0, 0, 1, 1, 1, 1]);
    const triangles = new Uint32Array([0, 1, 2, 1, 0, 3, 0, 1, 4, 1, 5, 4]);
    const sm = buildStudioMesh({ positions, triangles });
    expect(computeLivePieces(sm, new Uint8Array(sm.edgeCount)).method).toBe("rebuilt");
    expectSameAsCutPieces({ positions, triangles }, []);
    expectSameAsCutPieces({ positions, triangles }, [[1, 4]]);
  });
});

describe("disk detection", () => {
  it("hemispheres are disks; a closed sphere and a tube are not, with the reason in words", () => {
    const B = 8, S = 12;
    const sm = buildStudioMesh(uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S }));
    const closed = computeLivePieces(sm, new Uint8Array(sm.edgeCount));
    expect(closed.count).toBe(1);
    expect(closed.isDisk[0]).toBe(0);
    // Source: Euler's formula, χ(sphere) = 2
    expect(closed.eulerCharacteristic[0]).toBe(2);
    expect(explainPiece(sm, closed, 0).problem).toMatch(/^closed surface/);
    const halves = computeLivePieces(sm, seamFlags(sm, chainPairs(ring(S, B / 2))));
    expect(Array.from(halves.isDisk)).toEqual([1, 1]);
    expect(halves.labels).toEqual(["A", "B"]);
    const tube = buildStudioMesh(cylinderTube({ radius: 1, height: 1, segments: 8 }));
    const t = computeLivePieces(tube, new Uint8Array(tube.edgeCount));
    // Source: χ(annulus) = 0, two boundary loops
    expect([t.eulerCharacteristic[0], t.boundaryLoops[0], t.isDisk[0]]).toEqual([0, 2, 0]);
    expect(explainPiece(tube, t, 0).problem).toMatch(/^two boundary loops/);
    expect(edgeBetween(tube, 0, 8)).toBeGreaterThanOrEqual(0);
  });
});

describe("piece outline", () => {
  it("a hemisphere's outline is its equator; an open tube's are its two rims", () => {
    const B = 8, S = 12;
    const sm = buildStudioMesh(uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S }));
    const flags = seamFlags(sm, chainPairs(ring(S, B / 2)));
    const live = computeLivePieces(sm, flags);
    const equator = Array.from(flags).flatMap((f, e) => (f ? [e] : []));
    expect(Array.from(pieceOutlineEdges(sm, live, flags, 0))).toEqual(equator);
    expect(Array.from(pieceOutlineEdges(sm, live, flags, 1))).toEqual(equator);
    const tube = buildStudioMesh(cylinderTube({ radius: 1, height: 1, segments: 8, bands: 2 }));
    const none = new Uint8Array(tube.edgeCount);
    expect(pieceOutlineEdges(tube, computeLivePieces(tube, none), none, 0).length).toBe(16);
  });
});
