/**
 * A plain table that continues on new pages (header repeated) when it reaches the bottom of the drawing area.
 */
import { text } from "./pdf-doc";
import { addPage, type ContentBox, type PageKind, type RenderCtx } from "./render-context";

export interface Column {
  title: string;
  /** width in characters */
  chars: number;
  align?: "left" | "right";
}

export interface Row {
  cells: string[];
  flagged?: boolean;
  bold?: boolean;
}

export const TABLE_SIZE = 7.5;

/**
 * Draws the table from `y` in `box`; returns the box and y after it (possibly on a later page).
 */
export function drawTable(
  ctx: RenderCtx, box: ContentBox, y: number, columns: Column[], rows: Row[],
  cont: { kind: PageKind; title: string },
): { box: ContentBox; y: number } {
  const { doc } = ctx;
  const size = TABLE_SIZE;
  const cw = size * 0.6;
  const rowH = size * 1.55;
  const xs: number[] = [];
  let x = box.x;
  for (const c of columns) { xs.push(x); x += (c.chars + 2) * cw; }
  const header = (yy: number) => {
    columns.forEach((c, i) => {
      const ax = c.align === "right" ? xs[i] + c.chars * cw : xs[i];
      text(doc, c.title, ax, yy, { size, bold: true, align: c.align === "right" ? "right" : "left" });
    });
    doc.lineWidth(0.5).strokeColor("#000000").moveTo(box.x, yy + rowH - 2).lineTo(x - cw, yy + rowH - 2).stroke();
    return yy + rowH + 1;
  };
  y = header(y);
  for (const r of rows) {
    if (y + rowH > box.y + box.h) {
      box = addPage(ctx, cont.kind, cont.title, ctx.infoPage);
      text(doc, cont.title, box.x, box.y, { size: 11, bold: true });
      y = header(box.y + 22);
    }
    if (r.flagged) doc.rect(box.x - 2, y - 2, x - cw - box.x + 4, rowH).fillColor("#fee2e2").fill();
    columns.forEach((c, i) => {
      const s = r.cells[i] ?? "";
      const clipped = s.length > c.chars ? s.slice(0, c.chars - 1) + "\u2026" : s;
      const ax = c.align === "right" ? xs[i] + c.chars * cw : xs[i];
      text(doc, clipped, ax, y, { size, bold: r.bold, align: c.align === "right" ? "right" : "left", color: r.flagged ? "#991b1b" : "#000000" });
    });
    y += rowH;
  }
  return { box, y };
}
