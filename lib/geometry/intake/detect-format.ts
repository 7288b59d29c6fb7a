/**
 * Tells OBJ, ASCII STL and binary STL apart by content, never by file name.
 *
 * Rules, in order:
 * 1. empty or whitespace-only → EMPTY_FILE;
 * 2. size exactly 84 + 50·n (n = the uint32 at byte 80) and not pure text starting with `solid` → binary STL.
 *    Many binary exporters put the word "solid" in the 80-byte header, so the word alone decides nothing;
 * 3. text starting with `solid` → ASCII STL;
 * 4. other text → OBJ;
 * 5. binary data whose first facets hold plausible float32 coordinates → binary STL (its size is then wrong, and the
 *    binary reader reports the mismatch with byte offsets);
 * 6. anything else → UNKNOWN_FORMAT, naming the first byte that is not text.
 * Source for the binary layout: 3D Systems, StereoLithography Interface Specification, 1989.
 */
import { GeometryError } from "../errors";
import { binaryStlSize, STL_FACET_BYTES, STL_HEADER_BYTES, STL_PREAMBLE_BYTES } from "./parse-stl-binary";

/** How much of the file is checked for being text. */
const TEXT_PROBE_BYTES = 1 << 16;

export type MeshFormat = "obj" | "stl-ascii" | "stl-binary";

export function detectFormat(bytes: Uint8Array): MeshFormat {
  const n = bytes.length;
  if (n === 0) throw new GeometryError("EMPTY_FILE", "The file is empty (0 bytes).", { byteOffset: 0 });

  const firstNonText = findNonText(bytes);
  let start = 0;
  if (n >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) start = 3; // UTF-8 byte order mark
  while (start < n && isBlank(bytes[start])) start++;
  if (start === n && firstNonText < 0) {
    throw new GeometryError("EMPTY_FILE", `The file contains only whitespace (${n} bytes).`, { byteOffset: 0 });
  }
  const startsWithSolid = n - start >= 5 && matchesWord(bytes, start, "solid");

  if (n >= STL_PREAMBLE_BYTES) {
    const count = new DataView(bytes.buffer, bytes.byteOffset, n).getUint32(STL_HEADER_BYTES, true);
    if (binaryStlSize(count) === n && !(firstNonText < 0 && startsWithSolid)) return "stl-binary";
  }
  if (firstNonText < 0) return startsWithSolid ? "stl-ascii" : "obj";
  // A text header followed by binary bytes is a binary STL torn before or in its facet count.
  if (n < STL_PREAMBLE_BYTES && firstNonText >= STL_HEADER_BYTES) return "stl-binary";
  if (n >= STL_PREAMBLE_BYTES && plausibleFacets(bytes)) return "stl-binary";
  const b = bytes[firstNonText];
  const sizeNote =
    n < STL_PREAMBLE_BYTES
      ? `at ${n} bytes it is too short for a binary STL (at least 84)`
      : `its first facets do not hold coordinates, so it is not a binary STL (84 + 50 bytes per facet) either`;
  throw new GeometryError(
    "UNKNOWN_FORMAT",
    `The file is neither OBJ nor STL: byte offset ${firstNonText} holds 0x${b.toString(16).padStart(2, "0")}, which is not text, and ${sizeNote}.`,
    { byteOffset: firstNonText },
  );
}

function isBlank(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13 || c === 11 || c === 12;
}

/**
 * Index of the first byte that cannot appear in a text mesh file (control bytes other than blanks) within the first
 * TEXT_PROBE_BYTES, or −1. Binary STL shows such bytes within its first facets; the text readers report any later
 * stray byte themselves, with its line.
 */
function findNonText(bytes: Uint8Array): number {
  const end = Math.min(bytes.length, TEXT_PROBE_BYTES);
  for (let k = 0; k < end; k++) {
    const c = bytes[k];
    if (c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 11 && c !== 12) return k;
    if (c === 127) return k;
  }
  return -1;
}

function matchesWord(bytes: Uint8Array, at: number, word: string): boolean {
  for (let k = 0; k < word.length; k++) if ((bytes[at + k] | 0x20) !== word.charCodeAt(k)) return false;
  const after = at + word.length;
  return after >= bytes.length || isBlank(bytes[after]);
}

/**
 * True when the first (up to 4) complete facet records hold finite float32 values of sane magnitude (0 or between
 * 1e-20 and 1e20). Random bytes pass this for one float in about four, so twelve or more values rule them out.
 */
function plausibleFacets(bytes: Uint8Array): boolean {
  const n = bytes.length;
  const view = new DataView(bytes.buffer, bytes.byteOffset, n);
  const count = view.getUint32(STL_HEADER_BYTES, true);
  if (count === 0) return false;
  const available = Math.floor((n - STL_PREAMBLE_BYTES) / STL_FACET_BYTES);
  const check = Math.min(4, count, available);
  if (check === 0) return n - STL_PREAMBLE_BYTES < STL_FACET_BYTES && count < 1e8; // header plus a torn first facet
  for (let f = 0; f < check; f++) {
    const o = STL_PREAMBLE_BYTES + f * STL_FACET_BYTES + 12;
    for (let k = 0; k < 9; k++) {
      const v = Math.abs(view.getFloat32(o + 4 * k, true));
      if (!(v === 0 || (v > 1e-20 && v < 1e20))) return false;
    }
  }
  return true;
}
