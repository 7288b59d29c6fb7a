/**
 * Splits one polygon face into triangles that keep its orientation.
 *
 * Convex polygons (all quads and n-gons that modelling tools usually write) get a fan from corner 0. Concave ones are
 * ear-clipped in the plane of the polygon, so no triangle falls outside it or flips. Source: D. Eberly, "Triangulation
 * by Ear Clipping" (Geometric Tools, 2002); the plane is given by Newell's normal (Source: M. E. Newell, via
 * I. E. Sutherland et al., "A Characterization of Ten Hidden-Surface Algorithms", Computing Surveys 6(1), 1974).
 * A polygon with no area or one that crosses itself (no ear left) falls back to the fan for what remains.
 *
 * Ear clipping costs up to O(n³) for n corners, so hostile files cannot make it hang: polygons with more than
 * MAX_EAR_CLIP_CORNERS corners are fanned, and a work budget shared by one file (EarClipBudget) switches the rest of
 * the file to fans once spent. Real meshes use a tiny fraction of it.
 */
import type { GrowableU32 } from "./growable";

/** Largest polygon that is ear-clipped; bigger ones are fanned. */
export const MAX_EAR_CLIP_CORNERS = 64;

/** Ear-test steps one file may spend (≈ 0.1 s of CPU). */
export const EAR_CLIP_WORK_PER_FILE = 50_000_000;

/** Remaining ear-clipping work of one file, shared by all its polygons. */
export interface EarClipBudget {
  remaining: number;
}

let px = new Float64Array(64);
let py = new Float64Array(64);
let prev = new Int32Array(64);
let next = new Int32Array(64);

/**
 * @param positions  #V×3 vertex positions
 * @param corners    polygon corner vertex indices (first `count` entries), in face order
 * @param out        receives 3 indices per triangle (count − 2 triangles)
 * @param budget     ear-clipping work left for the file (see EarClipBudget)
 */
export function triangulatePolygon(
  positions: Float64Array,
  corners: Uint32Array,
  count: number,
  out: GrowableU32,
  budget: EarClipBudget = { remaining: EAR_CLIP_WORK_PER_FILE },
): void {
  out.reserve(3 * (count - 2));
  if (count === 3 || count > MAX_EAR_CLIP_CORNERS || budget.remaining <= 0 || !isConcave(positions, corners, count)) {
    fan(corners, 0, count, out);
    return;
  }
  // Doubly linked ring of remaining corners.
  for (let k = 0; k < count; k++) {
    prev[k] = k === 0 ? count - 1 : k - 1;
    next[k] = k === count - 1 ? 0 : k + 1;
  }
  let remaining = count;
  let v = 0;
  let sinceLastEar = 0;
  const d = out.data;
  while (remaining > 3) {
    budget.remaining -= remaining;
    if (budget.remaining <= 0) break;
    const a = prev[v], c = next[v];
    if (isEar(a, v, c)) {
      d[out.length++] = corners[a];
      d[out.length++] = corners[v];
      d[out.length++] = corners[c];
      next[a] = c;
      prev[c] = a;
      remaining--;
      v = c;
      sinceLastEar = 0;
    } else {
      v = c;
      if (++sinceLastEar > remaining) break; // no ear: self-crossing polygon
    }
  }
  // The last triangle, or a fan over what a crossing polygon left.
  const first = v;
  for (let k = next[first]; next[k] !== first; k = next[k]) {
    d[out.length++] = corners[first];
    d[out.length++] = corners[k];
    d[out.length++] = corners[next[k]];
  }
}

function fan(corners: Uint32Array, from: number, count: number, out: GrowableU32): void {
  const d = out.data;
  let w = out.length;
  const a = corners[from];
  for (let k = from + 1; k + 1 < count; k++) {
    d[w++] = a;
    d[w++] = corners[k];
    d[w++] = corners[k + 1];
  }
  out.length = w;
}

/**
 * Projects the polygon to the plane of its Newell normal (into px/py, counter-clockwise when seen along the normal)
 * and reports whether any corner is reflex. Zero-area polygons count as convex (the fan is as good as anything).
 */
function isConcave(p: Float64Array, corners: Uint32Array, count: number): boolean {
  let nx = 0, ny = 0, nz = 0;
  for (let k = 0; k < count; k++) {
    const i = 3 * corners[k], j = 3 * corners[k + 1 === count ? 0 : k + 1];
    nx += (p[i + 1] - p[j + 1]) * (p[i + 2] + p[j + 2]);
    ny += (p[i + 2] - p[j + 2]) * (p[i] + p[j]);
    nz += (p[i] - p[j]) * (p[i + 1] + p[j + 1]);
  }
  const ax = Math.abs(nx), ay = Math.abs(ny), az = Math.abs(nz);
  if (ax + ay + az === 0) return false;
  if (count > px.length) {
    px = new Float64Array(2 * count);
    py = new Float64Array(2 * count);
    prev = new Int32Array(2 * count);
    next = new Int32Array(2 * count);
  }
  // Drop the dominant axis; swap the other two when needed so the projection keeps the orientation.
  let u = 0, w = 1, flip = nz < 0;
  if (ax >= ay && ax >= az) { u = 1; w = 2; flip = nx < 0; }
  else if (ay >= az) { u = 2; w = 0; flip = ny < 0; }
  for (let k = 0; k < count; k++) {
    const i = 3 * corners[k];
    px[k] = flip ? p[i + w] : p[i + u];
    py[k] = flip ? p[i + u] : p[i + w];
  }
  for (let k = 0; k < count; k++) {
    const a = k === 0 ? count - 1 : k - 1, c = k + 1 === count ? 0 : k + 1;
    if (cross(a, k, c) < 0) return true;
  }
  return false;
}

function cross(a: number, b: number, c: number): number {
  return (px[b] - px[a]) * (py[c] - py[b]) - (py[b] - py[a]) * (px[c] - px[b]);
}

/**
 * Corner b (between a and c on the ring) is convex and no other remaining corner lies strictly inside triangle a b c.
 * Corners exactly on its sides do not block it: clipping then leaves a zero-area sliver but never an overlap, and
 * nearly collinear scan polygons would otherwise have no ear at all.
 */
function isEar(a: number, b: number, c: number): boolean {
  if (cross(a, b, c) <= 0) return false;
  for (let k = next[c]; k !== a; k = next[k]) {
    if (cross(a, b, k) > 0 && cross(b, c, k) > 0 && cross(c, a, k) > 0) return false;
  }
  return true;
}
