import type { HalfEdgeMesh } from "./half-edge";

/** Vertex → neighbours in CSR form, with the edge id of each neighbour link. */
export interface VertexAdjacency {
  /** #V+1 row offsets */
  offsets: Uint32Array;
  /** neighbour vertex per link */
  neighbors: Uint32Array;
  /** edge id (half-edges 2e, 2e+1) per link */
  edges: Uint32Array;
}

/** Builds the vertex adjacency of a half-edge mesh in O(#V + #E). */
export function vertexAdjacency(he: HalfEdgeMesh): VertexAdjacency {
  const nv = he.vertexCount;
  const ne = he.edgeCount;
  const offsets = new Uint32Array(nv + 1);
  for (let e = 0; e < ne; e++) {
    offsets[he.vertex[2 * e] + 1]++;
    offsets[he.vertex[2 * e + 1] + 1]++;
  }
  for (let v = 0; v < nv; v++) offsets[v + 1] += offsets[v];
  const fill = offsets.slice(0, nv);
  const neighbors = new Uint32Array(2 * ne);
  const edges = new Uint32Array(2 * ne);
  for (let e = 0; e < ne; e++) {
    const a = he.vertex[2 * e], b = he.vertex[2 * e + 1];
    neighbors[fill[a]] = b; edges[fill[a]++] = e;
    neighbors[fill[b]] = a; edges[fill[b]++] = e;
  }
  return { offsets, neighbors, edges };
}
