/**
 * The two faces on either side of each seam edge.
 *
 * A face lists its corners counter-clockwise seen from the outside of the foam, so the face that contains the
 * directed edge a→b lies to the left of a→b (seen from outside) and the face with b→a lies to its right.
 */

export interface SeamEdgeFaces {
  /** number of distinct seam edges (duplicates in the input are dropped) */
  count: number;
  /** #E endpoint ids (working vertices); a < b is not guaranteed, a→b is the direction of `faceAB` */
  a: Uint32Array;
  b: Uint32Array;
  /** #E face containing a→b, −1 if none */
  faceAB: Int32Array;
  /** #E face containing b→a, −1 if none (a seam on the mesh border) */
  faceBA: Int32Array;
  /** seam edges met by more than two faces (non-manifold); the extra faces are ignored */
  nonManifold: number;
  /** seam edges listed twice in the input */
  duplicates: number;
}

/**
 * @param triangles    #F×3 working mesh faces
 * @param vertexCount  #V of the working mesh
 * @param seamEdges    2 per seam edge, working vertex ids
 */
export function seamEdgeFaces(triangles: Uint32Array, vertexCount: number, seamEdges: Uint32Array): SeamEdgeFaces {
  const key = new Map<number, number>();
  const onSeam = new Uint8Array(vertexCount);
  const m = seamEdges.length >> 1;
  const a = new Uint32Array(m), b = new Uint32Array(m);
  let count = 0, duplicates = 0;
  for (let i = 0; i < m; i++) {
    const u = seamEdges[2 * i], v = seamEdges[2 * i + 1];
    if (u === v) continue;
    const k = u < v ? u * vertexCount + v : v * vertexCount + u;
    if (key.has(k)) {
      duplicates++;
      continue;
    }
    key.set(k, count);
    a[count] = u;
    b[count] = v;
    onSeam[u] = 1;
    onSeam[v] = 1;
    count++;
  }
  const faceAB = new Int32Array(count).fill(-1), faceBA = new Int32Array(count).fill(-1);
  let nonManifold = 0;
  const nf = triangles.length / 3;
  for (let f = 0; f < nf; f++) {
    for (let c = 0; c < 3; c++) {
      const u = triangles[3 * f + c], v = triangles[3 * f + ((c + 1) % 3)];
      if (onSeam[u] === 0 || onSeam[v] === 0) continue;
      const e = key.get(u < v ? u * vertexCount + v : v * vertexCount + u);
      if (e === undefined) continue;
      if (u === a[e]) {
        if (faceAB[e] === -1) faceAB[e] = f;
        else nonManifold++;
      } else if (faceBA[e] === -1) faceBA[e] = f;
      else nonManifold++;
    }
  }
  // An edge met by two faces of the same orientation (a badly oriented mesh) has faceAB set twice; nothing better to
  // do than to count it as non-manifold.
  return {
    count,
    a: a.slice(0, count),
    b: b.slice(0, count),
    faceAB,
    faceBA,
    nonManifold,
    duplicates,
  };
}
