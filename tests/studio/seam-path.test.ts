import { describe, expect, it } from "vitest";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { dijkstra } from "@/lib/geometry/topology/shortest-paths";
import { buildHalfEdges } from "@/lib/geometry/topology/half-edge";
import { vertexAdjacency } from "@/lib/geometry/topology/vertex-adjacency";
import { createSeamPathFinder } from "@/lib/studio/seam-path";
import { snapToVertex } from "@/lib/studio/snap-pick";
import { buildStudioMesh, edgeBetween } from "@/lib/studio/studio-mesh";
import { transformed } from "./fixtures";

describe("seam path finder", () => {
  it("on a grid: a row is n cell widths, the diagonal of the diagonal cells k·√2 cell widths", () => {
    const n = 20, size = 10, h = size / n, m = n + 1;
    const sm = buildStudioMesh(flatGrid({ faces: 2 * n * n, size }));
    const finder = createSeamPathFinder(sm);
    const row = finder.find(0, n)!;
    expect(row.length).toBeCloseTo(n * h, 12); // Source: straight line along grid edges (Manhattan = Euclidean)
    expect(row.edges.length).toBe(n);
    // vertex (column i, row r) = r·m + i; cells with r + i even have the diagonal (i, r)–(i+1, r+1) (flat-grid.ts)
    const k = 12;
    const diag = finder.find(0, k * m + k)!;
    expect(diag.length).toBeCloseTo(k * Math.SQRT2 * h, 12); // Source: Pythagoras, each diagonal is √2·h
    expect(diag.edges.length).toBe(k);
  });

  it("equals Dijkstra's distance (lib/geometry/topology/shortest-paths.ts) for random pairs on a bumped grid and a sphere", () => {
    for (const mesh of [flatGrid({ faces: 800, size: 3, bump: 0.7 }), uvSphere({ radius: 2, latitudeBands: 12, longitudeSegments: 20 })]) {
      const sm = buildStudioMesh(mesh);
      const finder = createSeamPathFinder(sm);
      const adj = vertexAdjacency(buildHalfEdges(mesh.triangles, sm.vertexCount));
      const dist = new Float64Array(sm.vertexCount), pred = new Int32Array(sm.vertexCount);
      let seed = 7;
      const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
      for (let i = 0; i < 20; i++) {
        const a = Math.floor(rnd() * sm.vertexCount), b = Math.floor(rnd() * sm.vertexCount);
        dijkstra(adj, mesh.positions, [a], dist, pred);
        const path = finder.find(a, b)!;
        expect(path.length).toBeCloseTo(dist[b], 9);
        expect(path.vertices[0]).toBe(a);
        expect(path.vertices[path.vertices.length - 1]).toBe(b);
        for (let k = 0; k < path.edges.length; k++) expect(edgeBetween(sm, path.vertices[k], path.vertices[k + 1])).toBe(path.edges[k]);
      }
    }
  });

  it("on a cylinder: half way round a ring is N/2 chords; up and round uses the diagonals", () => {
    const N = 16, r = 1.5, bands = 6, height = 3;
    const sm = buildStudioMesh(cylinderTube({ radius: r, height, segments: N, bands }));
    const finder = createSeamPathFinder(sm);
    const chord = 2 * r * Math.sin(Math.PI / N); // Source: chord of a regular N-gon, 2r·sin(π/N)
    const half = finder.find(0, N / 2)!;
    expect(half.length).toBeCloseTo((N / 2) * chord, 12);
    expect(Array.from(half.vertices).every((v) => v < N)).toBe(true);
    // vertex (ring i, segment j) = i·N + j; quads split along (i, j)–(i+1, j+1), so k diagonals then straight up
    const hb = height / bands, k = 4;
    const up = finder.find(0, bands * N + k)!;
    expect(up.length).toBeCloseTo(k * Math.hypot(chord, hb) + (bands - k) * hb, 12); // Source: Pythagoras
  });

  it("snap to sharp edges: on a cube, corner to opposite corner of a face follows two cube edges", () => {
    const size = 2, n = 4;
    const sm = buildStudioMesh(cube({ size, subdivisions: n }));
    const finder = createSeamPathFinder(sm);
    const p = sm.mesh.positions;
    const at = (x: number, y: number, z: number) => {
      for (let v = 0; v < sm.vertexCount; v++) if (p[3 * v] === x && p[3 * v + 1] === y && p[3 * v + 2] === z) return v;
      throw new Error("no vertex");
    };
    const a = at(-1, -1, 1), b = at(1, 1, 1);
    const plain = finder.find(a, b)!;
    const onCubeEdge = (v: number) => [0, 1, 2].filter((k) => Math.abs(p[3 * v + k]) === size / 2).length >= 2;
    expect(plain.vertices.slice(1, -1).some((v) => !onCubeEdge(v))).toBe(true); // cuts across the face
    const snapped = finder.find(a, b, { snapToSharp: true })!;
    expect(Array.from(snapped.vertices).every(onCubeEdge)).toBe(true);
    expect(snapped.length).toBeCloseTo(2 * size, 12);
    for (const e of snapped.edges) expect(sm.dihedral[e]).toBeCloseTo(270, 9);
    // with the threshold above 90° nothing is sharp, so snapping changes nothing
    expect(finder.find(a, b, { snapToSharp: true, sharpThresholdDeg: 95 })!.length).toBeCloseTo(plain.length, 12);
  });

  it("chains several picks, skips repeated picks, reports unreachable vertices and bad input", () => {
    const sm = buildStudioMesh(flatGrid({ faces: 50 }));
    const finder = createSeamPathFinder(sm);
    const legs = finder.through([0, 0, 5, 35]);
    expect(legs!.vertices[0]).toBe(0);
    expect(legs!.vertices[legs!.vertices.length - 1]).toBe(35);
    expect(legs!.length).toBeCloseTo(finder.find(0, 5)!.length + finder.find(5, 35)!.length, 12);
    expect(finder.find(3, 3)!.edges.length).toBe(0);
    expect(() => finder.find(0, 999)).toThrow(/not a vertex/);
    // two separate triangles
    const two = buildStudioMesh({ positions: new Float64Array([0, 0, 0, 1, 0, 0, 0, 1, 0, 5, 0, 0, 6, 0, 0, 5, 1, 0]), triangles: new Uint32Array([0, 1, 2, 3, 4, 5]) });
    expect(createSeamPathFinder(two).find(0, 4)).toBeNull();
  });

  it("is unchanged when the mesh is scaled by 1e±6 and moved", () => {
    const base = uvSphere({ radius: 1, latitudeBands: 10, longitudeSegments: 14 });
    const ref = createSeamPathFinder(buildStudioMesh(base)).find(3, 100)!;
    for (const s of [1e-6, 1e6]) {
      const path = createSeamPathFinder(buildStudioMesh(transformed(base, s, 3 * s, -2 * s, 7 * s))).find(3, 100)!;
      expect(Array.from(path.vertices)).toEqual(Array.from(ref.vertices));
      expect(path.length / s).toBeCloseTo(ref.length, 9);
    }
  });

  it("a click snaps to the nearest corner of the picked triangle", () => {
    const sm = buildStudioMesh(flatGrid({ faces: 2, size: 1 }));
    const t = sm.mesh.triangles;
    expect(snapToVertex(sm, 0, 0.9, 0.05, 0)).toBe([t[0], t[1], t[2]].find((v) => sm.mesh.positions[3 * v] === 1 && sm.mesh.positions[3 * v + 1] === 0));
    expect(() => snapToVertex(sm, 7, 0, 0, 0)).toThrow(/not a face/);
  });
});
