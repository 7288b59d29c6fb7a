/**
 * Outline of a live piece for the viewer (a piece that is not a disk is drawn outlined): the edges where the piece
 * ends, i.e. seam edges and mesh-border edges that touch one of its faces, plus edges whose faces lie in different
 * pieces (non-manifold edges).
 */
import type { LivePieces } from "./live-pieces";
import type { StudioMesh } from "./studio-mesh";

/**
 * @param onSeam #E seam flags the pieces were computed from
 * @returns edge ids, ascending
 */
export function pieceOutlineEdges(sm: StudioMesh, live: LivePieces, onSeam: Uint8Array, piece: number): Uint32Array {
  if (!(piece >= 0 && piece < live.count)) throw new RangeError(`Piece ${piece} does not exist (there are ${live.count}).`);
  const mark = new Uint8Array(sm.edgeCount);
  const s = live.pieceFaceStart[piece], end = live.pieceFaceStart[piece + 1];
  for (let i = s; i < end; i++) {
    const f = live.pieceFaces[i];
    for (let k = 0; k < 3; k++) {
      const e = sm.sideEdge[3 * f + k];
      if (onSeam[e] || sm.edgeFaces[e] !== 2) mark[e] = 1;
    }
  }
  let n = 0;
  for (let e = 0; e < mark.length; e++) n += mark[e];
  const out = new Uint32Array(n);
  for (let e = 0, k = 0; e < mark.length; e++) if (mark[e]) out[k++] = e;
  return out;
}
