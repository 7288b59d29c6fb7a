/**
 * A seam the studio proposes; the designer accepts it (it becomes a run, SeamSet.acceptSuggestion) or rejects it
 * (SeamSet.rejectSuggestion). Ids depend only on the proposed chain, so a suggestion keeps its id (and its decision)
 * when the list is recomputed after a slider move or a seam change.
 */
export type SuggestionKind = "ridge" | "valley" | "dart";

export interface SeamSuggestion {
  id: string;
  kind: SuggestionKind;
  /** vertex chain along mesh edges (a dart runs from the piece boundary to its tip) */
  vertices: Uint32Array;
  /** edge ids along the chain */
  edges: Uint32Array;
  /** 3D length, scan units */
  length: number;
  /** length-weighted mean outside dihedral along the chain, degrees (NaN where no edge has one) */
  meanDihedral: number;
  /** one sentence for the designer */
  reason: string;
  /** darts: label of the piece the dart goes into */
  piece?: string;
  /** darts: estimated stretch of that piece without the dart, fraction (see stretch-estimate.ts) */
  estimatedStretch?: number;
}

/** Suggestions not yet accepted or rejected. */
export function pendingSuggestions<T extends { id: string }>(list: readonly T[], decision: (id: string) => string | null): T[] {
  return list.filter((s) => decision(s.id) === null);
}
