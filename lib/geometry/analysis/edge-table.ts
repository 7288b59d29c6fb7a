/**
 * Undirected edges of a triangle mesh, grouped by their lower vertex (a CSR layout), with the faces on each edge.
 * Built in O(F + V) with counting sort and a per-vertex stamp, so a vertex of very high degree costs nothing extra.
 */

export interface EdgeTable {
  edgeCount: number;
  /** #E lower and higher vertex of each edge */
  edgeLo: Uint32Array;
  edgeHi: Uint32Array;
  /** #E number of face sides on the edge: 1 boundary, 2 manifold interior, more = non-manifold */
  edgeFaces: Uint32Array;
  /** #F×3: edge of the side from corner k to corner (k+1) mod 3 of face f, at 3f+k */
  sideEdge: Uint32Array;
  /** #V+1: edges with lower vertex v are ids vertexEdgeStart[v] … vertexEdgeStart[v+1]−1 */
  vertexEdgeStart: Uint32Array;
}

/**
 * @param triangles    #F×3 vertex indices
 * @param vertexCount  size of the vertex index space (indices must be below it)
 */
export function buildEdgeTable(triangles: Uint32Array, vertexCount: number): EdgeTable {
  const sides = triangles.length;
  const count = new Uint32Array(vertexCount + 1);
  for (let f = 0; f < sides; f += 3) {
    const a = triangles[f], b = triangles[f + 1], c = triangles[f + 2];
    count[a < b ? a : b]++;
    count[b < c ? b : c]++;
    count[c < a ? c : a]++;
  }
  const bucketStart = new Uint32Array(vertexCount + 1);
  for (let v = 0, acc = 0; v < vertexCount; v++) {
    bucketStart[v] = acc;
    acc += count[v];
    bucketStart[v + 1] = acc;
  }
  const fill = bucketStart.slice(0, vertexCount);
  const bucketSide = new Uint32Array(sides);
  for (let f = 0; f < sides; f += 3) {
    const a = triangles[f], b = triangles[f + 1], c = triangles[f + 2];
    bucketSide[fill[a < b ? a : b]++] = f;
    bucketSide[fill[b < c ? b : c]++] = f + 1;
    bucketSide[fill[c < a ? c : a]++] = f + 2;
  }
  const sideEdge = new Uint32Array(sides);
  const edgeLo = new Uint32Array(sides);
  const edgeHi = new Uint32Array(sides);
  const edgeFaces = new Uint32Array(sides);
  const vertexEdgeStart = new Uint32Array(vertexCount + 1);
  const stamp = new Int32Array(vertexCount).fill(-1); // stamp[hi] = lo when edge (lo, hi) was seen
  const stampEdge = new Uint32Array(vertexCount);
  let edgeCount = 0;
  for (let v = 0; v < vertexCount; v++) {
    vertexEdgeStart[v] = edgeCount;
    for (let k = bucketStart[v]; k < bucketStart[v + 1]; k++) {
      const h = bucketSide[k];
      const a = triangles[h], b = triangles[h % 3 === 2 ? h - 2 : h + 1];
      const hi = a < b ? b : a;
      let e: number;
      if (stamp[hi] === v) {
        e = stampEdge[hi];
      } else {
        e = edgeCount++;
        stamp[hi] = v;
        stampEdge[hi] = e;
        edgeLo[e] = v;
        edgeHi[e] = hi;
      }
      edgeFaces[e]++;
      sideEdge[h] = e;
    }
  }
  vertexEdgeStart[vertexCount] = edgeCount;
  return {
    edgeCount,
    edgeLo: edgeLo.slice(0, edgeCount),
    edgeHi: edgeHi.slice(0, edgeCount),
    edgeFaces: edgeFaces.slice(0, edgeCount),
    sideEdge,
    vertexEdgeStart,
  };
}

/** Edge id of the undirected edge {a, b}, or −1 when the mesh has no such edge. */
export function findEdge(table: EdgeTable, a: number, b: number): number {
  const lo = a < b ? a : b, hi = a < b ? b : a;
  if (lo + 1 >= table.vertexEdgeStart.length) return -1;
  for (let e = table.vertexEdgeStart[lo]; e < table.vertexEdgeStart[lo + 1]; e++) if (table.edgeHi[e] === hi) return e;
  return -1;
}
