/**
 * Connectivity of the scan mesh for the seam studio, built once per mesh (browser main thread or worker).
 *
 * Edge ids are the undirected edges of lib/geometry/analysis/edge-table.ts (one id per vertex pair, also on a
 * non-manifold edge), so a seam set is a flag per edge id. The half-edge structure of
 * lib/geometry/topology/half-edge.ts is kept beside it because live pieces follow cutPieces, which works on it.
 */
import { buildEdgeTable, findEdge, type EdgeTable } from "@/lib/geometry/analysis/edge-table";
import { GeometryError } from "@/lib/geometry/errors";
import { dihedralAngles } from "@/lib/geometry/marks/dihedral-angles";
import type { TriMesh } from "@/lib/geometry/mesh";
import { buildHalfEdges, type HalfEdgeMesh } from "@/lib/geometry/topology/half-edge";

export interface StudioMesh {
  mesh: TriMesh;
  vertexCount: number;
  faceCount: number;
  edgeCount: number;
  /** #E lower / higher vertex of each edge */
  edgeLo: Uint32Array;
  edgeHi: Uint32Array;
  /** #E number of face sides on the edge (1 border, 2 manifold, more non-manifold) */
  edgeFaces: Uint32Array;
  /** #E 3D length, scan units */
  edgeLength: Float64Array;
  /**
   * #E outside dihedral angle, degrees (180 flat, > 180 ridge, < 180 valley; see dihedral-angles.ts); NaN on border,
   * non-manifold, inconsistently oriented or degenerate edges
   */
  dihedral: Float64Array;
  /** #V+1 CSR offsets of vertex → incident edges (both endpoints) */
  vertexEdgeOffsets: Uint32Array;
  /** per CSR entry: the other endpoint */
  vertexNeighbors: Uint32Array;
  /** per CSR entry: the edge id */
  vertexEdges: Uint32Array;
  /** #F×3 edge of the side from corner k to corner (k+1) mod 3 of face f, at 3f+k */
  sideEdge: Uint32Array;
  /** half-edge connectivity of the mesh (edge pairs 2e, 2e+1) */
  halfEdges: HalfEdgeMesh;
  /** half-edge edge id → studio edge id */
  halfEdgeToEdge: Uint32Array;
  /** bounding box of the referenced vertices, scan units: [minX, minY, minZ, maxX, maxY, maxZ] */
  bbox: Float64Array;
  /** bounding-box diagonal, scan units */
  diagonal: number;
  /** 1 per vertex used by at least one face */
  referenced: Uint8Array;
  edgeTable: EdgeTable;
}

/**
 * @param mesh working or viewer mesh: #V×3 positions (scan units), #F×3 triangles, counter-clockwise from outside
 * @throws GeometryError INDEX_OUT_OF_RANGE for a triangle index ≥ #V, NO_FACES for an empty mesh
 */
export function buildStudioMesh(mesh: TriMesh): StudioMesh {
  const { positions: p, triangles: t } = mesh;
  const nv = p.length / 3;
  const nf = t.length / 3;
  if (nf === 0) throw new GeometryError("NO_FACES", "The mesh has no faces.");
  const referenced = new Uint8Array(nv);
  for (let i = 0; i < t.length; i++) {
    const v = t[i];
    if (v >= nv) throw new GeometryError("INDEX_OUT_OF_RANGE", `Triangle ${Math.floor(i / 3)} uses vertex ${v}, but the mesh has ${nv} vertices.`);
    referenced[v] = 1;
  }
  const table = buildEdgeTable(t, nv);
  const ne = table.edgeCount;
  const he = buildHalfEdges(t, nv);
  const halfEdgeToEdge = new Uint32Array(he.edgeCount);
  for (let e = 0; e < he.edgeCount; e++) halfEdgeToEdge[e] = table.sideEdge[he.corner[2 * e]];

  // dihedral: only edges with exactly two consistently oriented faces
  const a = new Uint32Array(ne), b = new Uint32Array(ne);
  const faceAB = new Int32Array(ne).fill(-1), faceBA = new Int32Array(ne).fill(-1);
  for (let e = 0; e < he.edgeCount; e++) {
    const f = he.face[2 * e], g = he.face[2 * e + 1];
    if (f < 0 || g < 0) continue;
    const s = halfEdgeToEdge[e];
    if (table.edgeFaces[s] !== 2) continue;
    a[s] = he.vertex[2 * e]; b[s] = he.vertex[2 * e + 1];
    faceAB[s] = f; faceBA[s] = g;
  }
  const dihedral = dihedralAngles(p, t, a, b, faceAB, faceBA);

  const edgeLength = new Float64Array(ne);
  const offsets = new Uint32Array(nv + 1);
  for (let e = 0; e < ne; e++) {
    const u = table.edgeLo[e], v = table.edgeHi[e];
    const dx = p[3 * v] - p[3 * u], dy = p[3 * v + 1] - p[3 * u + 1], dz = p[3 * v + 2] - p[3 * u + 2];
    edgeLength[e] = Math.sqrt(dx * dx + dy * dy + dz * dz);
    offsets[u + 1]++;
    offsets[v + 1]++;
  }
  for (let v = 0; v < nv; v++) offsets[v + 1] += offsets[v];
  const fill = offsets.slice(0, nv);
  const neighbors = new Uint32Array(2 * ne), edges = new Uint32Array(2 * ne);
  for (let e = 0; e < ne; e++) {
    const u = table.edgeLo[e], v = table.edgeHi[e];
    neighbors[fill[u]] = v; edges[fill[u]++] = e;
    neighbors[fill[v]] = u; edges[fill[v]++] = e;
  }

  const bbox = new Float64Array([Infinity, Infinity, Infinity, -Infinity, -Infinity, -Infinity]);
  for (let v = 0; v < nv; v++) {
    if (!referenced[v]) continue;
    for (let k = 0; k < 3; k++) {
      const x = p[3 * v + k];
      if (x < bbox[k]) bbox[k] = x;
      if (x > bbox[3 + k]) bbox[3 + k] = x;
    }
  }
  const diagonal = Math.hypot(bbox[3] - bbox[0], bbox[4] - bbox[1], bbox[5] - bbox[2]);
  return {
    mesh,
    vertexCount: nv,
    faceCount: nf,
    edgeCount: ne,
    edgeLo: table.edgeLo,
    edgeHi: table.edgeHi,
    edgeFaces: table.edgeFaces,
    edgeLength,
    dihedral,
    vertexEdgeOffsets: offsets,
    vertexNeighbors: neighbors,
    vertexEdges: edges,
    sideEdge: table.sideEdge,
    halfEdges: he,
    halfEdgeToEdge,
    bbox,
    diagonal,
    referenced,
    edgeTable: table,
  };
}

/** Edge id of {a, b}, or −1 when the mesh has no such edge. */
export function edgeBetween(sm: StudioMesh, a: number, b: number): number {
  return findEdge(sm.edgeTable, a, b);
}
