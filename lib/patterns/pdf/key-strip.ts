/**
 * The key strip at the foot of every page: a 5 cm and a 1 in test square (the printer must not scale the page),
 * the page's name, project line, safety reminder, page number and, on tiles, a mini map with the tile marked.
 */
import { SAFETY_REMINDER } from "@/lib/safety/cautions";
import { KEY_STRIP_PT, PAGE_MARGIN_PT } from "../tiling";
import { PT_PER_IN, mmToPt } from "../paper-sizes";
import { text, wrap } from "./pdf-doc";
import type { RenderCtx } from "./render-context";

/** Side of the metric test square: 5 cm = 50 × 72 / 25.4 = 141.732 pt. */
export const SQUARE_5CM_PT = mmToPt(50);
/** Side of the imperial test square: 1 in = 72 pt (ISO 32000-1 §8.3.2.3). */
export const SQUARE_1IN_PT = PT_PER_IN;

export function drawKeyStrips(ctx: RenderCtx): void {
  const { doc } = ctx;
  const range = doc.bufferedPageRange();
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    drawKeyStrip(ctx, i, range.count);
  }
}

function drawKeyStrip(ctx: RenderCtx, index: number, total: number): void {
  const { doc } = ctx;
  const page = ctx.pages[index];
  const m = PAGE_MARGIN_PT;
  const top = page.heightPt - m - KEY_STRIP_PT;
  const right = page.widthPt - m;
  doc.save();
  doc.lineWidth(0.4).strokeColor("#9ca3af").moveTo(m, top).lineTo(right, top).stroke();

  const sqTop = top + (KEY_STRIP_PT - SQUARE_5CM_PT) / 2;
  doc.lineWidth(0.6).strokeColor("#000000");
  doc.rect(m, sqTop, SQUARE_5CM_PT, SQUARE_5CM_PT).stroke();
  text(doc, "5 cm", m + SQUARE_5CM_PT / 2, sqTop + SQUARE_5CM_PT / 2 - 6, { size: 9, bold: true, align: "center", valign: "middle" });
  text(doc, "test square", m + SQUARE_5CM_PT / 2, sqTop + SQUARE_5CM_PT / 2 + 7, { size: 6, align: "center", valign: "middle", color: "#4b5563" });
  const inX = m + SQUARE_5CM_PT + 8;
  const inTop = sqTop + SQUARE_5CM_PT - SQUARE_1IN_PT;
  doc.lineWidth(0.6).strokeColor("#000000");
  doc.rect(inX, inTop, SQUARE_1IN_PT, SQUARE_1IN_PT).stroke();
  text(doc, "1 in", inX + SQUARE_1IN_PT / 2, inTop + SQUARE_1IN_PT / 2, { size: 8, bold: true, align: "center", valign: "middle" });

  const tx = inX + SQUARE_1IN_PT + 10;
  const isTile = page.kind === "tile" && page.tile && ctx.plan.rows * ctx.plan.cols > 1;
  const mapW = isTile ? 70 : 0;
  const textW = right - tx - (mapW ? mapW + 8 : 0);
  let y = sqTop;
  const line = (s: string, size: number, bold = false, color = "#000000") => {
    for (const l of wrap(s, textW, size)) { text(doc, l, tx, y, { size, bold, color }); y += size * 1.3; }
  };
  line("PRINT AT 100% / ACTUAL SIZE", 9, true);
  line("No fit-to-page. Check this square: it must measure 5 cm, the small one 1 in.", 6.5);
  y += 4;
  line(page.title, 8, true);
  const meta = ctx.input.meta;
  line(`${meta.projectName} - ${meta.scanName} - ${ctx.materialName} ${meta.thicknessMm} mm`, 6.5);
  y += 2;
  line(SAFETY_REMINDER, 6, false, "#7f1d1d");
  text(doc, `page ${index + 1} of ${total}  -  Peelform`, tx, sqTop + SQUARE_5CM_PT - 7, { size: 6.5, color: "#4b5563" });

  if (isTile && page.tile) drawMiniMap(ctx, right - mapW, sqTop, mapW, SQUARE_5CM_PT - 12, page.tile.row, page.tile.col);
  doc.restore();
}

function drawMiniMap(ctx: RenderCtx, x: number, y: number, w: number, h: number, row: number, col: number): void {
  const { doc, plan } = ctx;
  const cell = Math.min(w / plan.cols, h / plan.rows);
  const gw = cell * plan.cols;
  const ox = x + (w - gw);
  for (const t of plan.tiles) {
    const cx = ox + (t.col - 1) * cell, cy = y + (t.row - 1) * cell;
    doc.rect(cx + 0.5, cy + 0.5, cell - 1, cell - 1);
    if (t.row === row && t.col === col) doc.fillColor("#111827").fill();
    else if (t.blank) doc.fillColor("#e5e7eb").fill();
    else doc.lineWidth(0.4).strokeColor("#6b7280").stroke();
  }
  text(doc, "you are here", ox + gw / 2, y + plan.rows * cell + 3, { size: 5.5, align: "center", color: "#4b5563" });
}
