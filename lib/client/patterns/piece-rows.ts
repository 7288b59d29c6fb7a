import type { PipelinePieceReport } from "@/lib/geometry/pipeline/flatten-mesh";

/** One row of the pieces table: the numbers a reviewer compares, and short flags in plain words. */
export interface PieceRow {
  label: string;
  /** laid-out area, pattern units² */
  area: number;
  /** fractions; null when the piece was not flattened */
  maxStretch: number | null;
  p95Stretch: number | null;
  /** area-weighted mean of s1/s2 − 1 (0 = angles kept exactly) */
  conformalError: number | null;
  bevelRuns: number;
  /** runs that need an angled cut (not square) */
  angledRuns: number;
  flags: string[];
  overLimit: boolean;
}

/** Builds the table rows from the report's pieces and the foam's stretch limit (fraction). */
export function pieceRows(pieces: readonly PipelinePieceReport[], limit: number): PieceRow[] {
  return pieces.map((p) => {
    const m = p.metrics;
    const flags: string[] = [];
    const overLimit = m !== null && m.maxStretch > limit;
    if (!p.flattenable) flags.push(p.problem ? `not flat: ${p.problem}` : "not flattened");
    if (overLimit) flags.push("over foam limit");
    if (m && m.flippedTriangles > 0) flags.push(`${m.flippedTriangles} folded triangle${m.flippedTriangles === 1 ? "" : "s"}`);
    if (p.solver.lscm && !p.solver.lscm.converged) flags.push("conformal solve did not converge");
    if (p.solver.refine && !p.solver.refine.converged) flags.push("refinement did not converge");
    if (p.mirrorOf) flags.push(`mirror of ${p.mirrorOf}`);
    else if (p.mirrored) flags.push("cut one mirrored");
    if (p.count > 1) flags.push(`cut ${p.count}`);
    return {
      label: p.label,
      area: p.area2d,
      maxStretch: m ? m.maxStretch : null,
      p95Stretch: m ? m.p95Stretch : null,
      conformalError: m ? m.meanConformal - 1 : null,
      bevelRuns: p.bevels.length,
      angledRuns: p.bevels.filter((b) => b.kind !== "straight").length,
      flags,
      overLimit,
    };
  });
}
