/**
 * Live pieces: what the current seams cut the scan into, recomputed on every seam change.
 *
 * Same rules as lib/geometry/topology/cut-pieces.ts, so the studio shows the pieces the flattening job will make:
 * pieces are the connected components of faces across non-seam manifold edges (union–find, the smaller face id is
 * the root), ordered by their smallest face id and labelled A, B, … Z, AA, … (pieceLabel); a vertex splits into
 * one local vertex per class of its corners joined across non-seam edges. Per piece: V (local vertices), E, F,
 * boundary loops b, χ = V − E + F, genus g = (2 − χ − b)/2, disk ⇔ b = 1 and χ = 1 (Source: classification of
 * compact surfaces, as in piece-topology.ts).
 *
 * cutPieces counts E and b on a half-edge structure rebuilt over each piece's local vertices. Here, on a mesh whose
 * edges are all manifold and consistently oriented, the same counts come from the mesh's own half-edges: a local
 * edge is a mesh edge whose two sides joined (a non-seam edge, or a seam edge whose ends were not split, which the
 * rebuilt structure joins again); every other face side is an open side, one boundary edge; boundary loops are the
 * cycles of "next open side", found by turning around the side's start vertex across joined edges. A mesh with
 * non-manifold or inconsistently oriented edges takes the rebuilt structure (exact, slower).
 */
import { buildHalfEdges } from "@/lib/geometry/topology/half-edge";
import { pieceLabel } from "@/lib/geometry/topology/piece-label";
import type { PieceTopology } from "@/lib/geometry/topology/piece-mesh";
import { pieceTopology } from "@/lib/geometry/topology/piece-topology";
import type { StudioMesh } from "./studio-mesh";

export interface LivePieces {
  count: number;
  /** #F piece index of each face */
  facePiece: Int32Array;
  /** #pieces A, B, … */
  labels: string[];
  /** #pieces+1 offsets into pieceFaces */
  pieceFaceStart: Uint32Array;
  /** #F face ids grouped by piece, ascending within a piece */
  pieceFaces: Uint32Array;
  /** #pieces local vertex count V */
  vertices: Uint32Array;
  /** #pieces edge count E of the piece as cut */
  edges: Uint32Array;
  /** #pieces boundary loops b */
  boundaryLoops: Uint32Array;
  /** #pieces χ = V − E + F */
  eulerCharacteristic: Int32Array;
  /** #pieces genus */
  genus: Uint32Array;
  /** #pieces 1 = one boundary loop and χ = 1: can be flattened */
  isDisk: Uint8Array;
  /** #F×3 local vertex class of each corner (dense ids; a class belongs to one piece), for explainPiece */
  cornerClass: Int32Array;
  /** "half-edges": counted on the mesh's own half-edges; "rebuilt": non-manifold mesh, structure rebuilt */
  method: "half-edges" | "rebuilt";
}

function find(parent: Int32Array, x: number): number {
  while (parent[x] !== x) { parent[x] = parent[parent[x]]; x = parent[x]; }
  return x;
}

function union(parent: Int32Array, a: number, b: number): void {
  const ra = find(parent, a), rb = find(parent, b);
  if (ra === rb) return;
  if (ra < rb) parent[rb] = ra; else parent[ra] = rb;
}

export interface LivePiecesComputer {
  /** @param onSeam #E 1 per seam edge id (SeamSet.onSeam) */
  compute(onSeam: Uint8Array): LivePieces;
}

/** Allocates the scratch buffers once per mesh; `compute` then allocates only its outputs. */
export function createLivePiecesComputer(sm: StudioMesh): LivePiecesComputer {
  const he = sm.halfEdges;
  const nf = sm.faceCount;
  const nh = 2 * he.edgeCount;
  const faceParent = new Int32Array(nf);
  const cornerParent = new Int32Array(3 * nf);
  const pieceOfRoot = new Int32Array(nf);
  const classOfRoot = new Int32Array(3 * nf);
  const open = new Uint8Array(nh);
  const seen = new Uint8Array(nh);
  const regular = he.irregularEdges.length === 0;

  const compute = (onSeam: Uint8Array): LivePieces => {
    if (onSeam.length !== sm.edgeCount) throw new RangeError(`Seam flags have ${onSeam.length} entries; the mesh has ${sm.edgeCount} edges.`);
    const { face, corner, next } = he;
    for (let f = 0; f < nf; f++) faceParent[f] = f;
    for (let c = 0; c < 3 * nf; c++) cornerParent[c] = c;
    const h2e = sm.halfEdgeToEdge;
    for (let e = 0; e < he.edgeCount; e++) {
      const h = 2 * e, t = h + 1;
      const f = face[h], g = face[t];
      if (f < 0 || g < 0 || onSeam[h2e[e]]) continue;
      union(faceParent, f, g);
      union(cornerParent, corner[h], corner[next[t]]);
      union(cornerParent, corner[next[h]], corner[t]);
    }
    // pieces in order of smallest face id, local vertex classes numbered densely
    pieceOfRoot.fill(-1);
    classOfRoot.fill(-1);
    const facePiece = new Int32Array(nf);
    const cornerClass = new Int32Array(3 * nf);
    let count = 0, classes = 0;
    const perPieceFaces: number[] = [];
    const perPieceVerts: number[] = [];
    for (let f = 0; f < nf; f++) {
      const r = find(faceParent, f);
      let p = pieceOfRoot[r];
      if (p < 0) { p = pieceOfRoot[r] = count++; perPieceFaces.push(0); perPieceVerts.push(0); }
      facePiece[f] = p;
      perPieceFaces[p]++;
      for (let k = 0; k < 3; k++) {
        const c = find(cornerParent, 3 * f + k);
        let id = classOfRoot[c];
        if (id < 0) { id = classOfRoot[c] = classes++; perPieceVerts[p]++; }
        cornerClass[3 * f + k] = id;
      }
    }
    const edges = new Uint32Array(count);
    const loops = new Uint32Array(count);
    let method: LivePieces["method"];
    if (regular) {
      method = "half-edges";
      open.fill(0);
      for (let e = 0; e < he.edgeCount; e++) {
        const h = 2 * e, t = h + 1;
        const f = face[h], g = face[t];
        if (g < 0) { open[h] = 1; edges[facePiece[f]]++; continue; }
        if (onSeam[h2e[e]]) {
          const joined = cornerClass[corner[h]] === cornerClass[corner[next[t]]] && cornerClass[corner[next[h]]] === cornerClass[corner[t]];
          if (!joined) { open[h] = 1; open[t] = 1; edges[facePiece[f]]++; edges[facePiece[g]]++; continue; }
        }
        edges[facePiece[f]]++;
      }
      seen.fill(0);
      for (let h = 0; h < nh; h++) {
        if (!open[h] || seen[h]) continue;
        loops[facePiece[face[h]]]++;
        let s = h, guard = 0;
        while (!seen[s] && guard++ <= nh) {
          seen[s] = 1;
          // next open side: the side entering s's start vertex, turning across joined sides
          let q = next[next[s]], turn = 0;
          while (!open[q] && turn++ <= nh) q = next[next[q ^ 1]];
          s = q;
        }
      }
    } else {
      method = "rebuilt";
      const local = buildHalfEdges(new Uint32Array(cornerClass.buffer.slice(0)), classes);
      for (let e = 0; e < local.edgeCount; e++) edges[facePiece[local.face[2 * e]]]++;
      const lh = 2 * local.edgeCount;
      const lseen = new Uint8Array(lh);
      for (let h = 0; h < lh; h++) {
        if (local.face[h] !== -1 || lseen[h]) continue;
        loops[facePiece[local.face[h ^ 1]]]++;
        let g = h, guard = 0;
        while (!lseen[g] && guard++ <= lh) { lseen[g] = 1; g = local.next[g]; }
      }
    }
    const pieceFaceStart = new Uint32Array(count + 1);
    for (let p = 0; p < count; p++) pieceFaceStart[p + 1] = pieceFaceStart[p] + perPieceFaces[p];
    const fill = pieceFaceStart.slice(0, count);
    const pieceFaces = new Uint32Array(nf);
    for (let f = 0; f < nf; f++) pieceFaces[fill[facePiece[f]]++] = f;
    const vertices = Uint32Array.from(perPieceVerts);
    const chi = new Int32Array(count), genus = new Uint32Array(count), isDisk = new Uint8Array(count);
    const labels: string[] = new Array(count);
    for (let p = 0; p < count; p++) {
      chi[p] = vertices[p] - edges[p] + perPieceFaces[p];
      genus[p] = Math.max(0, Math.round((2 - chi[p] - loops[p]) / 2));
      isDisk[p] = loops[p] === 1 && chi[p] === 1 ? 1 : 0;
      labels[p] = pieceLabel(p);
    }
    return { count, facePiece, labels, pieceFaceStart, pieceFaces, vertices, edges, boundaryLoops: loops, eulerCharacteristic: chi, genus, isDisk, cornerClass, method };
  };
  return { compute };
}

/** One-off recomputation (tests, scripts); the studio keeps one computer per mesh. */
export function computeLivePieces(sm: StudioMesh, onSeam: Uint8Array): LivePieces {
  return createLivePiecesComputer(sm).compute(onSeam);
}

/**
 * The local mesh of one piece, numbered as cutPieces numbers it (faces ascending, local vertices in order of first
 * use), and its topology with the problem sentence and suggested cut of piece-topology.ts. Costs a half-edge build
 * and, for a non-disk, shortest-path searches over the piece: call it for the pieces the designer looks at, or
 * in the worker after the counts went out.
 */
export function explainPiece(sm: StudioMesh, live: LivePieces, piece: number): PieceTopology {
  if (!(piece >= 0 && piece < live.count)) throw new RangeError(`Piece ${piece} does not exist (there are ${live.count}).`);
  const s = live.pieceFaceStart[piece], n = live.pieceFaceStart[piece + 1] - s;
  const tris = new Uint32Array(3 * n);
  const localOf = new Map<number, number>();
  const ids: number[] = [];
  const t = sm.mesh.triangles;
  for (let i = 0; i < n; i++) {
    const f = live.pieceFaces[s + i];
    for (let k = 0; k < 3; k++) {
      const c = live.cornerClass[3 * f + k];
      let l = localOf.get(c);
      if (l === undefined) { l = ids.length; localOf.set(c, l); ids.push(t[3 * f + k]); }
      tris[3 * i + k] = l;
    }
  }
  const vertexIds = Uint32Array.from(ids);
  const positions = new Float64Array(3 * ids.length);
  const p = sm.mesh.positions;
  for (let v = 0; v < ids.length; v++) {
    positions[3 * v] = p[3 * ids[v]]; positions[3 * v + 1] = p[3 * ids[v] + 1]; positions[3 * v + 2] = p[3 * ids[v] + 2];
  }
  return pieceTopology(positions, tris, vertexIds);
}
