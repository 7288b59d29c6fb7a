/**
 * Binary STL reader.
 *
 * Layout (little-endian): 80-byte header, uint32 facet count n, then n records of 50 bytes: normal (3 × float32),
 * three vertices (3 × 3 × float32), uint16 attribute byte count. A file is therefore exactly 84 + 50·n bytes.
 * Source: 3D Systems, StereoLithography Interface Specification, 1989 (binary STL section).
 *
 * The stored normal and the attribute bytes are ignored: normals are recomputed from the vertex order downstream.
 */
import { GeometryError } from "../errors";

export const STL_HEADER_BYTES = 80;
export const STL_FACET_BYTES = 50;
/** Header plus the facet count. */
export const STL_PREAMBLE_BYTES = 84;

export interface StlParseResult {
  /** #F×9 corner positions: face f has corners 3f, 3f+1, 3f+2, each 3 coordinates (file units). */
  corners: Float64Array;
  faceCount: number;
}

/** The byte size a binary STL with `faceCount` facets must have. */
export function binaryStlSize(faceCount: number): number {
  return STL_PREAMBLE_BYTES + STL_FACET_BYTES * faceCount;
}

/**
 * Parses a binary STL. Throws GeometryError with `byteOffset` for a short file, a facet count that does not match
 * the size, and non-finite coordinates.
 */
export function parseBinaryStl(bytes: Uint8Array): StlParseResult {
  const size = bytes.length;
  if (size < STL_PREAMBLE_BYTES) {
    throw new GeometryError(
      "TRUNCATED",
      `The binary STL is truncated: it has ${size} bytes, fewer than the 84 bytes of header and facet count.`,
      { byteOffset: size },
    );
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const faceCount = view.getUint32(STL_HEADER_BYTES, true);
  const expected = binaryStlSize(faceCount);
  if (expected > size) {
    const complete = Math.floor((size - STL_PREAMBLE_BYTES) / STL_FACET_BYTES);
    throw new GeometryError(
      "TRUNCATED",
      `The binary STL is truncated: its header (byte offset 80) says ${faceCount} facets, which need ${expected} bytes, but the file has only ${size} bytes (${complete} complete facets).`,
      { byteOffset: size },
    );
  }
  if (expected < size) {
    throw new GeometryError(
      "PARSE_ERROR",
      `The binary STL has ${size - expected} bytes after its last facet: the header (byte offset 80) says ${faceCount} facets, which take ${expected} bytes, but the file has ${size}.`,
      { byteOffset: expected },
    );
  }
  const corners = new Float64Array(faceCount * 9);
  let o = STL_PREAMBLE_BYTES + 12;
  let w = 0;
  for (let f = 0; f < faceCount; f++) {
    for (let k = 0; k < 9; k++) {
      const v = view.getFloat32(o + 4 * k, true);
      if (v - v !== 0) {
        const at = o + 4 * k;
        throw new GeometryError(
          "BAD_NUMBER",
          `The binary STL has ${Number.isNaN(v) ? "a NaN" : "an infinite"} coordinate at byte offset ${at} (facet ${f + 1}, vertex ${Math.floor(k / 3) + 1}, ${"xyz"[k % 3]}).`,
          { byteOffset: at },
        );
      }
      corners[w++] = v;
    }
    o += STL_FACET_BYTES;
  }
  return { corners, faceCount };
}
