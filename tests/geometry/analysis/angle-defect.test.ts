import bunny from "bunny";
import { describe, expect, it } from "vitest";
import { angleDefect } from "@/lib/geometry/analysis/angle-defect";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeBinaryStl, writeObj } from "@/lib/geometry/intake/write-mesh";
import type { TriMesh } from "@/lib/geometry/mesh";
import { makeTorus } from "@/tests/fixtures/intake/make-torus";
import { makeCube, makeGrid, transformed, utf8 } from "@/tests/fixtures/intake/small-meshes";

// Source: discrete Gauss–Bonnet theorem, Σ_interior (2π − Σθ) + Σ_boundary (π − Σθ) = 2π·χ
// (Meyer, Desbrun, Schröder, Barr, "Discrete Differential-Geometry Operators for Triangulated 2-Manifolds", 2002).

function bunnyMesh(): TriMesh {
  return {
    positions: new Float64Array(bunny.positions.flat()),
    triangles: new Uint32Array(bunny.cells.flat()),
  };
}

describe("angle defect and Gauss–Bonnet", () => {
  it("the Stanford bunny read back from OBJ and from binary STL: one closed component, χ = 2, total defect 4π", async () => {
    const mesh = bunnyMesh();
    expect(mesh.positions.length / 3).toBe(1839); // the package's vertex and face counts
    expect(mesh.triangles.length / 3).toBe(3674);
    for (const bytes of [utf8(writeObj(mesh)), writeBinaryStl(mesh)]) {
      const r = await readMesh(bytes, { units: "mm" });
      expect(r.report.vertices).toBe(1839);
      expect(r.report.faces).toBe(3674);
      expect(r.report.components).toBe(1);
      expect(r.report.boundaryLoops).toBe(0);
      expect(r.report.nonManifoldEdges).toBe(0);
      // Source: Euler's formula: 1839 − E + 3674 = 2 with E = 3·3674/2 = 5511 on a closed triangle mesh.
      expect(r.report.eulerCharacteristic).toBe(2);
      const d = angleDefect(r.mesh);
      expect(d.boundaryVertices).toBe(0);
      expect(d.total).toBeCloseTo(2 * Math.PI * r.report.eulerCharacteristic, 9);
      expect(d.total).toBeCloseTo(4 * Math.PI, 9);
    }
  });

  it("cube: 8 corners of π/2 each, total 4π", () => {
    const d = angleDefect(makeCube());
    // Source: Descartes' theorem on total angular defect of a convex polyhedron (4π); each cube corner has
    // three right angles, 2π − 3π/2 = π/2.
    for (const x of d.perVertex) expect(x).toBeCloseTo(Math.PI / 2, 12);
    expect(d.total).toBeCloseTo(4 * Math.PI, 12);
  });

  it("torus: total 0 (χ = 0)", () => {
    expect(angleDefect(makeTorus(40, 20)).total).toBeCloseTo(0, 9);
  });

  it("flat disk with boundary: boundary turning sums to 2π (χ = 1)", () => {
    const d = angleDefect(makeGrid(5));
    expect(d.boundaryVertices).toBe(20);
    expect(d.total).toBeCloseTo(2 * Math.PI, 12);
  });

  it("does not depend on scale or position", () => {
    const base = angleDefect(bunnyMesh()).total;
    for (const [s, t] of [[1e-3, [0, 0, 0]], [1e3, [5, -7, 1]]] as [number, [number, number, number]][]) {
      expect(angleDefect(transformed(bunnyMesh(), s, t)).total).toBeCloseTo(base, 9);
    }
  });

  it("a curved open patch (hemisphere-like bump) still satisfies Gauss–Bonnet", () => {
    const g = makeGrid(8, 2);
    for (let k = 0; k < g.positions.length; k += 3) {
      const x = g.positions[k] - 1, y = g.positions[k + 1] - 1;
      g.positions[k + 2] = Math.exp(-3 * (x * x + y * y));
    }
    expect(angleDefect(g).total).toBeCloseTo(2 * Math.PI, 10);
  });
});
