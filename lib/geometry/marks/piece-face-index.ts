/** Working face → (piece, local face) lookup, built once from the cut pieces. */

/**
 * @param pieces     each with `faces` (#F working face ids; local face i = faces[i])
 * @param faceCount  #F of the working mesh
 * @returns          facePiece: piece index per working face (−1 none); faceLocal: local face index (−1 none)
 */
export function pieceFaceIndex(pieces: { faces: Uint32Array }[], faceCount: number): { facePiece: Int32Array; faceLocal: Int32Array } {
  const facePiece = new Int32Array(faceCount).fill(-1);
  const faceLocal = new Int32Array(faceCount).fill(-1);
  pieces.forEach((p, pi) => {
    for (let i = 0; i < p.faces.length; i++) {
      facePiece[p.faces[i]] = pi;
      faceLocal[p.faces[i]] = i;
    }
  });
  return { facePiece, faceLocal };
}
