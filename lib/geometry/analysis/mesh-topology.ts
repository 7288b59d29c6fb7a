/**
 * Topological counts of a triangle mesh: components, boundary loops, non-manifold edges, Euler characteristic.
 *
 * χ = V − E + F over referenced vertices. Source: Euler's polyhedron formula, χ = V − E + F, = 2 − 2g − b for a
 * connected orientable surface of genus g with b boundary loops (e.g. M. Botsch et al., "Polygon Mesh Processing",
 * AK Peters 2010, §1.3).
 */
import { buildEdgeTable, type EdgeTable } from "./edge-table";

export interface MeshTopology {
  /** vertices used by at least one face */
  referencedVertices: number;
  edges: number;
  faces: number;
  /** connected components (faces that share a vertex are connected) */
  components: number;
  /** edges on exactly one face */
  boundaryEdges: number;
  /**
   * closed boundary loops: the cycle rank E_b − V_b + C_b of the graph of boundary edges (C_b its connected
   * components). Equals the number of holes on a manifold mesh and still counts two holes touching at one vertex as two.
   */
  boundaryLoops: number;
  /** edges on more than two faces */
  nonManifoldEdges: number;
  eulerCharacteristic: number;
  edgeTable: EdgeTable;
}

/**
 * @param triangles    #F×3 vertex indices
 * @param vertexCount  size of the vertex index space
 */
export function meshTopology(triangles: Uint32Array, vertexCount: number): MeshTopology {
  const faces = triangles.length / 3;
  const edgeTable = buildEdgeTable(triangles, vertexCount);
  const used = new Uint8Array(vertexCount);
  let referencedVertices = 0;
  for (let k = 0; k < triangles.length; k++) {
    const v = triangles[k];
    if (used[v] === 0) {
      used[v] = 1;
      referencedVertices++;
    }
  }

  const parent = new Int32Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) parent[v] = v;
  const find = (v: number): number => {
    while (parent[v] !== v) {
      parent[v] = parent[parent[v]];
      v = parent[v];
    }
    return v;
  };
  let components = referencedVertices;
  for (let f = 0; f < faces; f++) {
    const a = find(triangles[3 * f]);
    const b = find(triangles[3 * f + 1]);
    if (a !== b) {
      parent[a < b ? b : a] = a < b ? a : b;
      components--;
    }
    const c = find(triangles[3 * f + 2]);
    const r = find(a);
    if (r !== c) {
      parent[r < c ? c : r] = r < c ? r : c;
      components--;
    }
  }

  // Boundary graph: its own union-find over boundary vertices.
  let boundaryEdges = 0;
  let nonManifoldEdges = 0;
  for (let v = 0; v < vertexCount; v++) parent[v] = v;
  const onBoundary = new Uint8Array(vertexCount);
  let boundaryVertices = 0;
  let boundaryComponents = 0;
  for (let e = 0; e < edgeTable.edgeCount; e++) {
    const k = edgeTable.edgeFaces[e];
    if (k > 2) nonManifoldEdges++;
    if (k !== 1) continue;
    boundaryEdges++;
    const lo = edgeTable.edgeLo[e], hi = edgeTable.edgeHi[e];
    if (onBoundary[lo] === 0) { onBoundary[lo] = 1; boundaryVertices++; boundaryComponents++; }
    if (onBoundary[hi] === 0) { onBoundary[hi] = 1; boundaryVertices++; boundaryComponents++; }
    const a = find(lo), b = find(hi);
    if (a !== b) {
      parent[a < b ? b : a] = a < b ? a : b;
      boundaryComponents--;
    }
  }
  const boundaryLoops = boundaryEdges - boundaryVertices + boundaryComponents;

  return {
    referencedVertices,
    edges: edgeTable.edgeCount,
    faces,
    components,
    boundaryEdges,
    boundaryLoops,
    nonManifoldEdges,
    eulerCharacteristic: referencedVertices - edgeTable.edgeCount + faces,
    edgeTable,
  };
}
