/**
 * Page map and legend: the whole sheet drawn small with the tile windows over it, how to assemble the tiles, and
 * the key to every mark on the true-size pages.
 */
import { PT_PER_MM } from "../paper-sizes";
import { drawSheet, BEVEL_COLOR, CUT_LINE_PT, TICK_COLOR, type SheetMap } from "./draw-sheet";
import { ALIGN_CROSS_RADIUS_MM } from "./tile-pages";
import { text, wrap } from "./pdf-doc";
import { addPage, type RenderCtx } from "./render-context";

const LEGEND_ROW_PT = 26;

export function drawLegendPage(ctx: RenderCtx): void {
  const { doc, layout, plan } = ctx;
  const tiled = plan.rows * plan.cols > 1;
  const box = addPage(ctx, "legend", tiled ? "Page map and legend" : "Legend", ctx.infoPage);
  let y = box.y;
  const printed = plan.tiles.filter((t) => !t.blank).length;
  const blankNote = printed < plan.tiles.length ? `, ${printed} printed (blank tiles are left out)` : "";
  text(doc, tiled ? `Page map: ${plan.rows} x ${plan.cols} tiles${blankNote}` : "Sheet overview", box.x, y, { size: 12, bold: true });
  y += 18;
  const steps = tiled
    ? [
        "1. Print every tile at 100 % and check the test squares on each page.",
        "2. Lay the tiles out by row (R) and column (C) as in the map below.",
        "3. Trim the left and top margins of every tile that is not in column 1 or row 1, along its corner marks.",
        `4. Lay each tile over its left and upper neighbours: its trimmed edge goes on their dashed line (${plan.overlapMm} mm in), the alignment crosses sit exactly on top of each other. Hold to a window to check, then tape.`,
        "5. Cut the pieces out on the solid line; transfer ticks, letters and bevel marks to the foam.",
      ]
    : ["1. Print at 100 % and check the test squares.", "2. Cut the pieces out on the solid line; transfer ticks, letters and bevel marks to the foam."];
  for (const s of steps) for (const l of wrap(s, box.w, 7.5)) { text(doc, l, box.x, y, { size: 7.5 }); y += 10; }
  y += 6;

  // Map: fit the sheet into the upper part of the page.
  // The legend below needs 9 rows of LEGEND_ROW_PT plus its title; the map takes the rest.
  const mapH = Math.max(80, box.y + box.h - y - (9 * LEGEND_ROW_PT + 40) - 14);
  const s = Math.min(box.w / layout.widthMm, mapH / layout.heightMm);
  const ox = box.x + (box.w - layout.widthMm * s) / 2;
  const map: SheetMap = { x0: layout.box.minX, yTop: layout.box.maxY, ox, oy: y, s };
  drawSheet(doc, layout, map, null, "overview");
  doc.lineWidth(0.5).strokeColor("#9ca3af").rect(ox, y, layout.widthMm * s, layout.heightMm * s).stroke();
  if (tiled) {
    for (const t of plan.tiles) {
      const tx = ox + (t.x0 - layout.box.minX) * s, ty = y + (layout.box.maxY - t.yTop) * s;
      const w = Math.min(plan.contentWMm, layout.box.maxX - t.x0) * s;
      const h = Math.min(plan.contentHMm, t.yTop - layout.box.minY) * s;
      if (t.blank) {
        doc.lineWidth(0.4).strokeColor("#9ca3af").dash(2, { space: 2 }).rect(tx, ty, w, h).stroke();
        doc.undash();
        text(doc, `${t.name} blank`, tx + 3, ty + 3, { size: Math.max(4.5, Math.min(7, w / 9)), color: "#9ca3af" });
      } else {
        doc.lineWidth(0.6).strokeColor("#1f2937").rect(tx, ty, w, h).stroke();
        text(doc, t.name, tx + 3, ty + 3, { size: Math.max(5, Math.min(8, w / 8)), bold: true, color: "#1f2937" });
      }
    }
  }
  y += layout.heightMm * s + 14;

  text(doc, "Legend", box.x, y, { size: 11, bold: true });
  y += 16;
  const sym = box.x + 4, label = box.x + 92;
  const rowH = LEGEND_ROW_PT;
  const entry = (draw: (cx: number, cy: number) => void, words: string) => {
    draw(sym, y + 5);
    let yy = y;
    for (const l of wrap(words, box.w - 92, 7.5)) { text(doc, l, label, yy, { size: 7.5 }); yy += 9.5; }
    y = Math.max(y + rowH, yy + 6);
  };
  entry((x, cy) => { doc.lineWidth(CUT_LINE_PT).strokeColor("#000").moveTo(x, cy).lineTo(x + 48, cy).stroke(); },
    "Cut line: the piece outline at true size. Pieces are drawn outer face up (the face you trace on).");
  entry((x, cy) => {
    doc.lineWidth(0.5).strokeColor("#000").moveTo(x, cy - 6).lineTo(x + 48, cy - 6).stroke();
    doc.lineWidth(0.7).strokeColor(TICK_COLOR).moveTo(x + 24, cy - 6).lineTo(x + 24, cy - 6 + 4 * PT_PER_MM).stroke();
    text(doc, "3", x + 24, cy - 6 + 6.2 * PT_PER_MM, { size: 6.8, align: "center", valign: "middle", color: TICK_COLOR });
  }, "Registration tick: cut a small notch or mark it on the foam. Tick 3 on one piece meets tick 3 on the piece it joins.");
  entry((x, cy) => { text(doc, "joins B", x, cy, { size: 6.8, valign: "middle", color: "#374151" }); },
    "Seam: the letter of the piece this edge is glued to, with the edge's bevel (or 'square cut').");
  entry((x, cy) => {
    doc.lineWidth(0.5).strokeColor("#000").moveTo(x, cy - 6).lineTo(x + 48, cy - 6).stroke();
    chevron(ctx, x + 24, cy - 6, true);
    foamSection(ctx, x + 54, cy - 4, "top");
  }, "Bevel chevron, solid, pointing at the edge: bevel this edge, the wider cut on top (the face you trace on). The sketch shows the cut edge in section.");
  entry((x, cy) => {
    doc.lineWidth(0.5).strokeColor("#000").moveTo(x, cy - 6).lineTo(x + 48, cy - 6).stroke();
    chevron(ctx, x + 24, cy - 6, false);
    foamSection(ctx, x + 54, cy - 4, "under");
  }, "Bevel chevron, hollow, pointing away from the edge: bevel this edge, the wider cut underneath. Angles are per side, measured from square; both pieces of a seam get the same bevel.");
  entry((x, cy) => {
    const r = ALIGN_CROSS_RADIUS_MM * PT_PER_MM;
    doc.lineWidth(0.5).strokeColor("#000").circle(x + 12, cy, r).stroke();
    doc.moveTo(x + 12 - 1.6 * r, cy).lineTo(x + 12 + 1.6 * r, cy).stroke();
    doc.moveTo(x + 12, cy - 1.6 * r).lineTo(x + 12, cy + 1.6 * r).stroke();
  }, "Alignment cross: printed on both tiles of an overlap. Lay one over the other and tape.");
  entry((x, cy) => { doc.lineWidth(0.5).strokeColor("#6b7280").dash(4, { space: 3 }).moveTo(x, cy).lineTo(x + 48, cy).stroke(); doc.undash(); },
    "Dashed line: where the neighbouring tile's trimmed edge goes (the overlap band lies between it and the window edge).");
  entry((x, cy) => { doc.lineWidth(0.6).strokeColor("#000").moveTo(x, cy + 8).lineTo(x, cy - 4).lineTo(x + 12, cy - 4).stroke(); },
    "Corner mark: a corner of the tile's window. Trim the left and top margins along these.");
  entry(() => undefined, "'cut 2, one mirrored': cut one as printed and one with the pattern turned over.");
}

function chevron(ctx: RenderCtx, x: number, edgeY: number, filled: boolean): void {
  const { doc } = ctx;
  const k = PT_PER_MM;
  const apex = filled ? 1 : 3.5, base = filled ? 3.5 : 1;
  doc.moveTo(x - 1.8 * k, edgeY + base * k).lineTo(x, edgeY + apex * k).lineTo(x + 1.8 * k, edgeY + base * k);
  if (filled) doc.closePath().fillColor(BEVEL_COLOR).fill();
  else doc.lineWidth(0.7).strokeColor(BEVEL_COLOR).stroke();
}

/** Cross-section of a foam edge: the top face ends short when the wider cut is on top. */
function foamSection(ctx: RenderCtx, x: number, cy: number, wide: "top" | "under"): void {
  const { doc } = ctx;
  const h = 8, w = 14, cut = 5;
  const top = cy - h / 2 + 4, bottom = top + h;
  doc.moveTo(x, top).lineTo(x + w - (wide === "top" ? cut : 0), top).lineTo(x + w - (wide === "under" ? cut : 0), bottom).lineTo(x, bottom).closePath();
  doc.lineWidth(0.5).fillColor("#fde68a").strokeColor("#000").fillAndStroke();
  text(doc, wide === "top" ? "top" : "under", x + w + 2, wide === "top" ? top : bottom - 5, { size: 5, color: "#4b5563" });
}
