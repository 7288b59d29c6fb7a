/**
 * Paper sizes for pattern documents, in PDF points.
 *
 * Source: ISO 32000-1:2008 §8.3.2.3 — one unit of default user space is 1/72 inch.
 * Source: ISO 216 — A4 = 210 × 297 mm, A3 = 297 × 420 mm.
 * Source: ANSI/ASME Y14.1 — Letter (A) = 8.5 × 11 in, Tabloid (B) = 11 × 17 in.
 * Source: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
 */

export const PT_PER_IN = 72;
export const MM_PER_IN = 25.4;
/** PDF points per millimetre (72 / 25.4 ≈ 2.834646). */
export const PT_PER_MM = PT_PER_IN / MM_PER_IN;

/** Paper the pattern can be printed on. `full` = one page as large as the layout (plotter or projector). */
export type PaperId = "letter" | "a4" | "a3" | "tabloid" | "full";

export const PAPER_IDS: readonly PaperId[] = ["letter", "a4", "a3", "tabloid", "full"] as const;

export interface PaperSize {
  id: Exclude<PaperId, "full">;
  name: string;
  /** portrait width and height, PDF points */
  widthPt: number;
  heightPt: number;
}

export const PAPER_SIZES: Readonly<Record<Exclude<PaperId, "full">, PaperSize>> = {
  letter: { id: "letter", name: "Letter (8.5 x 11 in)", widthPt: 8.5 * PT_PER_IN, heightPt: 11 * PT_PER_IN },
  a4: { id: "a4", name: "A4 (210 x 297 mm)", widthPt: 210 * PT_PER_MM, heightPt: 297 * PT_PER_MM },
  a3: { id: "a3", name: "A3 (297 x 420 mm)", widthPt: 297 * PT_PER_MM, heightPt: 420 * PT_PER_MM },
  tabloid: { id: "tabloid", name: "Tabloid (11 x 17 in)", widthPt: 11 * PT_PER_IN, heightPt: 17 * PT_PER_IN },
};

/** Millimetres → PDF points. */
export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}

/** PDF points → millimetres. */
export function ptToMm(pt: number): number {
  return pt / PT_PER_MM;
}
