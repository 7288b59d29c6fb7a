import { describe, expect, it } from "vitest";
import { GeometryError } from "@/lib/geometry/errors";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeAsciiStl, writeBinaryStl } from "@/lib/geometry/intake/write-mesh";
import { makeCube, utf8 } from "@/tests/fixtures/intake/small-meshes";

/** Reads and returns the GeometryError thrown (the test fails if none or another error is thrown). */
async function failure(bytes: Uint8Array, faceBudget?: number): Promise<GeometryError> {
  try {
    await readMesh(bytes, { units: "mm", faceBudget });
  } catch (e) {
    expect(e).toBeInstanceOf(GeometryError);
    const g = e as GeometryError;
    // One sentence: one final full stop, no line breaks.
    expect(g.message).not.toMatch(/\n/);
    expect(g.message.trim().endsWith(".")).toBe(true);
    return g;
  }
  throw new Error("expected readMesh to fail");
}

const TRI = "v 0 0 0\nv 1 0 0\nv 0 1 0\n";

describe("bad input: every case is a GeometryError with one sentence saying what and where", () => {
  it("empty file", async () => {
    const e = await failure(new Uint8Array(0));
    expect(e.code).toBe("EMPTY_FILE");
    expect(e.message).toBe("The file is empty (0 bytes).");
  });

  it("whitespace only", async () => {
    const e = await failure(utf8("  \n\t\r\n"));
    expect(e.code).toBe("EMPTY_FILE");
    expect(e.message).toBe("The file contains only whitespace (6 bytes).");
  });

  it("random bytes", async () => {
    const bytes = new Uint8Array(1000);
    let s = 12345;
    for (let k = 0; k < bytes.length; k++) {
      s = (Math.imul(s, 1103515245) + 12345) >>> 0; // Source: ANSI C rand() LCG constants; any fixed noise works
      bytes[k] = s >>> 24;
    }
    const e = await failure(bytes);
    expect(e.code).toBe("UNKNOWN_FORMAT");
    expect(e.message).toMatch(/^The file is neither OBJ nor STL: byte offset \d+ holds 0x[0-9a-f]{2}, which is not text/);
    expect(e.byteOffset).toBeTypeOf("number");
  });

  it("a few bytes of junk", async () => {
    const e = await failure(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect(e.code).toBe("UNKNOWN_FORMAT");
    expect(e.message).toBe("The file is neither OBJ nor STL: byte offset 6 holds 0x1a, which is not text, and at 8 bytes it is too short for a binary STL (at least 84).");
  });

  it("binary STL truncated: face count larger than the data, with the count and the actual size", async () => {
    const full = writeBinaryStl(makeCube()); // 84 + 50·12 = 684 bytes (Source: 3D Systems STL specification, 1989)
    expect(full.length).toBe(684);
    const e = await failure(full.subarray(0, 400));
    expect(e.code).toBe("TRUNCATED");
    expect(e.message).toBe(
      "The binary STL is truncated: its header (byte offset 80) says 12 facets, which need 684 bytes, but the file has only 400 bytes (6 complete facets).",
    );
    expect(e.byteOffset).toBe(400);
  });

  it("binary STL whose count claims far more facets than the file holds", async () => {
    const bytes = writeBinaryStl(makeCube());
    new DataView(bytes.buffer).setUint32(80, 1_000_000, true);
    const e = await failure(bytes);
    expect(e.code).toBe("TRUNCATED");
    expect(e.message).toContain("says 1000000 facets, which need 50000084 bytes, but the file has only 684 bytes");
  });

  it("binary STL shorter than its header", async () => {
    // a text header, then the first bytes of the facet count: a torn binary file
    const bytes = writeBinaryStl(makeCube()).subarray(0, 82);
    const e = await failure(bytes);
    expect(e.code).toBe("TRUNCATED");
    expect(e.message).toBe("The binary STL is truncated: it has 82 bytes, fewer than the 84 bytes of header and facet count.");
  });

  it("binary STL with bytes after the last facet", async () => {
    const full = writeBinaryStl(makeCube());
    const longer = new Uint8Array(full.length + 7);
    longer.set(full);
    const e = await failure(longer);
    expect(e.code).toBe("PARSE_ERROR");
    expect(e.message).toContain("has 7 bytes after its last facet");
    expect(e.byteOffset).toBe(684);
  });

  it("ASCII STL truncated inside a facet", async () => {
    const text = writeAsciiStl(makeCube());
    const cut = text.slice(0, text.indexOf("vertex", text.indexOf("facet normal", 200)) + 20);
    const e = await failure(utf8(cut));
    expect(e.code).toBe("TRUNCATED");
    expect(e.message).toMatch(/^The ASCII STL is truncated: it ends at line \d+ after facet \d+, where .+ was expected\.$/);
    expect(e.line).toBeGreaterThan(1);
  });

  it("ASCII STL without endsolid", async () => {
    const text = writeAsciiStl(makeCube()).replace(/endsolid.*\n$/, "");
    const e = await failure(utf8(text));
    expect(e.code).toBe("TRUNCATED");
    expect(e.message).toContain("where 'facet' or 'endsolid' was expected");
  });

  it("NaN coordinate in OBJ", async () => {
    const e = await failure(utf8("v 0 0 0\nv 1 nan 0\nv 0 1 0\nf 1 2 3\n"));
    expect(e.code).toBe("BAD_NUMBER");
    expect(e.message).toBe('OBJ line 2: expected a number for the y coordinate of vertex 2 but found "nan".');
    expect(e.line).toBe(2);
  });

  it("infinite coordinate in OBJ (overflowing literal)", async () => {
    const e = await failure(utf8("v 0 0 0\nv 1 0 0\nv 0 1e999 0\nf 1 2 3\n"));
    expect(e.code).toBe("BAD_NUMBER");
    expect(e.message).toBe('OBJ line 3: the y coordinate of vertex 3 ("1e999") is not a finite number.');
  });

  it("NaN and infinite coordinates in binary STL, with the byte offset", async () => {
    const bytes = writeBinaryStl(makeCube());
    const view = new DataView(bytes.buffer);
    // facet 3 starts at 84 + 2·50 = 184; its vertex 2 z coordinate at 184 + 12 + 12 + 8 = 216.
    view.setFloat32(216, NaN, true);
    let e = await failure(bytes);
    expect(e.code).toBe("BAD_NUMBER");
    expect(e.message).toBe("The binary STL has a NaN coordinate at byte offset 216 (facet 3, vertex 2, z).");
    expect(e.byteOffset).toBe(216);
    view.setFloat32(216, 0, true);
    view.setFloat32(96, -Infinity, true);
    e = await failure(bytes);
    expect(e.message).toBe("The binary STL has an infinite coordinate at byte offset 96 (facet 1, vertex 1, x).");
  });

  it("NaN in ASCII STL", async () => {
    const text = writeAsciiStl(makeCube()).replace(/vertex 0 0 0/, "vertex 0 NaN 0");
    const e = await failure(utf8(text));
    expect(e.code).toBe("BAD_NUMBER");
    expect(e.message).toBe('ASCII STL line 4: expected a number for the y coordinate of a vertex of facet 1 but found "NaN".');
  });

  it("words where numbers belong", async () => {
    let e = await failure(utf8("v 0 0 0\nv 1 zero 0\nv 0 1 0\nf 1 2 3\n"));
    expect(e.message).toBe('OBJ line 2: expected a number for the y coordinate of vertex 2 but found "zero".');
    e = await failure(utf8("v 0 0 0\nv 1.5kg 0 0\nv 0 1 0\nf 1 2 3\n"));
    expect(e.message).toBe('OBJ line 2: expected a number for the x coordinate of vertex 2 but found "1.5kg".');
    e = await failure(utf8(TRI + "f 1 two 3\n"));
    expect(e.code).toBe("BAD_NUMBER");
    expect(e.message).toBe('OBJ line 4: expected a vertex index in face 1 but found "two".');
    e = await failure(utf8(TRI + "f 1/a 2 3\n"));
    expect(e.message).toBe('OBJ line 4: "1/a" in face 1 is not a vertex reference like 7, -1, 7/3 or 7//2.');
    e = await failure(utf8(writeAsciiStl(makeCube()).replace("outer loop", "outer lop")));
    expect(e.code).toBe("PARSE_ERROR");
    expect(e.message).toBe(`ASCII STL line 3: expected 'loop' after 'outer' but found "lop".`);
  });

  it("a vertex with too few coordinates", async () => {
    const e = await failure(utf8("v 0 0\n"));
    expect(e.code).toBe("PARSE_ERROR");
    expect(e.message).toBe("OBJ line 1: vertex 1 has 2 coordinates, but a vertex needs x, y and z.");
  });

  it("index 0 in OBJ", async () => {
    const e = await failure(utf8(TRI + "f 0 1 2\n"));
    expect(e.code).toBe("INDEX_OUT_OF_RANGE");
    expect(e.message).toBe("OBJ line 4: vertex index 0 in face 1 is not valid, because OBJ indices start at 1 (or count back from -1).");
    expect(e.line).toBe(4);
  });

  it("index past the last vertex", async () => {
    const e = await failure(utf8(TRI + "f 1 2 3\nf 1 2 4\n"));
    expect(e.code).toBe("INDEX_OUT_OF_RANGE");
    expect(e.message).toBe("OBJ line 5: a face refers to vertex 4, but the file defines only 3 vertices.");
  });

  it("relative index before the first vertex", async () => {
    const e = await failure(utf8(TRI + "f -1 -2 -4\n"));
    expect(e.code).toBe("INDEX_OUT_OF_RANGE");
    expect(e.message).toBe("OBJ line 4: relative vertex index -4 in face 1 points before the first vertex (only 3 vertices are defined above this line).");
  });

  it("a face with two vertices", async () => {
    const e = await failure(utf8(TRI + "f 1 2\n"));
    expect(e.code).toBe("PARSE_ERROR");
    expect(e.message).toBe("OBJ line 4: face 1 has 2 vertex references, but a face needs at least three.");
  });

  it("no faces", async () => {
    let e = await failure(utf8(TRI));
    expect(e.code).toBe("NO_FACES");
    expect(e.message).toBe("The OBJ file has 3 vertices but no faces ('f' statements), so there is no surface to read.");
    e = await failure(utf8("# just a note\n"));
    expect(e.code).toBe("NO_FACES");
    const empty = writeBinaryStl({ positions: new Float64Array(0), triangles: new Uint32Array(0) });
    e = await failure(empty);
    expect(e.code).toBe("NO_FACES");
    expect(e.message).toBe("The binary STL has no facets, so there is no surface to read.");
    e = await failure(utf8("solid empty\nendsolid empty\n"));
    expect(e.message).toBe("The ASCII STL has no facets, so there is no surface to read.");
  });

  it("only degenerate faces", async () => {
    // a repeated index, a collinear triple, and a triangle whose corners weld into one point
    const text = "v 0 0 0\nv 1 0 0\nv 2 0 0\nv 1e-9 0 0\nv 0 1e-9 0\nf 1 1 2\nf 1 2 3\nf 1 4 5\n";
    const e = await failure(utf8(text));
    expect(e.code).toBe("ONLY_DEGENERATE_FACES");
    expect(e.message).toBe(
      "All 3 faces are degenerate (a repeated vertex or zero area once vertices closer than 2.0e-6 mm are welded), so there is no surface to read.",
    );
  });

  it("bad options", async () => {
    await expect(readMesh(utf8(TRI + "f 1 2 3\n"), { units: "furlong" as never })).rejects.toThrow(/^Units must be one of mm, cm, m, in/);
    await expect(readMesh(utf8(TRI + "f 1 2 3\n"), { units: "mm", faceBudget: 0 })).rejects.toMatchObject({ code: "BAD_PARAMETER" });
  });
});
