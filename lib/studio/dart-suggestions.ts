/**
 * Suggested darts: for each disk piece whose estimated stretch (stretch-estimate.ts) is above the chosen material's
 * limit, a seam from the piece boundary to the point of highest accumulated curvature along the shortest edge path.
 * A dart is the trade's way to take up the excess of a domed piece: the foam closes over the cut when glued.
 * Pieces that are not disks get their topology problem first (live pieces / explainPiece), not a dart.
 */
import { FOAM_MATERIALS, STRICTEST_STRETCH_LIMIT } from "@/lib/patterns/materials";
import type { PieceStretchEstimate } from "./stretch-estimate";
import type { SeamSuggestion } from "./suggestion";
import { edgeBetween, type StudioMesh } from "./studio-mesh";

/** The stretch limit of a material id from FOAM_MATERIALS (the strictest one when unknown), fraction. */
export function stretchLimitOf(materialId: string): number {
  return FOAM_MATERIALS.find((m) => m.id === materialId)?.stretchLimit ?? STRICTEST_STRETCH_LIMIT;
}

/**
 * @param estimates  from StretchEstimator.estimate
 * @param stretchLimit  fraction, e.g. stretchLimitOf("eva") = 0.05
 * @returns one dart per piece over the limit, worst piece first
 */
export function suggestDarts(sm: StudioMesh, estimates: readonly PieceStretchEstimate[], stretchLimit: number): SeamSuggestion[] {
  if (!(stretchLimit > 0)) throw new RangeError(`The stretch limit must be a positive fraction (got ${stretchLimit}).`);
  const out: SeamSuggestion[] = [];
  for (const est of estimates) {
    if (!est.isDisk || !(est.estimatedStretch > stretchLimit) || est.dartPath.length < 2) continue;
    const vs = est.dartPath;
    const edges = new Uint32Array(vs.length - 1);
    let length = 0, weighted = 0, withAngle = 0;
    for (let i = 0; i + 1 < vs.length; i++) {
      const e = edgeBetween(sm, vs[i], vs[i + 1]);
      edges[i] = e;
      length += sm.edgeLength[e];
      if (!Number.isNaN(sm.dihedral[e])) { weighted += sm.edgeLength[e] * sm.dihedral[e]; withAngle += sm.edgeLength[e]; }
    }
    const pct = (x: number) => `${(100 * x).toFixed(x < 0.1 ? 1 : 0)} %`;
    out.push({
      id: `dart:${vs[0]}-${vs[vs.length - 1]}`,
      kind: "dart",
      vertices: vs,
      edges,
      length,
      meanDihedral: withAngle > 0 ? weighted / withAngle : NaN,
      piece: est.label,
      estimatedStretch: est.estimatedStretch,
      reason: `Piece ${est.label} is curved enough to stretch about ${pct(est.estimatedStretch)} (the material allows ${pct(stretchLimit)}); a dart from its edge to vertex ${vs[vs.length - 1]} lets it lie flat.`,
    });
  }
  out.sort((a, b) => (b.estimatedStretch ?? 0) - (a.estimatedStretch ?? 0));
  return out;
}
