/**
 * ASCII STL reader.
 *
 * Grammar: `solid name` { `facet normal ni nj nk` `outer loop` `vertex x y z` ×3 `endloop` `endfacet` } `endsolid name`.
 * Source: 3D Systems, StereoLithography Interface Specification, 1989 (ASCII STL section). Keywords are read
 * case-insensitively; the facet normal is not validated (exporters write `nan` for degenerate facets) because normals
 * are recomputed downstream. Loops with more than three vertices are fan-triangulated. Several solids in one file
 * are read one after the other.
 */
import { GeometryError } from "../errors";
import { GrowableF64 } from "./growable";
import { scanFloat, scanState, wordAt } from "./scan-number";

export interface AsciiStlParseResult {
  /** #F×9 corner positions: face f has corners 3f, 3f+1, 3f+2 (file units). */
  corners: Float64Array;
  faceCount: number;
  /** Facets (loops) in the file; differs from faceCount only when a loop had more than three vertices. */
  facetCount: number;
}

/** Parses ASCII STL bytes. Throws GeometryError (with `line`) on anything it cannot read. */
export function parseAsciiStl(bytes: Uint8Array): AsciiStlParseResult {
  const n = bytes.length;
  const out = new GrowableF64(Math.min(1 << 22, Math.max(1024, (n / 25) | 0)));
  let i = 0;
  let line = 1;
  let faceCount = 0;
  let facetCount = 0;
  let tokenStart = 0;
  let tokenEnd = 0;
  let loop = new Float64Array(48);

  /** Advances to the next token; returns false at end of file. Sets tokenStart/tokenEnd. */
  const next = (): boolean => {
    while (i < n) {
      const c = bytes[i];
      if (c === 10) line++;
      else if (c !== 32 && c !== 9 && c !== 13 && c !== 11 && c !== 12) break;
      i++;
    }
    if (i >= n) return false;
    tokenStart = i;
    while (i < n) {
      const c = bytes[i];
      if (c === 32 || c === 9 || c === 10 || c === 13 || c === 11 || c === 12) break;
      i++;
    }
    tokenEnd = i;
    return true;
  };
  const is = (word: string): boolean => {
    if (tokenEnd - tokenStart !== word.length) return false;
    for (let k = 0; k < word.length; k++) {
      if ((bytes[tokenStart + k] | 0x20) !== word.charCodeAt(k)) return false;
    }
    return true;
  };
  const skipRestOfLine = (): void => {
    while (i < n && bytes[i] !== 10) i++;
  };
  const truncated = (expected: string): never => {
    throw new GeometryError(
      "TRUNCATED",
      `The ASCII STL is truncated: it ends at line ${line}${faceCount > 0 || facetCount > 0 ? ` after facet ${facetCount}` : ""}, where ${expected} was expected.`,
      { line },
    );
  };
  /** A wrong word that runs into the end of the file is a cut-off file, not a typo. */
  const unexpected = (expected: string, message: string): never => {
    if (tokenEnd === n) truncated(expected);
    throw new GeometryError("PARSE_ERROR", message, { line });
  };
  const expect = (word: string, context: string): void => {
    if (!next()) truncated(`'${word}'`);
    if (!is(word)) {
      if (tokenEnd === n) truncated(`'${word}'`);
      throw new GeometryError(
        "PARSE_ERROR",
        `ASCII STL line ${line}: expected '${word}' ${context} but found "${wordAt(bytes, tokenStart, n)}".`,
        { line },
      );
    }
  };

  if (!next()) truncated("'solid'");
  if (!is("solid")) {
    throw new GeometryError("PARSE_ERROR", `ASCII STL line ${line}: the file must start with 'solid' but starts with "${wordAt(bytes, tokenStart, n)}".`, { line });
  }
  skipRestOfLine();

  for (;;) {
    if (!next()) truncated("'facet' or 'endsolid'");
    if (is("endsolid")) {
      skipRestOfLine();
      if (!next()) break;
      if (is("solid")) {
        skipRestOfLine();
        continue;
      }
      unexpected("'solid'", `ASCII STL line ${line}: expected the end of the file or another 'solid' after 'endsolid' but found "${wordAt(bytes, tokenStart, n)}".`);
    }
    if (!is("facet")) {
      unexpected("'facet' or 'endsolid'", `ASCII STL line ${line}: expected 'facet' or 'endsolid' but found "${wordAt(bytes, tokenStart, n)}".`);
    }
    const facetLine = line;
    expect("normal", "after 'facet'");
    for (let k = 0; k < 3; k++) {
      if (!next()) truncated("a normal component");
    }
    expect("outer", `to open the loop of facet ${facetCount + 1}`);
    expect("loop", "after 'outer'");
    let count = 0;
    for (;;) {
      if (!next()) truncated("'vertex' or 'endloop'");
      if (is("endloop")) break;
      if (!is("vertex")) {
        unexpected("'vertex' or 'endloop'", `ASCII STL line ${line}: expected 'vertex' or 'endloop' in facet ${facetCount + 1} but found "${wordAt(bytes, tokenStart, n)}".`);
      }
      if (3 * count + 3 > loop.length) {
        const grown = new Float64Array(loop.length * 2);
        grown.set(loop);
        loop = grown;
      }
      for (let k = 0; k < 3; k++) {
        if (!next()) truncated(`the ${"xyz"[k]} coordinate of a vertex`);
        const v = scanFloat(bytes, tokenStart, tokenEnd);
        if (scanState.end !== tokenEnd) {
          if (tokenEnd === n) truncated(`the ${"xyz"[k]} coordinate of a vertex`);
          throw new GeometryError("BAD_NUMBER", `ASCII STL line ${line}: expected a number for the ${"xyz"[k]} coordinate of a vertex of facet ${facetCount + 1} but found "${wordAt(bytes, tokenStart, n)}".`, { line });
        }
        if (!Number.isFinite(v)) {
          throw new GeometryError("BAD_NUMBER", `ASCII STL line ${line}: the ${"xyz"[k]} coordinate "${wordAt(bytes, tokenStart, n)}" of a vertex of facet ${facetCount + 1} is not a finite number.`, { line });
        }
        loop[3 * count + k] = v;
      }
      count++;
    }
    if (count < 3) {
      throw new GeometryError("PARSE_ERROR", `ASCII STL line ${facetLine}: facet ${facetCount + 1} has ${count} vertices, but a facet needs three.`, { line: facetLine });
    }
    expect("endfacet", `to close facet ${facetCount + 1}`);
    facetCount++;
    const t = count - 2;
    out.reserve(9 * t);
    const d = out.data;
    let w = out.length;
    for (let k = 1; k + 1 < count; k++) {
      d[w++] = loop[0]; d[w++] = loop[1]; d[w++] = loop[2];
      d[w++] = loop[3 * k]; d[w++] = loop[3 * k + 1]; d[w++] = loop[3 * k + 2];
      d[w++] = loop[3 * k + 3]; d[w++] = loop[3 * k + 4]; d[w++] = loop[3 * k + 5];
    }
    out.length = w;
    faceCount += t;
  }
  return { corners: out.toArray(), faceCount, facetCount };
}
