import { describe, expect, it } from "vitest";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { cleanTriangles } from "@/lib/geometry/intake/clean-triangles";
import { weldVertices, WELD_TOLERANCE_FACTOR } from "@/lib/geometry/intake/weld-vertices";
import { writeAsciiStl, writeBinaryStl, writeObj } from "@/lib/geometry/intake/write-mesh";
import { makeTorus } from "@/tests/fixtures/intake/make-torus";
import { concat, makeCube, makeGrid, transformed, utf8 } from "@/tests/fixtures/intake/small-meshes";

describe("weldVertices", () => {
  it("merges points within the tolerance into the earliest one and keeps points just outside apart", () => {
    const tol = 1e-3;
    const p = new Float64Array([0, 0, 0, 5, 5, 5, 0.0009, 0, 0, 5, 5, 5.0011, 0, 0.0005, 0.0005]);
    const r = weldVertices(p, null, tol);
    expect(Array.from(r.representative)).toEqual([0, 1, 0, 3, 0]);
    expect(r.welded).toBe(2);
  });

  it("finds neighbours across cell borders in every direction", () => {
    // pairs straddling grid cells (cell = 16 tolerances) on all axes at once
    const tol = 1e-3;
    const pts: number[] = [];
    for (let k = 0; k < 200; k++) {
      const base = [0.016 * k + 0.0159996, 0.016 * (k % 7) + 0.0159996, 0.016 * (k % 3) + 0.0159996];
      pts.push(...base, base[0] + 0.0005, base[1] + 0.0005, base[2] + 0.0005); // 0.87 tol apart
    }
    const r = weldVertices(new Float64Array(pts), null, tol);
    expect(r.welded).toBe(200);
    for (let k = 0; k < 200; k++) expect(r.representative[2 * k + 1]).toBe(2 * k);
  });

  it("stays linear on a dense cluster far smaller than the bounding box (a stray vertex far away)", () => {
    // 512 000 points 1.01 tolerances apart, ~4000 to a grid cell, plus one point 1e6 tolerances away. Measured on
    // this machine: ~0.3 s CPU with the candidate cap, ~8 s without it.
    const tol = 1e-6;
    const m = 80;
    const p = new Float64Array(3 * (m * m * m + 1));
    let w = 0;
    for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) for (let k = 0; k < m; k++) {
      p[w++] = 1.01 * tol * i;
      p[w++] = 1.01 * tol * j;
      p[w++] = 1.01 * tol * k;
    }
    p[w++] = 1;
    const c0 = process.cpuUsage();
    const r = weldVertices(p, null, tol);
    const c = process.cpuUsage(c0);
    expect((c.user + c.system) / 1000).toBeLessThan(2500); // CPU ms: wall time varies on the shared machine
    expect(r.welded).toBe(0); // all farther apart than the tolerance
  });

  it("leaves inactive points alone", () => {
    const p = new Float64Array([0, 0, 0, 0, 0, 0, 0, 0, 0]);
    const r = weldVertices(p, new Uint8Array([1, 0, 1]), 0.1);
    expect(Array.from(r.representative)).toEqual([0, 1, 0]);
  });
});

describe("cleaning", () => {
  it("drops degenerate and duplicate faces and says how many", async () => {
    // 2×2 grid (8 triangles) + a repeated-index face + a collinear face + the same face reversed + an exact copy
    const grid = makeGrid(2);
    let text = writeObj(grid);
    text += "f 1 1 2\nf 1 2 3\nf 1 5 2\nf 1 2 5\n";
    const r = await readMesh(utf8(text), { units: "mm" });
    expect(r.report.droppedDegenerateFaces).toBe(2);
    expect(r.report.droppedDuplicateFaces).toBe(2);
    expect(r.report.faces).toBe(8);
    // Disk: χ = V − E + F = 9 − 16 + 8 = 1 (Source: Euler's formula, χ = 2 − 2g − b with g = 0, b = 1).
    expect(r.report.eulerCharacteristic).toBe(1);
    expect(r.report.boundaryLoops).toBe(1);
  });
});

describe("cleanTriangles", () => {
  it("finds duplicates around a vertex shared by very many faces (a cone tip) and keeps the first copy", () => {
    const n = 200;
    const positions = new Float64Array(3 * (n + 1));
    positions[2] = 1; // tip at (0, 0, 1)
    for (let k = 0; k < n; k++) {
      positions[3 * (k + 1)] = Math.cos((2 * Math.PI * k) / n);
      positions[3 * (k + 1) + 1] = Math.sin((2 * Math.PI * k) / n);
    }
    const tris: number[] = [];
    for (let k = 0; k < n; k++) tris.push(0, 1 + k, 1 + ((k + 1) % n));
    // copies of faces 5 and 150, one reversed, one rotated
    tris.push(0, 1 + 6, 1 + 5, 1 + 150, 1 + 151, 0);
    const r = cleanTriangles(positions, new Uint32Array(tris), 2 * Math.SQRT2);
    expect(r.droppedDuplicate).toBe(2);
    expect(r.droppedDegenerate).toBe(0);
    expect(Array.from(r.triangles)).toEqual(tris.slice(0, 3 * n));
  });
});

describe("report", () => {
  it("counts components, boundary loops and non-manifold edges", async () => {
    // cube + grid beside it, plus a third face on a cube edge (a fin): non-manifold
    const both = concat(makeCube(), makeGrid(3), 3);
    let text = writeObj(both);
    text += "v 0.5 -1 0\nf 1 2 -1\n"; // cube edge (0,0,0)–(1,0,0) gets a third face
    const r = await readMesh(utf8(text), { units: "mm" });
    expect(r.report.components).toBe(2);
    // Boundary graph: the grid's rim (12 edges, 12 vertices) and the fin's two free edges (an open path of 3
    // vertices, because the fin's third edge is the shared cube edge): cycle rank (12 − 12 + 1) + (2 − 3 + 1) = 1.
    expect(r.report.boundaryLoops).toBe(1);
    expect(r.report.nonManifoldEdges).toBe(1);
    // V − E + F: cube 8 − 18 + 12, grid 16 − 33 + 18, fin +1 vertex, +2 edges, +1 face → 2 + 1 + 0 = 3
    expect(r.report.eulerCharacteristic).toBe(3);
  });

  it("counts a torus: χ = 0, no boundary", async () => {
    const r = await readMesh(writeBinaryStl(makeTorus(24, 12)), { units: "mm" });
    expect(r.report.vertices).toBe(288);
    expect(r.report.faces).toBe(576);
    // Source: χ = 2 − 2g for a closed orientable surface, torus g = 1.
    expect(r.report.eulerCharacteristic).toBe(0);
    expect(r.report.boundaryLoops).toBe(0);
  });

  it("counts holes: a grid with two squares removed far apart has three boundary loops", async () => {
    const g = makeGrid(6);
    // drop the two triangles of square (1,1) and of square (4,4)
    const drop = new Set([2 * (1 * 6 + 1), 2 * (1 * 6 + 1) + 1, 2 * (4 * 6 + 4), 2 * (4 * 6 + 4) + 1]);
    const tris: number[] = [];
    for (let f = 0; f < g.triangles.length / 3; f++) if (!drop.has(f)) tris.push(...g.triangles.subarray(3 * f, 3 * f + 3));
    const r = await readMesh(writeBinaryStl({ positions: g.positions, triangles: new Uint32Array(tris) }), { units: "mm" });
    expect(r.report.boundaryLoops).toBe(3);
    // Source: χ = 2 − 2g − b = 2 − 0 − 3 = −1 for a sphere with three holes.
    expect(r.report.eulerCharacteristic).toBe(-1);
  });

  it("documents the weld tolerance factor", () => {
    expect(WELD_TOLERANCE_FACTOR).toBe(1e-6);
  });
});

describe("invariance: counts do not change when the mesh is scaled by 1e±3 or moved", () => {
  const base = concat(makeTorus(20, 10), makeGrid(5, 20), 80);
  const counts = (r: Awaited<ReturnType<typeof readMesh>>) => {
    const { bbox: _b, units: _u, format: _f, decimated: _d, ...rest } = r.report;
    return rest;
  };
  const cases: [string, number, [number, number, number]][] = [
    ["scaled 1e-3", 1e-3, [0, 0, 0]],
    ["scaled 1e3", 1e3, [0, 0, 0]],
    ["moved", 1, [1234.5, -678.25, 99.125]],
    ["scaled 1e-3 and moved", 1e-3, [0.5, 0.25, -2]],
  ];
  for (const writer of ["obj", "stl-binary", "stl-ascii"] as const) {
    it(`holds for ${writer}`, async () => {
      const write = (m: typeof base) =>
        writer === "obj" ? utf8(writeObj(m)) : writer === "stl-binary" ? writeBinaryStl(m) : utf8(writeAsciiStl(m));
      const reference = counts(await readMesh(write(base), { units: "mm" }));
      expect(reference.components).toBe(2);
      for (const [, s, t] of cases) {
        const r = await readMesh(write(transformed(base, s, t)), { units: "mm" });
        expect(counts(r)).toEqual(reference);
      }
    });
  }
});
