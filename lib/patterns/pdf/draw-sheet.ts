/**
 * Draws the pattern sheet (pieces and their marks) onto a page through a layout → page mapping.
 * True-size tiles use PT_PER_MM as scale; the page map uses a smaller scale and only outlines and letters.
 */
import { pieceColor } from "../palette";
import { PT_PER_MM } from "../paper-sizes";
import { RUN_TEXT_SIZE_MM, TICK_NUMBER_SIZE_MM, type LayoutPiece, type PatternLayout } from "../layout";
import type { Box } from "../polygon";
import { text, type Doc } from "./pdf-doc";

/** Layout mm → page pt: px = ox + (x − x0)·s, py = oy + (yTop − y)·s. */
export interface SheetMap {
  x0: number;
  yTop: number;
  ox: number;
  oy: number;
  /** points per layout millimetre */
  s: number;
}

export function mapX(m: SheetMap, x: number): number {
  return m.ox + (x - m.x0) * m.s;
}
export function mapY(m: SheetMap, y: number): number {
  return m.oy + (m.yTop - y) * m.s;
}

export const CUT_LINE_PT = 0.8;
export const TICK_COLOR = "#1d4ed8";
export const SEAM_TEXT_COLOR = "#374151";
export const BEVEL_COLOR = "#b91c1c";

function tint(rgb: [number, number, number], amount: number): string {
  const c = rgb.map((v) => Math.round((1 - amount * (1 - v)) * 255));
  return `#${c.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
}

function outlinePath(doc: Doc, p: LayoutPiece, m: SheetMap): void {
  const o = p.outline;
  doc.moveTo(mapX(m, o[0]), mapY(m, o[1]));
  for (let i = 2; i < o.length; i += 2) doc.lineTo(mapX(m, o[i]), mapY(m, o[i + 1]));
  doc.closePath();
}

function intersects(a: Box, b: Box): boolean {
  return a.minX <= b.maxX && a.maxX >= b.minX && a.minY <= b.maxY && a.maxY >= b.minY;
}

/**
 * @param window  layout window in mm; pieces outside it (plus a text allowance) are skipped
 * @param detail  "true-size": every mark; "overview": tinted outline and the letter only
 */
export function drawSheet(doc: Doc, layout: PatternLayout, m: SheetMap, window: Box | null, detail: "true-size" | "overview"): void {
  const pad = 20;
  layout.pieces.forEach((p) => {
    if (window && !intersects({ minX: p.box.minX - pad, minY: p.box.minY - pad, maxX: p.box.maxX + pad, maxY: p.box.maxY + pad }, window)) return;
    doc.save();
    outlinePath(doc, p, m);
    doc.fillColor(tint(pieceColor(p.index), detail === "overview" ? 0.45 : 0.14)).fill();
    outlinePath(doc, p, m);
    doc.lineWidth(detail === "overview" ? 0.5 : CUT_LINE_PT).strokeColor("#000000").lineJoin("round").stroke();
    const lx = mapX(m, p.labelX), ly = mapY(m, p.labelY);
    if (detail === "overview") {
      const size = Math.max(5, Math.min(14, p.labelSizeMm * m.s * 0.8));
      text(doc, p.label, lx, ly, { size, bold: true, align: "center", valign: "middle" });
      doc.restore();
      return;
    }
    // Registration ticks and their numbers.
    doc.lineWidth(0.7).strokeColor(TICK_COLOR);
    for (const t of p.ticks) doc.moveTo(mapX(m, t.x0), mapY(m, t.y0)).lineTo(mapX(m, t.x1), mapY(m, t.y1)).stroke();
    const tickSize = TICK_NUMBER_SIZE_MM * PT_PER_MM;
    for (const t of p.ticks) text(doc, String(t.number), mapX(m, t.numX), mapY(m, t.numY), { size: tickSize, align: "center", valign: "middle", color: TICK_COLOR });
    // Seam runs: neighbour and bevel text, bevel chevrons.
    for (const r of p.runs) {
      for (const c of r.chevrons) {
        doc.moveTo(mapX(m, c.ax), mapY(m, c.ay)).lineTo(mapX(m, c.apexX), mapY(m, c.apexY)).lineTo(mapX(m, c.bx), mapY(m, c.by));
        if (c.filled) doc.closePath().fillColor(BEVEL_COLOR).fill();
        else doc.lineWidth(0.7).strokeColor(BEVEL_COLOR).stroke();
      }
      const bevelled = r.kind !== "straight" && r.opensTo !== "none";
      for (const l of r.labels) {
        text(doc, r.text, mapX(m, l.x), mapY(m, l.y), {
          size: RUN_TEXT_SIZE_MM * PT_PER_MM, align: "center", valign: "middle", rotate: l.angleDeg,
          color: bevelled ? BEVEL_COLOR : SEAM_TEXT_COLOR,
        });
      }
    }
    // Label block: letter, then count / area / foam lines.
    const labelPt = p.labelSizeMm * PT_PER_MM;
    const infoPt = p.infoSizeMm * PT_PER_MM;
    const blockH = labelPt + p.infoLines.length * infoPt * 1.25;
    let y = ly - blockH / 2 + labelPt / 2;
    text(doc, p.label, lx, y, { size: labelPt, bold: true, align: "center", valign: "middle" });
    y += labelPt / 2 + infoPt * 0.9;
    p.infoLines.forEach((l, i) => {
      text(doc, l, lx, y, { size: infoPt, bold: i === 0 && p.report.mirrored, align: "center", valign: "middle", color: "#111827" });
      y += infoPt * 1.25;
    });
    doc.restore();
  });
}
