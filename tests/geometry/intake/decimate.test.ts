import { describe, expect, it } from "vitest";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeBinaryStl, writeObj } from "@/lib/geometry/intake/write-mesh";
import { makeTorus } from "@/tests/fixtures/intake/make-torus";
import { utf8 } from "@/tests/fixtures/intake/small-meshes";

describe("decimation over the face budget", () => {
  it("makes a working copy at the budget, keeps the vertex index space and says so in the report", async () => {
    const torus = makeTorus(80, 40); // 3200 vertices, 6400 faces
    const r = await readMesh(utf8(writeObj(torus)), { units: "mm", faceBudget: 1000 });
    expect(r.report.faces).toBe(6400); // the welded, cleaned input, before decimation
    expect(r.report.vertices).toBe(3200);
    const d = r.report.decimated!;
    expect(d).not.toBeNull();
    expect(d.faceBudget).toBe(1000);
    expect(d.originalFaces).toBe(6400);
    expect(d.workingFaces).toBe(r.mesh.triangles.length / 3);
    expect(d.workingFaces).toBeLessThanOrEqual(1000);
    expect(d.workingFaces).toBeGreaterThan(500);
    expect(d.maxError).toBeGreaterThan(0);
    expect(d.maxError).toBeLessThan(2); // mm; our acceptance bound, a fifth of the 10 mm tube radius

    // Same vertex buffer: every file vertex is still there, the working faces index into it.
    expect(r.mesh.positions.length).toBe(3 * 3200);
    expect(Array.from(r.mesh.positions)).toEqual(Array.from(torus.positions));
    let maxIndex = 0;
    const used = new Set<number>();
    for (const v of r.mesh.triangles) {
      maxIndex = Math.max(maxIndex, v);
      used.add(v);
    }
    expect(maxIndex).toBeLessThan(3200);
    expect(d.workingVertices).toBe(used.size);
    // The simplifier does not tear the surface: still a closed torus, χ = 0 (Source: χ = 2 − 2g, g = 1).
    const edges = new Set<string>();
    const t = r.mesh.triangles;
    for (let k = 0; k < t.length; k += 3) {
      for (let j = 0; j < 3; j++) {
        const a = t[k + j], b = t[k + ((j + 1) % 3)];
        edges.add(a < b ? `${a},${b}` : `${b},${a}`);
      }
    }
    expect(used.size - edges.size + t.length / 3).toBe(0);
  });

  it("does not decimate at or below the budget", async () => {
    const r = await readMesh(writeBinaryStl(makeTorus(20, 10)), { units: "mm", faceBudget: 400 });
    expect(r.report.faces).toBe(400);
    expect(r.report.decimated).toBeNull();
    expect(r.mesh.triangles.length).toBe(1200);
  });
});
