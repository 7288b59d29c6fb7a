import { describe, expect, it } from "vitest";
import { GeometryError } from "@/lib/geometry/errors";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { parseSeamsJson, resolveSeams } from "@/lib/geometry/seams/parse-seams";
import { writeBinaryStl, writeObj } from "@/lib/geometry/intake/write-mesh";
import { makeTorus } from "@/tests/fixtures/intake/make-torus";
import { makeCube, utf8 } from "@/tests/fixtures/intake/small-meshes";

function errorOf(f: () => unknown): GeometryError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(GeometryError);
    return e as GeometryError;
  }
  throw new Error("expected an error");
}

describe("parseSeamsJson", () => {
  it("reads pairs in file order", () => {
    expect(parseSeamsJson('{"seams": [[0, 1], [1, 2], [7, 3]]}')).toEqual([[0, 1], [1, 2], [7, 3]]);
    expect(parseSeamsJson('{"seams": []}')).toEqual([]);
  });

  it("reports malformed JSON with line and column", () => {
    const e = errorOf(() => parseSeamsJson('{"seams": [[1, 2],\n  [3, }'));
    expect(e.code).toBe("BAD_SEAMS");
    expect(e.message).toBe('The seam file is not valid JSON (line 2, column 7: expected a value but found "}").');
    expect(e.line).toBe(2);
    expect(errorOf(() => parseSeamsJson('{"seams": [[1, 2]]')).message).toBe(
      'The seam file is not valid JSON (line 1, column 19: expected "," or "}" but found the end of the text).',
    );
    expect(errorOf(() => parseSeamsJson("{seams: []}")).message).toBe(
      'The seam file is not valid JSON (line 1, column 2: expected a property name in double quotes but found "s").',
    );
  });

  it("copes with absurdly nested input", () => {
    const open = errorOf(() => parseSeamsJson('{"seams": ' + "[".repeat(5000)));
    expect(open.message).toBe('The seam file is not valid JSON (line 1, column 1011: expected less deeply nested data (more than 1000 levels) but found "[").');
    const deep = errorOf(() => parseSeamsJson('{"seams": [' + "[".repeat(3000) + "]".repeat(3000) + "]}"));
    expect(deep.message).toMatch(/^In the seam file, seams\[0\] must be a pair \[i, j\] of two vertex indices/);
  });

  it("names the element and why for a wrong shape", () => {
    expect(errorOf(() => parseSeamsJson("")).message).toBe('The seam file is empty; expected JSON like {"seams": [[0, 1], [1, 2]]}.');
    expect(errorOf(() => parseSeamsJson("[[0, 1]]")).message).toBe('The seam file must be a JSON object with a "seams" array, like {"seams": [[0, 1]]}.');
    expect(errorOf(() => parseSeamsJson('{"edges": []}')).message).toBe('The seam file has no "seams" array; expected {"seams": [[i, j], …]}.');
    expect(errorOf(() => parseSeamsJson('{"seams": {"a": 1}}')).message).toBe('In the seam file, seams must be an array of vertex index pairs (found {"a":1}).');
    expect(errorOf(() => parseSeamsJson('{"seams": [[0, 1], [2]]}')).message).toBe("In the seam file, seams[1] must be a pair [i, j] of two vertex indices (found [2]).");
    expect(errorOf(() => parseSeamsJson('{"seams": [[0, 1], [2, 3, 4]]}')).message).toBe("In the seam file, seams[1] must be a pair [i, j] of two vertex indices (found [2,3,4]).");
    expect(errorOf(() => parseSeamsJson('{"seams": [[0, -1]]}')).message).toBe("In the seam file, seams[0][1] must not be negative (found -1).");
    expect(errorOf(() => parseSeamsJson('{"seams": [[0.5, 1]]}')).message).toBe("In the seam file, seams[0][0] must be a whole number (found 0.5).");
    expect(errorOf(() => parseSeamsJson('{"seams": [[0, "1"]]}')).message).toBe('In the seam file, seams[0][1] must be a number (found "1").');
  });
});

describe("resolveSeams", () => {
  it("maps OBJ input indices through inputToWorking (welded duplicates) and keeps each edge once", async () => {
    // two triangles sharing edge 2–3; file vertex 4 duplicates file vertex 2 (0-based: 3 duplicates 1)
    const intake = await readMesh(utf8("v 0 0 0\nv 1 0 0\nv 0 1 0\nv 1 0 0\nv 1 1 0\nf 1 2 3\nf 4 5 3\n"), { units: "mm" });
    expect(Array.from(intake.inputToWorking)).toEqual([0, 1, 2, 1, 4]);
    const edges = resolveSeams([[3, 2], [1, 2], [0, 1]], intake);
    expect(Array.from(edges)).toEqual([1, 2, 0, 1]);
  });

  it("works on STL vertex numbering (first appearance)", async () => {
    const intake = await readMesh(writeBinaryStl(makeCube()), { units: "mm" });
    // first facet of the cube fixture: (0,0,0) (1,1,0) (1,0,0) → working 0, 1, 2
    expect(Array.from(resolveSeams([[0, 1], [2, 0]], intake))).toEqual([0, 1, 2, 0]);
  });

  it("rejects indices out of range, naming the pair and its position", async () => {
    const intake = await readMesh(writeBinaryStl(makeCube()), { units: "mm" });
    const e = errorOf(() => resolveSeams([[0, 1], [1, 8]], intake));
    expect(e.code).toBe("INDEX_OUT_OF_RANGE");
    expect(e.message).toBe("Seam 2 of 2 ([1, 8]) uses vertex 8, which is out of range: the input file has 8 vertices, numbered 0 to 7.");
  });

  it("rejects pairs that are not mesh edges", async () => {
    const intake = await readMesh(writeBinaryStl(makeCube()), { units: "mm" });
    // working 0 = (0,0,0); find the working id of (1,1,1), the opposite corner
    const p = intake.mesh.positions;
    let far = -1;
    for (let v = 0; v < p.length / 3; v++) if (p[3 * v] === 1 && p[3 * v + 1] === 1 && p[3 * v + 2] === 1) far = v;
    const e = errorOf(() => resolveSeams([[0, 1], [0, far]], intake));
    expect(e.code).toBe("SEAM_NOT_AN_EDGE");
    expect(e.message).toBe(`Seam 2 of 2 ([0, ${far}]) is not an edge of the mesh: no face has vertices 0 and ${far} as neighbours.`);
    expect(errorOf(() => resolveSeams([[3, 3]], intake)).message).toBe("Seam 1 of 1 ([3, 3]) joins a vertex to itself, which is not an edge.");
  });

  it("says when welding made a pair one vertex", async () => {
    // file vertex 3 (0-based) is a copy of file vertex 1
    const intake = await readMesh(utf8("v 0 0 0\nv 1 0 0\nv 0 1 0\nv 1 0 0\nv 1 1 0\nf 1 2 3\nf 4 5 3\n"), { units: "mm" });
    expect(intake.inputToWorking[3]).toBe(1);
    const e = errorOf(() => resolveSeams([[1, 3]], intake));
    expect(e.message).toBe("Seam 1 of 1 ([1, 3]) is not an edge: vertices 1 and 3 are the same point and were welded into one vertex.");
  });

  it("says when decimation removed a seam vertex", async () => {
    const torus = makeTorus(40, 20);
    const intake = await readMesh(utf8(writeObj(torus)), { units: "mm", faceBudget: 200 });
    const used = new Uint8Array(torus.positions.length / 3);
    for (const v of intake.mesh.triangles) used[v] = 1;
    const removed = used.indexOf(0);
    expect(removed).toBeGreaterThanOrEqual(0);
    const neighbour = removed % 20 === 19 ? removed - 1 : removed + 1; // an edge of the original grid
    const e = errorOf(() => resolveSeams([[removed, neighbour]], intake));
    expect(e.code).toBe("SEAM_NOT_AN_EDGE");
    expect(e.message).toContain("the scan was decimated to");
  });
});
