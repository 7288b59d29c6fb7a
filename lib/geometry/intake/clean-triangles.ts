/**
 * Drops faces that cannot be part of a surface: degenerate ones (a repeated vertex, or an area that is zero at the
 * scale of the mesh) and duplicates (the same three vertices as an earlier face, in any order or orientation).
 * The first copy of a duplicate is kept, so the result does not depend on hash layout.
 */

/**
 * A face is degenerate when twice its area, |(b−a)×(c−a)|, is at most DEGENERATE_AREA_FACTOR·d², d = bounding-box
 * diagonal: 1e-12, the square of the weld tolerance factor, i.e. an apex within one weld tolerance of a long edge.
 */
export const DEGENERATE_AREA_FACTOR = 1e-12;

export interface CleanResult {
  /** #F'×3 kept faces, in input order */
  triangles: Uint32Array;
  droppedDegenerate: number;
  droppedDuplicate: number;
}

/**
 * @param positions  #V×3
 * @param triangles  #F×3 indices into positions
 * @param diagonal   bounding-box diagonal of the referenced vertices, same unit as positions
 */
export function cleanTriangles(positions: Float64Array, triangles: Uint32Array, diagonal: number): CleanResult {
  const faceCount = triangles.length / 3;
  const limit = DEGENERATE_AREA_FACTOR * diagonal * diagonal;
  const limit2 = limit * limit;
  const kept = new Uint32Array(triangles.length);
  let w = 0;
  let droppedDegenerate = 0;
  let droppedDuplicate = 0;

  let size = 1;
  while (size < faceCount * 2) size <<= 1;
  const mask = size - 1;
  const table = new Int32Array(size).fill(-1); // kept face number (offset w/3)

  for (let f = 0; f < faceCount; f++) {
    const a = triangles[3 * f], b = triangles[3 * f + 1], c = triangles[3 * f + 2];
    if (a === b || b === c || a === c) {
      droppedDegenerate++;
      continue;
    }
    const ux = positions[3 * b] - positions[3 * a], uy = positions[3 * b + 1] - positions[3 * a + 1], uz = positions[3 * b + 2] - positions[3 * a + 2];
    const vx = positions[3 * c] - positions[3 * a], vy = positions[3 * c + 1] - positions[3 * a + 1], vz = positions[3 * c + 2] - positions[3 * a + 2];
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
    if (nx * nx + ny * ny + nz * nz <= limit2) {
      droppedDegenerate++;
      continue;
    }
    // Sorted vertex triple as the key.
    let lo = a, mid = b, hi = c, t: number;
    if (lo > mid) { t = lo; lo = mid; mid = t; }
    if (mid > hi) { t = mid; mid = hi; hi = t; }
    if (lo > mid) { t = lo; lo = mid; mid = t; }
    let s = (Math.imul(lo, 0x9e3779b1) ^ Math.imul(mid, 0x85ebca77) ^ Math.imul(hi, 0xc2b2ae3d)) >>> 0;
    s = ((s ^ (s >>> 16)) >>> 0) & mask;
    let duplicate = false;
    for (;;) {
      const g = table[s];
      if (g === -1) break;
      const p = kept[3 * g], q = kept[3 * g + 1], r = kept[3 * g + 2];
      if ((p === lo || q === lo || r === lo) && (p === mid || q === mid || r === mid) && (p === hi || q === hi || r === hi)) {
        duplicate = true;
        break;
      }
      s = (s + 1) & mask;
    }
    if (duplicate) {
      droppedDuplicate++;
      continue;
    }
    table[s] = w / 3;
    kept[w++] = a;
    kept[w++] = b;
    kept[w++] = c;
  }
  return { triangles: kept.slice(0, w), droppedDegenerate, droppedDuplicate };
}
