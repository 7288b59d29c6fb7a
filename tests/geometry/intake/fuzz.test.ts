import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { GeometryError } from "@/lib/geometry/errors";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeAsciiStl, writeBinaryStl, writeObj } from "@/lib/geometry/intake/write-mesh";
import { makeTorus } from "@/tests/fixtures/intake/make-torus";
import { makeCube, utf8 } from "@/tests/fixtures/intake/small-meshes";

/** readMesh either succeeds with a consistent result or throws a GeometryError; anything else fails the property. */
async function readsOrRejectsCleanly(bytes: Uint8Array): Promise<void> {
  let result;
  try {
    result = await readMesh(bytes, { units: "mm", faceBudget: 150 });
  } catch (e) {
    if (!(e instanceof GeometryError)) throw e;
    expect(e.message.length).toBeGreaterThan(10);
    expect(e.message).not.toMatch(/\n|undefined|NaN coordinate at byte offset NaN/);
    return;
  }
  const { mesh, report, inputToWorking } = result;
  const vertexCount = mesh.positions.length / 3;
  expect(mesh.triangles.length % 3).toBe(0);
  expect(mesh.triangles.length).toBeGreaterThan(0);
  for (const v of mesh.triangles) expect(v).toBeLessThan(vertexCount);
  for (const v of inputToWorking) expect(v).toBeLessThan(vertexCount);
  for (const x of mesh.positions) expect(Number.isFinite(x)).toBe(true);
  expect(report.faces).toBeGreaterThan(0);
}

const torus = makeTorus(12, 8);
const quadObj =
  "# cube of quads with relative indices\nv 0 0 0\nv 1 0 0\nv 1 1 0\nv 0 1 0\nv 0 0 1\nv 1 0 1\nv 1 1 1\nv 0 1 1\n" +
  "f -8 -5 -6 -7\nf 5/1 6/1 7/1 8/1\nf 1//1 2//1 6//1 5//1\nf 4 8 7 3\nf 1 5 8 4\nf 2 3 7 6\n";
const validFiles: [string, Uint8Array][] = [
  ["OBJ", utf8(writeObj(torus))],
  ["OBJ quads", utf8(quadObj)],
  ["binary STL", writeBinaryStl(torus)],
  ["binary STL, solid header", writeBinaryStl(makeCube(), { header: "solid cube" })],
  ["ASCII STL", utf8(writeAsciiStl(makeCube()))],
];

const WORDS = ["solid", "facet", "endloop", "vertex", "nan", "inf", "-1e999", "f", "v", "0", "-0", "\\\n", "\n", "abc", "//", "\u00e9", "\0"];

type Mutation =
  | { kind: "truncate"; at: number }
  | { kind: "flip"; at: number; value: number }
  | { kind: "insert"; at: number; word: string };

const mutation = fc.oneof(
  fc.record({ kind: fc.constant("truncate" as const), at: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant("flip" as const), at: fc.double({ min: 0, max: 1, noNaN: true }), value: fc.integer({ min: 0, max: 255 }) }),
  fc.record({ kind: fc.constant("insert" as const), at: fc.double({ min: 0, max: 1, noNaN: true }), word: fc.constantFrom(...WORDS) }),
);

function mutate(bytes: Uint8Array, mutations: Mutation[]): Uint8Array {
  let b = bytes;
  for (const m of mutations) {
    const at = Math.min(b.length, Math.floor(m.at * b.length));
    if (m.kind === "truncate") b = b.slice(0, at);
    else if (m.kind === "flip") {
      if (b.length === 0) continue;
      b = b.slice();
      b[Math.min(at, b.length - 1)] = m.value;
    } else {
      const w = utf8(` ${m.word} `);
      const next = new Uint8Array(b.length + w.length);
      next.set(b.subarray(0, at));
      next.set(w, at);
      next.set(b.subarray(at), at + w.length);
      b = next;
    }
  }
  return b;
}

describe("fuzzing readMesh: never a crash or a hang, only GeometryError", () => {
  it("random bytes", async () => {
    await fc.assert(fc.asyncProperty(fc.uint8Array({ minLength: 0, maxLength: 2000 }), readsOrRejectsCleanly), { numRuns: 300 });
  });

  it("random bytes after a binary STL preamble that claims a plausible facet count", async () => {
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 0, max: 40 }), fc.uint8Array({ minLength: 0, maxLength: 2100 }), async (count, body) => {
        const b = new Uint8Array(84 + body.length);
        b.set(utf8("solid fuzz"));
        new DataView(b.buffer).setUint32(80, count, true);
        b.set(body, 84);
        await readsOrRejectsCleanly(b);
      }),
      { numRuns: 200 },
    );
  });

  it("random text built from mesh-file words", async () => {
    const token = fc.constantFrom("v", "f", "vt", "vn", "#", "1", "-1", "0", "2.5", "1e3", "x", "/", "//", "\n", " ", "\\", "solid", "facet", "normal", "outer", "loop", "vertex", "endloop", "endfacet", "endsolid");
    await fc.assert(
      fc.asyncProperty(fc.array(token, { maxLength: 300 }), async (tokens) => readsOrRejectsCleanly(utf8(tokens.join(" ")))),
      { numRuns: 300 },
    );
  });

  for (const [name, bytes] of validFiles) {
    it(`mutated ${name}: truncations, byte flips, inserted words`, async () => {
      await readsOrRejectsCleanly(bytes); // the unmutated file reads
      await fc.assert(
        fc.asyncProperty(fc.array(mutation, { minLength: 1, maxLength: 4 }), async (ms) => readsOrRejectsCleanly(mutate(bytes, ms))),
        { numRuns: 150 },
      );
    });
  }

  it("every truncation of a binary STL is reported as TRUNCATED", async () => {
    const bytes = writeBinaryStl(makeCube());
    for (let cut = 84; cut < bytes.length; cut += 7) {
      await expect(readMesh(bytes.subarray(0, cut), { units: "mm" })).rejects.toMatchObject({ code: "TRUNCATED" });
    }
  });
});
