/**
 * Foam thickness compensation. A foam sheet of thickness t bent over a form stretches on its convex face and
 * compresses on its concave face; the layer that keeps its length (the neutral surface) is the one to flatten.
 * As in sheet-metal bend allowance, its position is K·t from a face of the sheet.
 * Source: bend allowance BA = θ·(R + K·T), θ the bend angle in radians, R the inside bend radius, T the thickness,
 * K the K-factor (Machinery's Handbook, sheet-metal section; e.g. https://machinecalcs.com/bend-allowance-k-factor).
 *
 * Peelform measures K·t from the face the mesh represents: an outer-face scan moves inward by K·t, an inner-face scan
 * (a mould or body cast the foam is laid over) moves outward by K·t. For an inner-face scan this is exactly the
 * handbook's R + K·T; for an outer-face scan the handbook K corresponds to 1 − K here (equal at the default 0.5).
 */
import { vertexNormals } from "./vertex-normals";

export type ScanFace = "outer" | "inner";

export interface NeutralSurfaceResult {
  /** #V×3 offset positions (same units as the input); unreferenced vertices are copied unchanged */
  positions: Float64Array;
  /** signed offset along the outward normal, same units as the input (negative = inward) */
  offset: number;
  /** faces whose normal turned by more than 90° (the offset exceeds the local radius of curvature there) */
  invertedFaces: number;
}

/**
 * Offsets a surface to the neutral surface of the foam along area-weighted vertex normals.
 *
 * @param positions  #V×3, scan units
 * @param triangles  #F×3, counter-clockwise seen from the outside of the foam
 * @param thickness  foam thickness t, scan units (0 = no offset)
 * @param scanFace   which face of the foam the mesh is
 * @param k          K-factor, 0…1 (fraction of t from the scanned face), default 0.5
 */
export function neutralSurface(
  positions: Float64Array,
  triangles: Uint32Array,
  thickness: number,
  scanFace: ScanFace,
  k = 0.5,
): NeutralSurfaceResult {
  const offset = (scanFace === "outer" ? -1 : 1) * k * thickness;
  const out = new Float64Array(positions);
  if (offset === 0) return { positions: out, offset, invertedFaces: 0 };
  const n = vertexNormals(positions, triangles);
  for (let v = 0; v < out.length; v += 3) {
    out[v] += offset * n[v];
    out[v + 1] += offset * n[v + 1];
    out[v + 2] += offset * n[v + 2];
  }
  let inverted = 0;
  for (let f = 0; f < triangles.length; f += 3) {
    const a = triangles[f] * 3, b = triangles[f + 1] * 3, c = triangles[f + 2] * 3;
    if (faceNormalDot(positions, out, a, b, c) < 0) inverted++;
  }
  return { positions: out, offset, invertedFaces: inverted };
}

function faceNormalDot(p: Float64Array, q: Float64Array, a: number, b: number, c: number): number {
  const n1 = cross(p, a, b, c, 0), n2 = cross(q, a, b, c, 0);
  const n1y = cross(p, a, b, c, 1), n2y = cross(q, a, b, c, 1);
  const n1z = cross(p, a, b, c, 2), n2z = cross(q, a, b, c, 2);
  return n1 * n2 + n1y * n2y + n1z * n2z;
}

/** Component `i` of (b − a) × (c − a). */
function cross(p: Float64Array, a: number, b: number, c: number, i: number): number {
  const j = (i + 1) % 3, k = (i + 2) % 3;
  return (p[b + j] - p[a + j]) * (p[c + k] - p[a + k]) - (p[b + k] - p[a + k]) * (p[c + j] - p[a + j]);
}
