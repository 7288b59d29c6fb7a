import { describe, expect, it } from "vitest";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { parseObj } from "@/lib/geometry/intake/parse-obj";
import { utf8 } from "@/tests/fixtures/intake/small-meshes";

// Source for every rule checked here: Wavefront OBJ format, Appendix B1 of the Advanced Visualizer manual
// (1-based indices, negative = relative to the last vertex defined, `v/vt/vn` and `v//vn` references, `\` continues a line).

describe("parseObj", () => {
  it("reads a triangle with positive indices", () => {
    const r = parseObj(utf8("v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3\n"));
    expect(r.vertexCount).toBe(3);
    expect(r.polygonCount).toBe(1);
    expect(Array.from(r.triangles)).toEqual([0, 1, 2]);
    expect(Array.from(r.positions)).toEqual([0, 0, 0, 1, 0, 0, 0, 1, 0]);
  });

  it("resolves negative (relative) indices against the vertices defined so far", () => {
    const text = "v 0 0 0\nv 1 0 0\nv 0 1 0\nf -3 -2 -1\nv 1 1 0\nf -3 -1 -2\n";
    const r = parseObj(utf8(text));
    // -1 on line 6 is vertex 4 (the last defined), -3 is vertex 2.
    expect(Array.from(r.triangles)).toEqual([0, 1, 2, 1, 3, 2]);
  });

  it("fan-triangulates convex quads and n-gons", () => {
    const text = "v 0 0 0\nv 1 0 0\nv 1 1 0\nv 0 1 0\nv 2 0 0\nv 3 0 0\nv 3.5 1 0\nv 2.5 2 0\nv 1.5 1 0\nf 1 2 3 4\nf 5 6 7 8 9\n";
    const r = parseObj(utf8(text));
    expect(r.polygonCount).toBe(2);
    // quad → 2 triangles, pentagon → 3 (a polygon of n corners gives n − 2 triangles)
    expect(Array.from(r.triangles)).toEqual([0, 1, 2, 0, 2, 3, 4, 5, 6, 4, 6, 7, 4, 7, 8]);
  });

  it("ear-clips a concave polygon so no triangle leaves it or flips", () => {
    // an L-shaped hexagon, counter-clockwise in z = 0; a fan from corner 0 would cover the notch
    //  (0,2)-(1,2)
    //    |     |
    //    |   (1,1)-(2,1)
    //    |           |
    //  (0,0)-------(2,0)   written starting at the reflex-free corner (2,1), which fans badly
    const text = "v 2 1 0\nv 1 1 0\nv 1 2 0\nv 0 2 0\nv 0 0 0\nv 2 0 0\nf 1 2 3 4 5 6\n";
    const r = parseObj(utf8(text));
    expect(r.triangles.length).toBe(12);
    const p = r.positions;
    let area = 0;
    for (let k = 0; k < r.triangles.length; k += 3) {
      const [a, b, c] = [r.triangles[k], r.triangles[k + 1], r.triangles[k + 2]];
      const signed = ((p[3 * b] - p[3 * a]) * (p[3 * c + 1] - p[3 * a + 1]) - (p[3 * b + 1] - p[3 * a + 1]) * (p[3 * c] - p[3 * a])) / 2;
      expect(signed).toBeGreaterThan(0); // same orientation as the polygon
      area += signed;
    }
    expect(area).toBeCloseTo(3, 12); // the L covers 3 unit squares: triangles tile it without overlap
  });

  it("keeps the orientation of a concave polygon facing −z", () => {
    const text = "v 2 1 0\nv 1 1 0\nv 1 2 0\nv 0 2 0\nv 0 0 0\nv 2 0 0\nf 6 5 4 3 2 1\n";
    const r = parseObj(utf8(text));
    const p = r.positions;
    let area = 0;
    for (let k = 0; k < r.triangles.length; k += 3) {
      const [a, b, c] = [r.triangles[k], r.triangles[k + 1], r.triangles[k + 2]];
      const signed = ((p[3 * b] - p[3 * a]) * (p[3 * c + 1] - p[3 * a + 1]) - (p[3 * b + 1] - p[3 * a + 1]) * (p[3 * c] - p[3 * a])) / 2;
      expect(signed).toBeLessThan(0);
      area += signed;
    }
    expect(area).toBeCloseTo(-3, 12);
  });

  it("ignores texture and normal references, groups, materials, comments and other statements", () => {
    const text = [
      "# a comment with f 9 9 9 in it",
      "mtllib shop.mtl",
      "o part",
      "g left",
      "v 0 0 0 1.0",
      "v 1 0 0",
      "v 0 1 0",
      "v 1 1 0",
      "vt 0 0",
      "vt 1 0",
      "vn 0 0 1",
      "usemtl foam",
      "s 1",
      "f 1/1/1 2/2/1 3/1/1",
      "f 2//1 4//1 3//1",
      "f 1/1 2/2 4/1",
      "l 1 2",
      "",
    ].join("\r\n");
    const r = parseObj(utf8(text));
    expect(r.vertexCount).toBe(4);
    expect(Array.from(r.triangles)).toEqual([0, 1, 2, 1, 3, 2, 0, 1, 3]);
  });

  it("joins lines ending in a backslash", () => {
    const r = parseObj(utf8("v 0 0 \\\n 0\nv 1 0 0\nv 0 1 0\nf 1 \\\r\n2 3\n"));
    expect(r.vertexCount).toBe(3);
    expect(Array.from(r.positions.subarray(0, 3))).toEqual([0, 0, 0]);
    expect(Array.from(r.triangles)).toEqual([0, 1, 2]);
  });

  it("keeps counting physical lines across continuations in its messages", () => {
    expect(() => parseObj(utf8("v 0 0 \\\n0\nv 1 0 0\nv 1 1 oops\n"))).toThrow(/^OBJ line 4: /);
  });

  it("accepts forward references to vertices defined later in the file", () => {
    const r = parseObj(utf8("f 1 2 3\nv 0 0 0\nv 1 0 0\nv 0 1 0\n"));
    expect(Array.from(r.triangles)).toEqual([0, 1, 2]);
  });

  it("reads exponents, signs and leading dots in coordinates", () => {
    const r = parseObj(utf8("v -1.5e+2 .25 +3.\nv 1E-3 -0 7\nv 1 2 3\nf 1 2 3\n"));
    expect(Array.from(r.positions.subarray(0, 6))).toEqual([-150, 0.25, 3, 0.001, -0, 7]);
  });
});

describe("readMesh on OBJ", () => {
  it("keeps the file's v index space and maps welded duplicates to their first occurrence", async () => {
    // Two triangles sharing an edge, written with a duplicate of vertex 2 (line 4) and of vertex 3 (line 5).
    const text = "v 0 0 0\nv 1 0 0\nv 0 1 0\nv 1 0 0\nv 0 1 0\nv 1 1 0\nf 1 2 3\nf 4 6 5\n";
    const r = await readMesh(utf8(text), { units: "mm" });
    expect(r.report.format).toBe("obj");
    expect(r.report.inputVertices).toBe(6);
    expect(r.report.vertices).toBe(4);
    expect(r.report.weldedVertices).toBe(2);
    expect(Array.from(r.inputToWorking)).toEqual([0, 1, 2, 1, 2, 5]);
    expect(r.mesh.positions.length).toBe(18); // every v entry stays, the duplicates unreferenced
    expect(Array.from(r.mesh.triangles)).toEqual([0, 1, 2, 1, 5, 2]);
    // Two triangles sharing one edge: V − E + F = 4 − 5 + 2 = 1, one boundary loop (Source: Euler's formula).
    expect(r.report.eulerCharacteristic).toBe(1);
    expect(r.report.boundaryLoops).toBe(1);
  });

  it("counts polygons as input faces and triangles as working faces", async () => {
    const r = await readMesh(utf8("v 0 0 0\nv 1 0 0\nv 1 1 0\nv 0 1 0\nf 1 2 3 4\n"), { units: "in" });
    expect(r.report.inputFaces).toBe(1);
    expect(r.report.faces).toBe(2);
    expect(r.report.units).toBe("in");
  });
});
