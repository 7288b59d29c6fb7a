/**
 * One piece of a cut mesh: the faces between seams, with its own vertex numbering (a vertex of the working mesh
 * that a seam separates within the piece appears once per side).
 */
export interface PieceTopology {
  /** one boundary loop and Euler characteristic 1: can be flattened */
  isDisk: boolean;
  boundaryLoops: number;
  /** χ = V − E + F of the piece as cut */
  eulerCharacteristic: number;
  /** (2 − χ − boundaryLoops) / 2 */
  genus: number;
  /** one sentence telling the designer what to do, null for a disk */
  problem: string | null;
  /** seam edges (working vertex id pairs) that would make the piece a disk, null when none is suggested */
  suggestedCut: [number, number][] | null;
}

export interface PieceMesh {
  /** A, B, … Z, AA, AB, … in the order of each piece's smallest working face id */
  label: string;
  /** #F working face ids, ascending; local face i is working face faces[i] */
  faces: Uint32Array;
  /** #V local → working vertex id (a split vertex appears more than once) */
  vertexIds: Uint32Array;
  /** #V×3 local vertex positions, same units as the working mesh */
  positions: Float64Array;
  /** #F×3 local vertex indices, same orientation as the working mesh */
  triangles: Uint32Array;
  topology: PieceTopology;
}
