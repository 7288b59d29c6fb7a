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
  const vertexCount = positions.length / 3;
  const limit = DEGENERATE_AREA_FACTOR * diagonal * diagonal;
  const limit2 = limit * limit;
  let droppedDegenerate = 0;
  let droppedDuplicate = 0;

  // Pass 1: degenerate faces; group the others by their smallest vertex (counting sort). File order tends to follow
  // the surface, so these accesses stay in cache, unlike a hash table of faces.
  const drop = new Uint8Array(faceCount); // 1 degenerate, 2 duplicate
  const bucketStart = new Uint32Array(vertexCount + 1);
  for (let f = 0; f < faceCount; f++) {
    const a = triangles[3 * f], b = triangles[3 * f + 1], c = triangles[3 * f + 2];
    if (a === b || b === c || a === c) {
      drop[f] = 1;
      droppedDegenerate++;
      continue;
    }
    const ux = positions[3 * b] - positions[3 * a], uy = positions[3 * b + 1] - positions[3 * a + 1], uz = positions[3 * b + 2] - positions[3 * a + 2];
    const vx = positions[3 * c] - positions[3 * a], vy = positions[3 * c + 1] - positions[3 * a + 1], vz = positions[3 * c + 2] - positions[3 * a + 2];
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
    if (nx * nx + ny * ny + nz * nz <= limit2) {
      drop[f] = 1;
      droppedDegenerate++;
      continue;
    }
    bucketStart[(a < b ? (a < c ? a : c) : b < c ? b : c) + 1]++;
  }
  for (let v = 0; v < vertexCount; v++) bucketStart[v + 1] += bucketStart[v];
  const fill = bucketStart.slice(0, vertexCount);
  const bucket = new Uint32Array(bucketStart[vertexCount]);
  for (let f = 0; f < faceCount; f++) {
    if (drop[f] !== 0) continue;
    const a = triangles[3 * f], b = triangles[3 * f + 1], c = triangles[3 * f + 2];
    bucket[fill[a < b ? (a < c ? a : c) : b < c ? b : c]++] = f; // ascending face order within a bucket
  }

  // Pass 2: within each bucket, a face whose other two vertices match an earlier face's is a duplicate.
  for (let v = 0; v < vertexCount; v++) {
    const s = bucketStart[v], e = bucketStart[v + 1];
    if (e - s < 2) continue;
    if (e - s > 64) {
      droppedDuplicate += markDuplicatesLarge(triangles, bucket, s, e, v, drop);
      continue;
    }
    for (let k = s + 1; k < e; k++) {
      const f = bucket[k];
      const key = otherPairKey(triangles, f, v);
      for (let j = s; j < k; j++) {
        const g = bucket[j];
        if (drop[g] === 0 && otherPairKey(triangles, g, v) === key) {
          drop[f] = 2;
          droppedDuplicate++;
          break;
        }
      }
    }
  }

  const kept = new Uint32Array(3 * (faceCount - droppedDegenerate - droppedDuplicate));
  let w = 0;
  for (let f = 0; f < faceCount; f++) {
    if (drop[f] !== 0) continue;
    kept[w++] = triangles[3 * f];
    kept[w++] = triangles[3 * f + 1];
    kept[w++] = triangles[3 * f + 2];
  }
  return { triangles: kept, droppedDegenerate, droppedDuplicate };
}

/** The two vertices of face f other than v, as one number (lower·2^32 + higher, exact below 2^53). */
function otherPairKey(triangles: Uint32Array, f: number, v: number): number {
  const a = triangles[3 * f], b = triangles[3 * f + 1], c = triangles[3 * f + 2];
  const p = a === v ? b : a, q = a === v || b === v ? c : b;
  return p < q ? p * 4294967296 + q : q * 4294967296 + p;
}

/** Same as the small-bucket loop, with a Map, for a vertex shared by very many faces (a cone tip, a pole). */
function markDuplicatesLarge(triangles: Uint32Array, bucket: Uint32Array, s: number, e: number, v: number, drop: Uint8Array): number {
  const seen = new Set<number>();
  let dropped = 0;
  for (let k = s; k < e; k++) {
    const f = bucket[k];
    const key = otherPairKey(triangles, f, v);
    if (seen.has(key)) {
      drop[f] = 2;
      dropped++;
    } else {
      seen.add(key);
    }
  }
  return dropped;
}
