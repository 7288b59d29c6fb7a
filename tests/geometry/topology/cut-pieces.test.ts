import { describe, expect, it } from "vitest";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { buildHalfEdges } from "@/lib/geometry/topology/half-edge";
import { pieceLabel } from "@/lib/geometry/topology/piece-label";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";

const seams = (pairs: [number, number][]) => new Uint32Array(pairs.flat());

describe("half-edge connectivity", () => {
  it("twins are h^1, next cycles faces, boundary half-edges have face −1", () => {
    const g = flatGrid({ faces: 50 });
    const he = buildHalfEdges(g.triangles, g.positions.length / 3);
    for (let h = 0; h < 2 * he.edgeCount; h++) {
      expect(he.vertex[h ^ 1]).toBe(he.vertex[he.next[h]]); // twin starts where h ends
      if (he.face[h] >= 0) expect(he.next[he.next[he.next[h]]]).toBe(h);
    }
  });

  it("reports a non-manifold edge (three faces) and keeps going", () => {
    const positions = new Float64Array([0, 0, 0, 1, 0, 0, 0, 1, 0, 0, -1, 0, 0, 0, 1]);
    const triangles = new Uint32Array([0, 1, 2, 1, 0, 3, 0, 1, 4]);
    const he = buildHalfEdges(triangles, 5);
    expect(he.nonManifoldEdges + he.orientationConflicts).toBe(1);
    const pieces = cutPieces({ positions, triangles }, new Uint32Array());
    expect(pieces.length).toBe(2); // the third face is its own sheet
    expect(pieces.every((p) => p.topology.isDisk)).toBe(true);
  });
});

describe("cutPieces", () => {
  it("a cube cut along the 7 edges of a spanning tree unfolds to a disk with no stretch", () => {
    // corners: index = 4·ix + 2·iy + iz; a spanning tree of the 8 corners along cube edges
    const tree: [number, number][] = [[0, 1], [0, 2], [0, 4], [1, 3], [2, 6], [4, 5], [6, 7]];
    const pieces = cutPieces(cube({ size: 2 }), seams(tree));
    expect(pieces.length).toBe(1);
    expect(pieces[0].topology).toMatchObject({ isDisk: true, boundaryLoops: 1, eulerCharacteristic: 1, genus: 0, problem: null });
    expect(pieces[0].vertexIds.length).toBe(14); // each tree edge becomes two boundary edges: 2·7 boundary vertices
    const flat = flattenPiece(pieces[0]);
    expect(flat.metrics.maxStretch).toBeLessThan(1e-9);
    expect(flat.metrics.maxCompress).toBeLessThan(1e-9);
    expect(flat.metrics.flippedTriangles).toBe(0);
  });

  it("a closed sphere gets a 'closed surface' problem and a suggested cut that, applied, gives a disk", () => {
    const s = uvSphere({ radius: 1, latitudeBands: 10, longitudeSegments: 16 });
    const [p] = cutPieces(s, new Uint32Array());
    expect(p.topology).toMatchObject({ isDisk: false, boundaryLoops: 0, eulerCharacteristic: 2, genus: 0 });
    expect(p.topology.problem).toMatch(/^closed surface: add a seam from vertex \d+ to vertex \d+/);
    const cut = p.topology.suggestedCut!;
    expect(cut.length).toBeGreaterThan(0);
    const again = cutPieces(s, seams(cut));
    expect(again.length).toBe(1);
    expect(again[0].topology.isDisk).toBe(true);
    expect(() => flattenPiece(p)).toThrow(/closed surface/);
  });

  it("a tube without a seam gets a 'two boundary loops' problem whose cut joins them", () => {
    const t = cylinderTube({ radius: 1, height: 2, segments: 12, bands: 3 });
    const [p] = cutPieces(t, new Uint32Array());
    expect(p.topology).toMatchObject({ isDisk: false, boundaryLoops: 2, eulerCharacteristic: 0 });
    expect(p.topology.problem).toMatch(/^two boundary loops: join them with a seam from vertex \d+ to vertex \d+/);
    expect(p.topology.suggestedCut!.length).toBe(3); // the shortest path runs straight up: 3 bands
    const again = cutPieces(t, seams(p.topology.suggestedCut!));
    expect(again[0].topology.isDisk).toBe(true);
  });

  it("a sheet with nine holes gets a 'ten boundary loops' problem; the suggested seams join them into a disk", () => {
    const n = 20;
    const g = flatGrid({ faces: 2 * n * n });
    const holes = new Set<number>();
    for (let a = 0; a < 3; a++) for (let b = 0; b < 3; b++) holes.add((3 + 6 * a) * n + 3 + 6 * b); // cells (row, col)
    const kept: number[] = [];
    for (let c = 0; c < n * n; c++) if (!holes.has(c)) kept.push(...g.triangles.subarray(6 * c, 6 * c + 6));
    const mesh = { positions: g.positions, triangles: new Uint32Array(kept) };
    const [p] = cutPieces(mesh, new Uint32Array());
    expect(p.topology).toMatchObject({ isDisk: false, boundaryLoops: 10, genus: 0 });
    expect(p.topology.problem).toMatch(/^ten boundary loops: join them with seams from vertex \d+ to vertex \d+, .* and 6 more\.$/);
    const again = cutPieces(mesh, seams(p.topology.suggestedCut!));
    expect(again.length).toBe(1);
    expect(again[0].topology.isDisk).toBe(true);
    // neighbouring holes are 5 cells apart and the nearest ones 3 cells from the edge: 9 connections of ≤ 5 edges
    expect(p.topology.suggestedCut!.length).toBeLessThanOrEqual(9 * 5);
  });

  it("a torus-like handle gets a 'handle (genus 1)' problem and a cut graph that opens it to a disk", () => {
    // torus: N×M grid on the torus surface
    const n = 12, m = 8, R = 3, r = 1;
    const pos = new Float64Array(3 * n * m);
    const tri: number[] = [];
    for (let i = 0; i < n; i++) for (let j = 0; j < m; j++) {
      const u = (2 * Math.PI * i) / n, v = (2 * Math.PI * j) / m, k = 3 * (i * m + j);
      pos[k] = (R + r * Math.cos(v)) * Math.cos(u); pos[k + 1] = (R + r * Math.cos(v)) * Math.sin(u); pos[k + 2] = r * Math.sin(v);
      const a = i * m + j, b = ((i + 1) % n) * m + j, c = ((i + 1) % n) * m + ((j + 1) % m), d = i * m + ((j + 1) % m);
      tri.push(a, b, c, a, c, d);
    }
    const torus = { positions: pos, triangles: new Uint32Array(tri) };
    const [p] = cutPieces(torus, new Uint32Array());
    expect(p.topology).toMatchObject({ isDisk: false, boundaryLoops: 0, eulerCharacteristic: 0, genus: 1 });
    expect(p.topology.problem).toMatch(/^handle \(genus 1\): add a seam around/);
    const again = cutPieces(torus, seams(p.topology.suggestedCut!));
    expect(again.length).toBe(1);
    expect(again[0].topology.isDisk).toBe(true);
  });

  it("a slit that ends inside a piece opens into boundary (vertices split only where the seam separates faces)", () => {
    const g = flatGrid({ faces: 2 * 4 * 4 }); // 5×5 vertices, vertex (i, r) = 5r + i
    const slit: [number, number][] = [[10, 11], [11, 12]]; // from the left edge into the middle
    const [p] = cutPieces(g, seams(slit));
    expect(p.topology.isDisk).toBe(true);
    expect(p.vertexIds.length).toBe(25 + 2); // 10 (on the boundary) and 11 are split; 12, the slit's end, is not
    const ids = Array.from(p.vertexIds);
    expect(ids.filter((v) => v === 11).length).toBe(2);
    expect(ids.filter((v) => v === 12).length).toBe(1);
  });

  it("labels A…Z, AA, AB… in the order of the smallest face id", () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map(pieceLabel)).toEqual(["A", "B", "Z", "AA", "AB", "AZ", "BA", "ZZ", "AAA"]);
    const g = flatGrid({ faces: 2 * 5 * 5 }); // 50 triangles
    const all: [number, number][] = [];
    const t = g.triangles;
    for (let f = 0; f < t.length; f += 3) all.push([t[f], t[f + 1]], [t[f + 1], t[f + 2]], [t[f + 2], t[f]]);
    const pieces = cutPieces(g, seams(all));
    expect(pieces.length).toBe(50);
    expect(pieces.map((p) => p.label).slice(24, 29)).toEqual(["Y", "Z", "AA", "AB", "AC"]);
    pieces.forEach((p, i) => expect(p.faces[0]).toBe(i));
  });
});
