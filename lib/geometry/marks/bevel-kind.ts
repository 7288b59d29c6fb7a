/**
 * Bevel per side of a seam from its outside dihedral angle, and how to read it at the bench.
 *
 * Two pieces meeting at an outside dihedral δ each get a bevel of (180° − δ)/2, half the turn of the surface, as a
 * mitre joint splits its corner angle in two. Source: mitre angle = half the corner angle (e.g. a 90° picture-frame
 * corner is cut at 45° on each piece; any joinery reference on mitre joints).
 */

/** Below this bevel (degrees per side) a seam is cut square. // Common practice: foam closes a gap of a few degrees
 * under contact cement, so bevels under about 5° are not worth cutting. */
export const STRAIGHT_BEVEL_DEG = 5;

export type BevelKind = "ridge" | "valley" | "straight";

/** (180 − δ)/2, degrees; negative on a ridge (δ > 180), positive in a valley. */
export function bevelFromDihedral(dihedralDeg: number): number {
  return (180 - dihedralDeg) / 2;
}

/**
 * ridge: convex outside (δ > 180°); valley: concave (δ < 180°); straight: |bevel| < STRAIGHT_BEVEL_DEG.
 * opensTo is the foam face on which the bevel removes the widest strip: on a ridge the pieces touch along their outer
 * faces and the inner face is trimmed back (inner); in a valley the other way round (outer).
 */
export function classifyBevel(dihedralDeg: number, threshold = STRAIGHT_BEVEL_DEG): { kind: BevelKind; opensTo: "outer" | "inner" | "none" } {
  const bevel = bevelFromDihedral(dihedralDeg);
  if (!(Math.abs(bevel) >= threshold)) return { kind: "straight", opensTo: "none" };
  return bevel < 0 ? { kind: "ridge", opensTo: "inner" } : { kind: "valley", opensTo: "outer" };
}
