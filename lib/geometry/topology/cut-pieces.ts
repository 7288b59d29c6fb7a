import { GeometryError } from "../errors";
import type { TriMesh } from "../mesh";
import { buildHalfEdges } from "./half-edge";
import { pieceLabel } from "./piece-label";
import type { PieceMesh } from "./piece-mesh";
import { pieceTopology } from "./piece-topology";

function find(parent: Int32Array, x: number): number {
  while (parent[x] !== x) { parent[x] = parent[parent[x]]; x = parent[x]; }
  return x;
}

function union(parent: Int32Array, a: number, b: number): void {
  const ra = find(parent, a), rb = find(parent, b);
  if (ra === rb) return;
  if (ra < rb) parent[rb] = ra; else parent[ra] = rb;
}

/**
 * Cuts a mesh into pieces along seam edges.
 *
 * Pieces are the connected components of faces across non-seam edges. Within a piece, the corners around a
 * vertex are joined across non-seam edges; each class of corners becomes one local vertex, so a vertex is split
 * wherever a seam separates its faces (a slit that ends inside a piece opens into boundary; a bow-tie vertex gets
 * one copy per fan). Non-manifold edges (see buildHalfEdges) act as seams for their extra faces.
 * Pieces are ordered by their smallest working face id and labelled A, B, … Z, AA, AB, …; local vertices are
 * numbered in order of first use by the piece's faces (ascending working face id, corners in order).
 *
 * @param mesh working mesh (#V×3 positions, #F×3 triangles)
 * @param seamEdges 2 per seam edge, working vertex ids (order within a pair does not matter; pairs that are not
 *   mesh edges are ignored here — resolveSeams rejects them earlier)
 */
export function cutPieces(mesh: TriMesh, seamEdges: Uint32Array): PieceMesh[] {
  const nv = mesh.positions.length / 3;
  const nf = mesh.triangles.length / 3;
  if (seamEdges.length % 2 !== 0) throw new GeometryError("BAD_SEAMS", "Seam edges must come in vertex pairs.");
  for (let i = 0; i < mesh.triangles.length; i++) {
    if (mesh.triangles[i] >= nv) {
      throw new GeometryError("INDEX_OUT_OF_RANGE", `Triangle ${Math.floor(i / 3)} uses vertex ${mesh.triangles[i]}, but the mesh has ${nv} vertices.`);
    }
  }
  const he = buildHalfEdges(mesh.triangles, nv);
  const seamKeys = new Set<number>();
  for (let i = 0; i < seamEdges.length; i += 2) {
    const a = seamEdges[i], b = seamEdges[i + 1];
    seamKeys.add(a < b ? a * nv + b : b * nv + a);
  }
  const faceParent = new Int32Array(nf);
  for (let f = 0; f < nf; f++) faceParent[f] = f;
  const cornerParent = new Int32Array(3 * nf);
  for (let c = 0; c < 3 * nf; c++) cornerParent[c] = c;
  for (let e = 0; e < he.edgeCount; e++) {
    const h = 2 * e, t = h + 1;
    const f = he.face[h], g = he.face[t];
    if (f < 0 || g < 0) continue;
    const a = he.vertex[h], b = he.vertex[t];
    if (seamKeys.size > 0 && seamKeys.has(a < b ? a * nv + b : b * nv + a)) continue;
    union(faceParent, f, g);
    union(cornerParent, he.corner[h], he.corner[he.next[t]]);
    union(cornerParent, he.corner[he.next[h]], he.corner[t]);
  }
  // pieces in order of smallest face id (union keeps the smaller root, so the root is the smallest face)
  const pieceOfFace = new Int32Array(nf);
  const pieceOfRoot = new Int32Array(nf).fill(-1);
  const faceCounts: number[] = [];
  for (let f = 0; f < nf; f++) {
    const r = find(faceParent, f);
    if (pieceOfRoot[r] < 0) { pieceOfRoot[r] = faceCounts.length; faceCounts.push(0); }
    pieceOfFace[f] = pieceOfRoot[r];
    faceCounts[pieceOfFace[f]]++;
  }
  const np = faceCounts.length;
  const faces = faceCounts.map((n) => new Uint32Array(n));
  const tris = faceCounts.map((n) => new Uint32Array(3 * n));
  const vids = faceCounts.map((n) => new Uint32Array(3 * n));
  const fill = new Int32Array(np);
  const vcount = new Int32Array(np);
  const localOfCorner = new Int32Array(3 * nf).fill(-1);
  for (let f = 0; f < nf; f++) {
    const p = pieceOfFace[f];
    const i = fill[p]++;
    faces[p][i] = f;
    for (let k = 0; k < 3; k++) {
      const r = find(cornerParent, 3 * f + k);
      if (localOfCorner[r] < 0) {
        localOfCorner[r] = vcount[p];
        vids[p][vcount[p]++] = mesh.triangles[3 * f + k];
      }
      tris[p][3 * i + k] = localOfCorner[r];
    }
  }
  const pieces: PieceMesh[] = [];
  for (let p = 0; p < np; p++) {
    const vertexIds = vids[p].slice(0, vcount[p]);
    const positions = new Float64Array(3 * vertexIds.length);
    for (let v = 0; v < vertexIds.length; v++) {
      const w = vertexIds[v];
      positions[3 * v] = mesh.positions[3 * w];
      positions[3 * v + 1] = mesh.positions[3 * w + 1];
      positions[3 * v + 2] = mesh.positions[3 * w + 2];
    }
    pieces.push({
      label: pieceLabel(p),
      faces: faces[p],
      vertexIds,
      positions,
      triangles: tris[p],
      topology: pieceTopology(positions, tris[p], vertexIds),
    });
  }
  return pieces;
}
