import { describe, expect, it } from "vitest";
import { detectFormat } from "@/lib/geometry/intake/detect-format";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeAsciiStl, writeBinaryStl } from "@/lib/geometry/intake/write-mesh";
import { makeCube, utf8 } from "@/tests/fixtures/intake/small-meshes";

// Source for the layout: 3D Systems, StereoLithography Interface Specification, 1989 — binary: 80-byte header,
// uint32 facet count, 50 bytes per facet (normal, 3 vertices as float32, uint16 attribute); ASCII:
// solid / facet normal / outer loop / vertex ×3 / endloop / endfacet / endsolid.

describe("STL", () => {
  it("welds a cube written as binary STL to 8 vertices and 12 faces, χ = 2", async () => {
    const bytes = writeBinaryStl(makeCube());
    expect(bytes.length).toBe(84 + 50 * 12);
    const r = await readMesh(bytes, { units: "cm" });
    expect(r.report.format).toBe("stl-binary");
    expect(r.report.inputFaces).toBe(12);
    expect(r.report.inputVertices).toBe(36); // 3 corners per facet, no sharing in STL
    expect(r.report.vertices).toBe(8);
    expect(r.report.weldedVertices).toBe(28);
    expect(r.report.faces).toBe(12);
    // Source: Euler's polyhedron formula V − E + F = 8 − 18 + 12 = 2.
    expect(r.report.eulerCharacteristic).toBe(2);
    expect(r.report.components).toBe(1);
    expect(r.report.boundaryLoops).toBe(0);
    expect(r.report.nonManifoldEdges).toBe(0);
    expect(r.report.bbox).toEqual({ min: [0, 0, 0], max: [1, 1, 1], size: [1, 1, 1] });
  });

  it("numbers STL vertices in order of first appearance and maps input indices by identity", async () => {
    const r = await readMesh(writeBinaryStl(makeCube()), { units: "mm" });
    // The cube's first facet is (0,0,0), (1,1,0), (1,0,0): working vertices 0, 1, 2.
    expect(Array.from(r.mesh.triangles.subarray(0, 6))).toEqual([0, 1, 2, 0, 3, 1]);
    expect(Array.from(r.mesh.positions.subarray(0, 9))).toEqual([0, 0, 0, 1, 1, 0, 1, 0, 0]);
    expect(Array.from(r.inputToWorking)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });

  it("reads a binary STL whose header starts with the word solid", async () => {
    const bytes = writeBinaryStl(makeCube(), { header: "solid cube exported by a tool that writes solid into binary headers" });
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).toBe("solid");
    expect(detectFormat(bytes)).toBe("stl-binary");
    const r = await readMesh(bytes, { units: "mm" });
    expect(r.report.format).toBe("stl-binary");
    expect(r.report.vertices).toBe(8);
  });

  it("treats a truncated binary STL that starts with solid as a truncated binary file, not as ASCII", async () => {
    const bytes = writeBinaryStl(makeCube(), { header: "solid part" }).subarray(0, 300);
    await expect(readMesh(bytes, { units: "mm" })).rejects.toMatchObject({ code: "TRUNCATED" });
  });

  it("reads an ASCII STL, keywords in any case, CRLF line ends", async () => {
    const text = writeAsciiStl(makeCube(), "cube").replace(/facet normal/g, "FACET NORMAL").replace(/\n/g, "\r\n");
    const r = await readMesh(utf8(text), { units: "mm" });
    expect(r.report.format).toBe("stl-ascii");
    expect(r.report.vertices).toBe(8);
    expect(r.report.faces).toBe(12);
    expect(r.report.eulerCharacteristic).toBe(2);
  });

  it("reads several solids in one ASCII file and fan-splits a loop with four vertices", async () => {
    const text = [
      "solid a",
      "facet normal 0 0 1",
      "outer loop",
      "vertex 0 0 0",
      "vertex 1 0 0",
      "vertex 1 1 0",
      "vertex 0 1 0",
      "endloop",
      "endfacet",
      "endsolid a",
      "solid b",
      "facet normal nan nan nan",
      "outer loop",
      "vertex 5 0 0",
      "vertex 6 0 0",
      "vertex 5 1 0",
      "endloop",
      "endfacet",
      "endsolid b",
    ].join("\n");
    const r = await readMesh(utf8(text), { units: "mm" });
    expect(r.report.inputFaces).toBe(2);
    expect(r.report.faces).toBe(3);
    expect(r.report.components).toBe(2);
    expect(r.report.boundaryLoops).toBe(2);
  });
});
