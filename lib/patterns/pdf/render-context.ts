/**
 * State shared by the page writers of one pattern PDF, and page creation. Every page gets the key strip (test
 * squares, page name, safety line) at its bottom; it is drawn once all pages exist so it can say "page i of n".
 */
import type { PatternInput } from "../pattern-input";
import type { PatternLayout } from "../layout";
import type { Tile, TilePlan } from "../tiling";
import { KEY_GAP_PT, KEY_STRIP_PT, PAGE_MARGIN_PT } from "../tiling";
import type { CutList } from "../cut-list";
import type { StretchSummary } from "../stretch-summary";
import type { Doc } from "./pdf-doc";

export type PageKind = "cover" | "legend" | "assembly" | "tile";

export interface PageRecord {
  kind: PageKind;
  /** shown in the key strip, e.g. "Cover", "Tile R1-C2" */
  title: string;
  tile?: Tile;
  widthPt: number;
  heightPt: number;
}

export interface RenderCtx {
  doc: Doc;
  input: PatternInput;
  layout: PatternLayout;
  plan: TilePlan;
  cutList: CutList;
  stretch: StretchSummary;
  /** material as printed */
  materialName: string;
  createdAt: Date;
  /** page size for cover, legend and assembly pages */
  infoPage: { widthPt: number; heightPt: number };
  pages: PageRecord[];
}

/** Drawing area of a page above the key strip, points. */
export interface ContentBox {
  x: number;
  y: number;
  w: number;
  h: number;
}

export function addPage(ctx: RenderCtx, kind: PageKind, title: string, size: { widthPt: number; heightPt: number }, tile?: Tile): ContentBox {
  ctx.doc.addPage({ size: [size.widthPt, size.heightPt], margin: 0 });
  ctx.pages.push({ kind, title, tile, widthPt: size.widthPt, heightPt: size.heightPt });
  const m = PAGE_MARGIN_PT;
  return { x: m, y: m, w: size.widthPt - 2 * m, h: size.heightPt - 2 * m - KEY_STRIP_PT - KEY_GAP_PT };
}
