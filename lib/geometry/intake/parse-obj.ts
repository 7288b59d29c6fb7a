/**
 * Wavefront OBJ reader for polygon geometry: `v` and `f` statements. Texture and normal references (`v/vt/vn`,
 * `v//vn`), groups, smoothing groups, materials, comments and free-form statements are read past and ignored.
 * Polygons are split into triangles that keep their orientation: convex ones as a fan from corner 0, concave ones by
 * ear clipping (triangulate-polygon.ts). A polygon that refers to vertices defined later in the file is fanned.
 *
 * Source: Wavefront OBJ format, "Object Files (.obj)", Appendix B1 of the Advanced Visualizer manual: vertex indices
 * start at 1; a negative index counts back from the last vertex defined above the statement (-1 = that vertex);
 * a backslash at the end of a line continues the statement on the next line.
 *
 * Runs as a single byte scanner over the file: no per-line or per-token strings.
 */
import { GeometryError } from "../errors";
import { GrowableF64, GrowableU32 } from "./growable";
import { scanFloat, scanInt, scanState, wordAt } from "./scan-number";
import { EAR_CLIP_WORK_PER_FILE, triangulatePolygon, type EarClipBudget } from "./triangulate-polygon";

export interface ObjParseResult {
  /** #V×3 positions of every `v` statement, in file order (file units). */
  positions: Float64Array;
  /** #T×3 0-based indices into `positions`, polygons fan-triangulated, in file order. All indices are < #V. */
  triangles: Uint32Array;
  /** Number of `v` statements. */
  vertexCount: number;
  /** Number of `f` statements (polygons) in the file. */
  polygonCount: number;
}

const AXIS = ["x", "y", "z"];

const SP = 32;
const TAB = 9;
const LF = 10;
const CR = 13;
const BACKSLASH = 92;
const SLASH = 47;

/**
 * Parses OBJ bytes (ASCII or UTF-8). Throws GeometryError (with `line`) on anything it cannot read.
 * @param bytes  the whole file
 */
export function parseObj(bytes: Uint8Array): ObjParseResult {
  const n = bytes.length;
  const pos = new GrowableF64(Math.min(1 << 22, Math.max(1024, (n / 12) | 0)));
  const tri = new GrowableU32(Math.min(1 << 23, Math.max(1024, (n / 6) | 0)));
  let corners = new Uint32Array(64);
  let vertexCount = 0;
  let polygonCount = 0;
  line = 1;
  let maxIndex = -1;
  let maxIndexLine = 0;
  const earClipBudget: EarClipBudget = { remaining: EAR_CLIP_WORK_PER_FILE };
  let i = 0;

  while (i < n) {
    i = skipBlanks(bytes, i, n);
    if (i >= n) break;
    const c0 = bytes[i];
    if (c0 === LF) {
      line++;
      i++;
      continue;
    }
    const c1 = i + 1 < n ? bytes[i + 1] : LF;
    const keywordEnds = c1 === SP || c1 === TAB || c1 === LF || c1 === CR || (c1 === BACKSLASH && isContinuation(bytes, i + 1, n));

    if (c0 === 118 /* v */ && keywordEnds) {
      // v x y z [w | r g b]
      i++;
      pos.reserve(3);
      let count = 0;
      for (;;) {
        i = skipBlanks(bytes, i, n);
        if (i >= n || bytes[i] === LF) break;
        const value = scanFloat(bytes, i, n);
        const e = scanState.end;
        if (e === i || !endsToken(bytes, e, n)) {
          throw new GeometryError(
            "BAD_NUMBER",
            `OBJ line ${line}: expected a number for ${count < 3 ? `the ${AXIS[count]} coordinate` : "an extra vertex value"} of vertex ${vertexCount + 1} but found "${wordAt(bytes, i, n)}".`,
            { line },
          );
        }
        if (!Number.isFinite(value)) {
          throw new GeometryError(
            "BAD_NUMBER",
            `OBJ line ${line}: the ${count < 3 ? `${AXIS[count]} coordinate` : "extra value"} of vertex ${vertexCount + 1} ("${wordAt(bytes, i, n)}") is not a finite number.`,
            { line },
          );
        }
        if (count < 3) pos.data[pos.length + count] = value;
        count++;
        i = e;
      }
      if (count < 3) {
        throw new GeometryError(
          "PARSE_ERROR",
          `OBJ line ${line}: vertex ${vertexCount + 1} has ${count} coordinate${count === 1 ? "" : "s"}, but a vertex needs x, y and z.`,
          { line },
        );
      }
      pos.length += 3;
      vertexCount++;
      continue;
    }

    if (c0 === 102 /* f */ && keywordEnds) {
      i++;
      let count = 0;
      const faceLine = line;
      for (;;) {
        i = skipBlanks(bytes, i, n);
        if (i >= n || bytes[i] === LF) break;
        const tokenStart = i;
        const raw = scanInt(bytes, i, n);
        let e = scanState.end;
        if (e === i) {
          throw new GeometryError(
            "BAD_NUMBER",
            `OBJ line ${line}: expected a vertex index in face ${polygonCount + 1} but found "${wordAt(bytes, i, n)}".`,
            { line },
          );
        }
        // Texture / normal references: digits, '-' and '/' only, read past.
        if (e < n && bytes[e] === SLASH) {
          while (e < n) {
            const c = bytes[e];
            if (c === SLASH || c === 45 || (c >= 48 && c <= 57)) e++;
            else break;
          }
        }
        if (!endsToken(bytes, e, n)) {
          throw new GeometryError(
            "BAD_NUMBER",
            `OBJ line ${line}: "${wordAt(bytes, tokenStart, n)}" in face ${polygonCount + 1} is not a vertex reference like 7, -1, 7/3 or 7//2.`,
            { line },
          );
        }
        let index: number;
        if (raw > 0) {
          if (raw > 0xfffffffe) {
            throw new GeometryError(
              "INDEX_OUT_OF_RANGE",
              `OBJ line ${line}: vertex index ${wordAt(bytes, tokenStart, n)} in face ${polygonCount + 1} is far larger than any mesh this reader accepts.`,
              { line },
            );
          }
          index = raw - 1;
          if (index > maxIndex) {
            maxIndex = index;
            maxIndexLine = line;
          }
        } else if (raw < 0) {
          index = vertexCount + raw;
          if (index < 0) {
            throw new GeometryError(
              "INDEX_OUT_OF_RANGE",
              `OBJ line ${line}: relative vertex index ${raw} in face ${polygonCount + 1} points before the first vertex (only ${vertexCount} vertices are defined above this line).`,
              { line },
            );
          }
        } else {
          throw new GeometryError(
            "INDEX_OUT_OF_RANGE",
            `OBJ line ${line}: vertex index 0 in face ${polygonCount + 1} is not valid, because OBJ indices start at 1 (or count back from -1).`,
            { line },
          );
        }
        if (count === corners.length) {
          const next = new Uint32Array(corners.length * 2);
          next.set(corners);
          corners = next;
        }
        corners[count++] = index;
        i = e;
      }
      if (count < 3) {
        throw new GeometryError(
          "PARSE_ERROR",
          `OBJ line ${faceLine}: face ${polygonCount + 1} has ${count} vertex reference${count === 1 ? "" : "s"}, but a face needs at least three.`,
          { line: faceLine },
        );
      }
      polygonCount++;
      if (count === 3) {
        tri.reserve(3);
        tri.data[tri.length++] = corners[0];
        tri.data[tri.length++] = corners[1];
        tri.data[tri.length++] = corners[2];
      } else if (maxCorner(corners, count) < vertexCount) {
        triangulatePolygon(pos.data, corners, count, tri, earClipBudget);
      } else {
        // positions not read yet: fan (exact for convex polygons)
        fanInto(corners, count, tri);
      }
      continue;
    }

    // Anything else (vt, vn, vp, g, o, s, usemtl, mtllib, l, p, #…, free-form statements) is not geometry we use.
    i = skipLine(bytes, i, n);
    line++;
  }

  if (maxIndex >= vertexCount) {
    throw new GeometryError(
      "INDEX_OUT_OF_RANGE",
      `OBJ line ${maxIndexLine}: a face refers to vertex ${maxIndex + 1}, but the file defines only ${vertexCount} vertices.`,
      { line: maxIndexLine },
    );
  }

  return { positions: pos.toArray(), triangles: tri.toArray(), vertexCount, polygonCount };
}

/**
 * Current physical line (1-based). Module state so the helpers below stay plain functions the JIT inlines (measured
 * ~20 % less CPU than closures); safe because parseObj is synchronous and resets it on entry.
 */
let line = 1;

/** Skips blanks and `\`+newline continuations; returns the new position. Counts continued lines. */
function skipBlanks(bytes: Uint8Array, k: number, n: number): number {
  while (k < n) {
    const c = bytes[k];
    if (c === SP || c === TAB || c === CR || c === 11 || c === 12) {
      k++;
    } else if (c === BACKSLASH && isContinuation(bytes, k, n)) {
      k++;
      if (bytes[k] === CR) k++;
      k++; // the LF
      line++;
    } else {
      break;
    }
  }
  return k;
}

/** Moves past the rest of the logical line (continuations included), returning the index after its LF. */
function skipLine(bytes: Uint8Array, k: number, n: number): number {
  while (k < n) {
    const c = bytes[k];
    if (c === LF) return k + 1;
    if (c === BACKSLASH && isContinuation(bytes, k, n)) {
      k++;
      if (bytes[k] === CR) k++;
      line++;
    }
    k++;
  }
  return k;
}

function maxCorner(corners: Uint32Array, count: number): number {
  let m = 0;
  for (let k = 0; k < count; k++) if (corners[k] > m) m = corners[k];
  return m;
}

function fanInto(corners: Uint32Array, count: number, tri: GrowableU32): void {
  tri.reserve(3 * (count - 2));
  const d = tri.data;
  let w = tri.length;
  for (let k = 1; k + 1 < count; k++) {
    d[w++] = corners[0];
    d[w++] = corners[k];
    d[w++] = corners[k + 1];
  }
  tri.length = w;
}

function isContinuation(bytes: Uint8Array, k: number, n: number): boolean {
  const c = k + 1 < n ? bytes[k + 1] : 0;
  return c === LF || (c === CR && k + 2 < n && bytes[k + 2] === LF);
}

/** True when a token may end at `k`: end of file, blank, newline, or a line continuation. */
function endsToken(bytes: Uint8Array, k: number, n: number): boolean {
  if (k >= n) return true;
  const c = bytes[k];
  return c === SP || c === TAB || c === LF || c === CR || c === 11 || c === 12 || (c === BACKSLASH && isContinuation(bytes, k, n));
}
