/**
 * Assembly sheet: the scan from four directions with pieces coloured and lettered (when the mesh is given), then the
 * cut list (piece, count, area of one, cut length = outline perimeter × count).
 */
import { formatArea, formatLength } from "../format";
import { projectViews, type ProjectedView } from "../assembly/project-views";
import { text } from "./pdf-doc";
import { addPage, type ContentBox, type RenderCtx } from "./render-context";
import { drawTable } from "./table";

const r2 = (v: number) => Math.round(v * 100) / 100;
const r3 = (v: number) => Math.round(Math.max(0, Math.min(1, v)) * 1000) / 1000;

function drawView(ctx: RenderCtx, v: ProjectedView, x: number, y: number, w: number, h: number): void {
  const { doc } = ctx;
  const titleH = 12;
  const vw = v.maxX - v.minX || 1, vh = v.maxY - v.minY || 1;
  const s = Math.min((w - 8) / vw, (h - titleH - 8) / vh);
  const ox = x + (w - vw * s) / 2, oy = y + titleH + (h - titleH - vh * s) / 2;
  const X = (px: number) => r2(ox + (px - v.minX) * s), Y = (py: number) => r2(oy + (v.maxY - py) * s);
  text(doc, v.title, x + w / 2, y, { size: 8, bold: true, align: "center" });
  const n = v.triangles.length / 6;
  // Thousands of triangles: written as raw path operators (ISO 32000-1 §8.5, §8.6.8 rg/RG) in one block instead of
  // one pdfkit call chain each. Fill and stroke in the face colour so no hairline gaps show between triangles.
  // Page space here is pdfkit's top-left user space, the same the rest of the page is drawn in.
  const ops: string[] = ["q", "0.25 w", "1 j"];
  const t = v.triangles;
  for (let k = 0; k < n; k++) {
    const c = `${r3(v.colors[3 * k])} ${r3(v.colors[3 * k + 1])} ${r3(v.colors[3 * k + 2])}`;
    ops.push(`${c} rg ${c} RG ${X(t[6 * k])} ${Y(t[6 * k + 1])} m ${X(t[6 * k + 2])} ${Y(t[6 * k + 3])} l ${X(t[6 * k + 4])} ${Y(t[6 * k + 5])} l h B`);
  }
  ops.push("Q");
  doc.addContent(ops.join("\n"));
  doc.save();
  for (const l of v.letters) {
    const lx = X(l.x), ly = Y(l.y);
    const size = 7;
    const rw = Math.max(9, l.label.length * size * 0.6 + 4);
    doc.roundedRect(lx - rw / 2, ly - 5, rw, 10, 2).fillColor("#ffffff").strokeColor("#111827").lineWidth(0.4).fillAndStroke();
    text(doc, l.label, lx, ly, { size, bold: true, align: "center", valign: "middle" });
  }
  doc.restore();
}

export function drawAssemblyPage(ctx: RenderCtx): void {
  const { doc, input, cutList } = ctx;
  let box: ContentBox = addPage(ctx, "assembly", "Assembly sheet and cut list", ctx.infoPage);
  let y = box.y;
  text(doc, "Assembly", box.x, y, { size: 12, bold: true });
  y += 18;
  if (input.assembly) {
    const a = input.assembly;
    const reportIndex = new Map(input.report.pieces.map((p, i) => [p.label, i]));
    const colorIndex = a.labels.map((l, i) => reportIndex.get(l) ?? i);
    const views = projectViews({ positions: a.positions, triangles: a.triangles, facePiece: a.facePiece }, a.labels, colorIndex);
    const cellW = box.w / 2, cellH = Math.min(box.h * 0.3, cellW * 0.9);
    views.forEach((v, i) => drawView(ctx, v, box.x + (i % 2) * cellW, y + Math.floor(i / 2) * cellH, cellW, cellH));
    y += 2 * cellH + 6;
    text(doc, "Orthographic views, not to scale. Letters mark the pieces; colours only tell neighbours apart.", box.x, y, { size: 6.5, color: "#4b5563" });
    y += 16;
  } else {
    text(doc, "No 3D views: the mesh was not supplied with this pattern.", box.x, y, { size: 7, color: "#4b5563" });
    y += 14;
  }
  text(doc, "Cut list", box.x, y, { size: 10, bold: true });
  y += 14;
  const rows = cutList.rows.map((r) => ({
    cells: [r.label, String(r.count), r.mirrored ? "yes" : "no", formatArea(r.areaMm2), formatLength(r.perimeterMm), formatLength(r.cutLengthMm)],
  }));
  rows.push({ cells: ["Total", String(cutList.totalPieces), "", formatArea(cutList.totalAreaMm2), "", formatLength(cutList.totalCutLengthMm)], bold: true } as (typeof rows)[number]);
  ({ box, y } = drawTable(ctx, box, y, [
    { title: "Piece", chars: 6 },
    { title: "Count", chars: 5, align: "right" },
    { title: "Mirror", chars: 6 },
    { title: "Area (one)", chars: 11, align: "right" },
    { title: "Perimeter", chars: 10, align: "right" },
    { title: "Cut length", chars: 11, align: "right" },
  ], rows, { kind: "assembly", title: "Cut list (continued)" }));
  text(doc, "Cut length = outline perimeter x count: the knife or hot-wire run for that piece.", box.x, y + 4, { size: 6.5, color: "#4b5563" });
}
