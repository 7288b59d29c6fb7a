/**
 * Splits the pattern sheet into printer pages. Each page has a drawing window ("content") and, at the bottom, the
 * key strip (test squares, tile name, mini map, safety line). Neighbouring windows share a band of `overlapMm`
 * so tiles can be overlapped and taped with the alignment crosses printed in that band.
 *
 * Page coordinates are PDF points, origin top-left (pdfkit's convention). Layout coordinates are millimetres, y up.
 */
import { GeometryError } from "@/lib/geometry/errors";
import { PAPER_SIZES, PT_PER_MM, mmToPt, type PaperId } from "./paper-sizes";

/** Page margin: 0.25 in, more than the unprintable border of common office printers. // Common practice */
export const PAGE_MARGIN_PT = 18;
/** Height of the key strip: the 5 cm test square plus room around it. */
export const KEY_STRIP_PT = mmToPt(56);
/** Gap between the drawing window and the key strip. */
export const KEY_GAP_PT = mmToPt(3);
/** Largest page side a PDF reader must support: 14 400 units (200 in). Source: ISO 32000-1:2008 Annex C.2. */
export const MAX_PAGE_SIDE_PT = 14400;
/** Narrowest `full` page, so the key strip fits, millimetres. */
export const FULL_MIN_WIDTH_MM = 190;

export interface Tile {
  /** 1-based row (top to bottom) and column (left to right) */
  row: number;
  col: number;
  /** "R1-C2" */
  name: string;
  /** layout window: left edge and top edge, mm */
  x0: number;
  yTop: number;
  /** no piece reaches into the window: the tile is not printed (the page map shows it as blank) */
  blank: boolean;
}

export interface TilePlan {
  paper: PaperId;
  orientation: "portrait" | "landscape";
  widthPt: number;
  heightPt: number;
  /** drawing window on the page, points (top-left origin) */
  contentXPt: number;
  contentYPt: number;
  contentWPt: number;
  contentHPt: number;
  /** the same window in mm */
  contentWMm: number;
  contentHMm: number;
  overlapMm: number;
  /** distance between neighbouring windows, mm (= content − overlap) */
  stepXMm: number;
  stepYMm: number;
  rows: number;
  cols: number;
  tiles: Tile[];
}

export function tileName(row: number, col: number): string {
  return `R${row}-C${col}`;
}

function countAlong(lengthMm: number, contentMm: number, overlapMm: number): number {
  if (lengthMm <= contentMm) return 1;
  return Math.ceil((lengthMm - overlapMm) / (contentMm - overlapMm));
}

/**
 * Plans the tiles of a sheet `widthMm × heightMm` whose top-left corner is (left, top) in layout mm.
 * Picks portrait or landscape, whichever needs fewer pages (portrait on a tie), unless `only` fixes it.
 */
export function planTiles(
  sheet: { left: number; top: number; widthMm: number; heightMm: number },
  paper: PaperId,
  overlapMm: number,
  only?: "portrait" | "landscape",
): TilePlan {
  const m = PAGE_MARGIN_PT;
  const reserved = 2 * m + KEY_STRIP_PT + KEY_GAP_PT;
  type Candidate = Omit<TilePlan, "tiles">;
  let best: Candidate | null = null;
  if (paper === "full") {
    const widthPt = Math.max(sheet.widthMm, FULL_MIN_WIDTH_MM) * PT_PER_MM + 2 * m;
    const heightPt = sheet.heightMm * PT_PER_MM + reserved;
    if (widthPt > MAX_PAGE_SIDE_PT || heightPt > MAX_PAGE_SIDE_PT) {
      throw new GeometryError(
        "BAD_PARAMETER",
        `The sheet is ${sheet.widthMm.toFixed(0)} x ${sheet.heightMm.toFixed(0)} mm; one PDF page can be at most 5080 mm (200 in) a side with its margins: choose a tiled paper size.`,
      );
    }
    best = {
      paper, orientation: widthPt > heightPt ? "landscape" : "portrait", widthPt, heightPt,
      contentXPt: m, contentYPt: m, contentWPt: sheet.widthMm * PT_PER_MM, contentHPt: sheet.heightMm * PT_PER_MM,
      contentWMm: sheet.widthMm, contentHMm: sheet.heightMm, overlapMm: 0,
      stepXMm: sheet.widthMm, stepYMm: sheet.heightMm, rows: 1, cols: 1,
    };
  } else {
    const size = PAPER_SIZES[paper];
    for (const orientation of only ? [only] : (["portrait", "landscape"] as const)) {
      const widthPt = orientation === "portrait" ? size.widthPt : size.heightPt;
      const heightPt = orientation === "portrait" ? size.heightPt : size.widthPt;
      const contentWPt = widthPt - 2 * m;
      const contentHPt = heightPt - reserved;
      const contentWMm = contentWPt / PT_PER_MM, contentHMm = contentHPt / PT_PER_MM;
      if (overlapMm * 2 >= Math.min(contentWMm, contentHMm)) {
        throw new GeometryError("BAD_PARAMETER", `overlap ${overlapMm} mm is too large for ${size.name}`);
      }
      const cols = countAlong(sheet.widthMm, contentWMm, overlapMm);
      const rows = countAlong(sheet.heightMm, contentHMm, overlapMm);
      const cand: Candidate = {
        paper, orientation, widthPt, heightPt, contentXPt: m, contentYPt: m, contentWPt, contentHPt,
        contentWMm, contentHMm, overlapMm, stepXMm: contentWMm - overlapMm, stepYMm: contentHMm - overlapMm, rows, cols,
      };
      if (!best || rows * cols < best.rows * best.cols) best = cand;
    }
  }
  const plan = best as Candidate;
  const tiles: Tile[] = [];
  for (let r = 1; r <= plan.rows; r++) {
    for (let c = 1; c <= plan.cols; c++) {
      tiles.push({ row: r, col: c, name: tileName(r, c), x0: sheet.left + (c - 1) * plan.stepXMm, yTop: sheet.top - (r - 1) * plan.stepYMm, blank: false });
    }
  }
  return { ...plan, tiles };
}

/** The tile's window as a layout box, mm. */
export function tileWindow(plan: TilePlan, t: Tile): { minX: number; minY: number; maxX: number; maxY: number } {
  return { minX: t.x0, maxX: t.x0 + plan.contentWMm, maxY: t.yTop, minY: t.yTop - plan.contentHMm };
}

/**
 * Marks tiles whose window no piece reaches into as blank, so they are not printed. `meets(box)` tells whether
 * any piece overlaps a window box.
 */
export function markBlankTiles(plan: TilePlan, meets: (box: ReturnType<typeof tileWindow>) => boolean): TilePlan {
  if (plan.tiles.length === 1) return plan;
  const tiles = plan.tiles.map((t) => ({ ...t, blank: !meets(tileWindow(plan, t)) }));
  return { ...plan, tiles };
}

/** The tiles that get a page. */
export function printedTiles(plan: TilePlan): Tile[] {
  return plan.tiles.filter((t) => !t.blank);
}
