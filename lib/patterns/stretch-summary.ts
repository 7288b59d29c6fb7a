/**
 * Stretch summary for the cover: each piece's distortion against the chosen foam's stretch limit.
 */
import type { PieceReport } from "@/lib/geometry/report-types";
import { STRICTEST_STRETCH_LIMIT, findFoamMaterial, type FoamMaterial } from "./materials";

export interface StretchRow {
  label: string;
  maxStretch: number | null;
  p95Stretch: number | null;
  maxCompress: number | null;
  flipped: number;
  /** maxStretch above the limit, or triangles flipped, or not flattenable */
  flagged: boolean;
  note: string;
}

export interface StretchSummary {
  material: FoamMaterial | null;
  /** limit used, fraction */
  limit: number;
  /** how the limit was chosen, one sentence */
  limitNote: string;
  rows: StretchRow[];
  flaggedCount: number;
}

export function summarizeStretch(pieces: PieceReport[], materialText: string): StretchSummary {
  const material = findFoamMaterial(materialText);
  const limit = material ? material.stretchLimit : STRICTEST_STRETCH_LIMIT;
  const limitNote = material
    ? `${material.name}: pieces stretched more than ${(limit * 100).toFixed(0)} % are flagged (shop rule of thumb).`
    : `No stretch limit listed for "${materialText}": the strictest listed limit, ${(limit * 100).toFixed(0)} %, is used.`;
  const rows = pieces.map((p): StretchRow => {
    const m = p.metrics;
    if (!p.flattenable || !m) {
      return { label: p.label, maxStretch: null, p95Stretch: null, maxCompress: null, flipped: 0, flagged: true, note: p.problem ?? "not flattened" };
    }
    const over = m.maxStretch > limit;
    const notes: string[] = [];
    if (over) notes.push(`over ${(limit * 100).toFixed(0)} % limit: add a dart or seam`);
    if (m.flippedTriangles > 0) notes.push(`${m.flippedTriangles} folded triangles`);
    return {
      label: p.label, maxStretch: m.maxStretch, p95Stretch: m.p95Stretch, maxCompress: m.maxCompress,
      flipped: m.flippedTriangles, flagged: over || m.flippedTriangles > 0, note: notes.join("; ") || "ok",
    };
  });
  return { material, limit, limitNote, rows, flaggedCount: rows.filter((r) => r.flagged).length };
}
