/**
 * The true-size pages: one per tile of the plan. Each page shows its window of the sheet, clipped, with
 * - alignment crosses (a circle with a cross, our own mark) at fixed sheet positions inside the overlap bands, so the
 *   same cross prints on both tiles and the tiles are aligned by laying one cross exactly over the other;
 * - dashed lines where the neighbouring tile's window begins, and the neighbour's name in the band;
 * - corner marks at the window corners.
 */
import { PT_PER_MM } from "../paper-sizes";
import { tileName, type Tile } from "../tiling";
import { addPage, type RenderCtx } from "./render-context";
import { drawSheet, mapX, mapY, type SheetMap } from "./draw-sheet";
import { text } from "./pdf-doc";

/** Radius of the alignment cross circle, mm. */
export const ALIGN_CROSS_RADIUS_MM = 3;

/** Positions of every alignment cross on the sheet, layout mm. */
export function alignmentCrosses(ctx: Pick<RenderCtx, "plan">): { x: number; y: number }[] {
  const { plan } = ctx;
  const out: { x: number; y: number }[] = [];
  const half = plan.overlapMm / 2;
  const rowY: number[][] = [], colX: number[][] = [];
  for (let r = 1; r <= plan.rows; r++) {
    const t = plan.tiles[(r - 1) * plan.cols];
    rowY.push([0.2, 0.5, 0.8].map((f) => t.yTop - f * plan.contentHMm));
  }
  for (let c = 1; c <= plan.cols; c++) {
    const t = plan.tiles[c - 1];
    colX.push([0.2, 0.5, 0.8].map((f) => t.x0 + f * plan.contentWMm));
  }
  // Vertical bands between columns c and c+1.
  for (let c = 1; c < plan.cols; c++) {
    const x = plan.tiles[c].x0 + half;
    for (const ys of rowY) for (const y of ys) out.push({ x, y });
  }
  // Horizontal bands between rows r and r+1.
  for (let r = 1; r < plan.rows; r++) {
    const y = plan.tiles[r * plan.cols].yTop - half;
    for (const xs of colX) for (const x of xs) out.push({ x, y });
    for (let c = 1; c < plan.cols; c++) out.push({ x: plan.tiles[c].x0 + half, y });
  }
  return out;
}

export function drawTilePages(ctx: RenderCtx): void {
  const { plan, doc, layout } = ctx;
  const crosses = alignmentCrosses(ctx);
  const single = plan.rows * plan.cols === 1;
  for (const tile of plan.tiles) {
    if (tile.blank) continue;
    const title = single
      ? "True-size pieces (one page)"
      : `Tile ${tile.name}: row ${tile.row} of ${plan.rows}, column ${tile.col} of ${plan.cols}`;
    const box = addPage(ctx, "tile", title, { widthPt: plan.widthPt, heightPt: plan.heightPt }, tile);
    const map: SheetMap = { x0: tile.x0, yTop: tile.yTop, ox: plan.contentXPt, oy: plan.contentYPt, s: PT_PER_MM };
    const window = { minX: tile.x0, maxX: tile.x0 + plan.contentWMm, maxY: tile.yTop, minY: tile.yTop - plan.contentHMm };
    doc.save();
    doc.rect(plan.contentXPt, plan.contentYPt, plan.contentWPt, plan.contentHPt).clip();
    drawSheet(doc, layout, map, window, "true-size");
    if (!single) drawBands(ctx, tile, map);
    for (const c of crosses) {
      if (c.x < window.minX - 5 || c.x > window.maxX + 5 || c.y < window.minY - 5 || c.y > window.maxY + 5) continue;
      drawCross(ctx, mapX(map, c.x), mapY(map, c.y));
    }
    doc.restore();
    drawCornerMarks(ctx, box.x, box.y, plan.contentWPt, plan.contentHPt);
  }
}

function drawCross(ctx: RenderCtx, x: number, y: number): void {
  const { doc } = ctx;
  const r = ALIGN_CROSS_RADIUS_MM * PT_PER_MM;
  doc.save();
  doc.lineWidth(0.5).strokeColor("#000000");
  doc.circle(x, y, r).stroke();
  doc.moveTo(x - r * 1.6, y).lineTo(x + r * 1.6, y).stroke();
  doc.moveTo(x, y - r * 1.6).lineTo(x, y + r * 1.6).stroke();
  doc.restore();
}

function drawBands(ctx: RenderCtx, tile: Tile, map: SheetMap): void {
  const { doc, plan } = ctx;
  const o = plan.overlapMm;
  const X = (x: number) => mapX(map, x), Y = (y: number) => mapY(map, y);
  const top = tile.yTop, bottom = tile.yTop - plan.contentHMm, left = tile.x0, right = tile.x0 + plan.contentWMm;
  doc.save();
  doc.lineWidth(0.5).strokeColor("#6b7280").dash(4, { space: 3 });
  const lines: [number, number, number, number][] = [];
  if (tile.col < plan.cols) lines.push([right - o, top, right - o, bottom]);
  if (tile.col > 1) lines.push([left + o, top, left + o, bottom]);
  if (tile.row < plan.rows) lines.push([left, bottom + o, right, bottom + o]);
  if (tile.row > 1) lines.push([left, top - o, right, top - o]);
  for (const [a, b, c, d] of lines) doc.moveTo(X(a), Y(b)).lineTo(X(c), Y(d)).stroke();
  doc.undash();
  doc.restore();
  const size = 6;
  const note = (s: string, x: number, y: number, rotate = 0) => text(doc, s, x, y, { size, align: "center", valign: "middle", color: "#4b5563", rotate });
  const midY = Y((top + bottom) / 2), midX = X((left + right) / 2);
  if (tile.col < plan.cols) note(`overlap: ${tileName(tile.row, tile.col + 1)} lies here`, X(right - o / 2), midY + 60, 90);
  if (tile.col > 1) note(`overlap: ${tileName(tile.row, tile.col - 1)} lies here`, X(left + o / 2), midY + 60, 90);
  if (tile.row < plan.rows) note(`overlap: ${tileName(tile.row + 1, tile.col)} lies here`, midX + 60, Y(bottom + o / 2));
  if (tile.row > 1) note(`overlap: ${tileName(tile.row - 1, tile.col)} lies here`, midX + 60, Y(top - o / 2));
}


function drawCornerMarks(ctx: RenderCtx, x: number, y: number, w: number, h: number): void {
  const { doc } = ctx;
  const l = 12;
  doc.save();
  doc.lineWidth(0.6).strokeColor("#000000");
  doc.moveTo(x, y + l).lineTo(x, y).lineTo(x + l, y).stroke();
  doc.moveTo(x + w - l, y).lineTo(x + w, y).lineTo(x + w, y + l).stroke();
  doc.moveTo(x, y + h - l).lineTo(x, y + h).lineTo(x + l, y + h).stroke();
  doc.moveTo(x + w - l, y + h).lineTo(x + w, y + h).lineTo(x + w, y + h - l).stroke();
  doc.restore();
}
