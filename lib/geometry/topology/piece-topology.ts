import { boundaryLoops, buildHalfEdges } from "./half-edge";
import type { PieceTopology } from "./piece-mesh";
import { suggestCut } from "./suggest-cut";

/**
 * Topology of one connected piece: boundary loops, Euler characteristic χ = V − E + F, genus
 * g = (2 − χ − b)/2 (orientable surface with b boundary loops; Source: classification of compact surfaces, e.g.
 * Massey, "A Basic Course in Algebraic Topology", ch. 1), and for a non-disk piece a sentence and a suggested cut.
 *
 * @param positions #V×3 local positions
 * @param triangles #F×3 local indices (every local vertex referenced)
 * @param vertexIds #V local → working vertex ids (used in sentences and in the suggested cut)
 */
export function pieceTopology(positions: Float64Array, triangles: Uint32Array, vertexIds: Uint32Array): PieceTopology {
  const nv = positions.length / 3;
  const he = buildHalfEdges(triangles, nv);
  const loops = boundaryLoops(he);
  const chi = nv - he.edgeCount + he.faceCount;
  const b = loops.length;
  const genus = Math.max(0, Math.round((2 - chi - b) / 2));
  const isDisk = b === 1 && chi === 1;
  if (isDisk) return { isDisk, boundaryLoops: b, eulerCharacteristic: chi, genus, problem: null, suggestedCut: null };
  const s = suggestCut(he, positions, loops, genus, vertexIds);
  return { isDisk, boundaryLoops: b, eulerCharacteristic: chi, genus, problem: s.problem, suggestedCut: s.cut };
}
