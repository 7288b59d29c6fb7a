/**
 * The cut list: per piece how many to cut, the area of one, and the knife length for all of them
 * (outline perimeter × count), from the true-size layout.
 */
import type { PatternLayout } from "./layout";

export interface CutListRow {
  label: string;
  count: number;
  mirrored: boolean;
  /** area of one piece, mm² */
  areaMm2: number;
  /** outline perimeter of one piece, mm */
  perimeterMm: number;
  /** perimeter × count, mm */
  cutLengthMm: number;
}

export interface CutList {
  rows: CutListRow[];
  totalPieces: number;
  /** foam area of all pieces (areas × counts, no nesting waste), mm² */
  totalAreaMm2: number;
  totalCutLengthMm: number;
}

export function buildCutList(layout: PatternLayout): CutList {
  const rows = layout.pieces.map((p) => ({
    label: p.label,
    count: p.report.count,
    mirrored: p.report.mirrored,
    areaMm2: p.areaMm2,
    perimeterMm: p.perimeterMm,
    cutLengthMm: p.perimeterMm * p.report.count,
  }));
  return {
    rows,
    totalPieces: rows.reduce((s, r) => s + r.count, 0),
    totalAreaMm2: rows.reduce((s, r) => s + r.areaMm2 * r.count, 0),
    totalCutLengthMm: rows.reduce((s, r) => s + r.cutLengthMm, 0),
  };
}
