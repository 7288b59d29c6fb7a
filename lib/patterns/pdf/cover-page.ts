/**
 * Cover page: what the pattern is (project, scan, scale, foam, date, paper), the safety cautions, warnings from the
 * flattening, and the pieces with their stretch against the foam's limit.
 */
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { PAPER_SIZES } from "../paper-sizes";
import { formatArea, formatDate, formatLength, formatLengthWithInches, formatPercent } from "../format";
import { cutCountText, mirrorOfLabel } from "../layout";
import { text, wrap } from "./pdf-doc";
import { addPage, type RenderCtx } from "./render-context";
import { drawTable } from "./table";

export function drawCoverPage(ctx: RenderCtx): void {
  const { doc, input, layout, plan, stretch, cutList } = ctx;
  const { report, meta } = input;
  let box = addPage(ctx, "cover", "Cover: project, pieces, safety", ctx.infoPage);
  let y = box.y;
  text(doc, "PEELFORM  FOAM PATTERN", box.x, y, { size: 8, bold: true, color: "#4b5563" });
  y += 13;
  for (const l of wrap(meta.projectName, box.w, 18)) { text(doc, l, box.x, y, { size: 18, bold: true }); y += 22; }
  y += 4;

  const f = layout.mmPerUnit;
  const target = report.scale.targetWidth != null ? `, target width ${formatLengthWithInches(report.scale.targetWidth * f)}` : "";
  const paperText = plan.paper === "full"
    ? "one full-size page (plotter or projector)"
    : `${PAPER_SIZES[plan.paper].name} ${plan.orientation}, ${plan.rows} x ${plan.cols} tiles (${plan.tiles.filter((t) => !t.blank).length} printed), ${plan.overlapMm} mm overlap`;
  const surface = report.surface.kind === "neutral"
    ? `neutral surface of ${formatLength(report.surface.thickness * f)} foam (scan is the ${report.surface.scanFace} face)`
    : "scan surface as is";
  const kv: [string, string][] = [
    ["Scan", meta.scanName],
    ["Scale", `${report.scale.percent.toFixed(1)} % (x${report.scale.factor.toFixed(3)})${target}`],
    ["Foam", `${ctx.materialName}, ${formatLength(meta.thicknessMm)} thick`],
    ["Flattened", surface],
    ["Date", formatDate(ctx.createdAt)],
    ["Pieces", `${layout.pieces.length} shapes, ${cutList.totalPieces} to cut, ${formatArea(cutList.totalAreaMm2)} of foam before waste`],
    ["Sheet", `${formatLengthWithInches(layout.widthMm)} x ${formatLengthWithInches(layout.heightMm)}`],
    ["Paper", paperText],
  ];
  for (const [k, v] of kv) {
    const lines = wrap(v, box.w - 90, 8);
    text(doc, k, box.x, y, { size: 8, bold: true });
    for (const l of lines) { text(doc, l, box.x + 80, y, { size: 8 }); y += 11; }
  }
  y += 6;

  // Safety cautions, boxed.
  const cautionLines: { s: string; bold: boolean }[] = [];
  for (const c of SAFETY_CAUTIONS) {
    cautionLines.push({ s: c.title, bold: true });
    for (const l of c.lines) for (const w of wrap(l, box.w - 16, 7)) cautionLines.push({ s: w, bold: false });
  }
  const cautionH = 20 + cautionLines.length * 9.2;
  doc.lineWidth(1).strokeColor("#991b1b").rect(box.x, y, box.w, cautionH).stroke();
  text(doc, "SAFETY", box.x + 8, y + 6, { size: 8, bold: true, color: "#991b1b" });
  let cy = y + 18;
  for (const l of cautionLines) { text(doc, l.s, box.x + 8, cy, { size: 7, bold: l.bold }); cy += 9.2; }
  y += cautionH + 10;

  const notes = [...report.warnings];
  for (const { piece, reason } of layout.skipped) notes.push(`Piece ${piece.label} is not drawn: ${reason}`);
  if (notes.length > 0) {
    text(doc, "Warnings", box.x, y, { size: 9, bold: true, color: "#991b1b" });
    y += 12;
    for (const n of notes) for (const l of wrap(`- ${n}`, box.w, 7)) {
      if (y + 10 > box.y + box.h) { box = addPage(ctx, "cover", "Cover (continued)", ctx.infoPage); y = box.y; }
      text(doc, l, box.x, y, { size: 7 }); y += 9.5;
    }
    y += 6;
  }

  text(doc, "Pieces and stretch", box.x, y, { size: 9, bold: true });
  y += 12;
  for (const l of wrap(`${stretch.limitNote} ${stretch.flaggedCount > 0 ? `${stretch.flaggedCount} piece(s) flagged (shaded).` : "No piece is over the limit."}`, box.w, 7)) {
    text(doc, l, box.x, y, { size: 7 }); y += 9.5;
  }
  y += 4;
  const byLabel = new Map(layout.pieces.map((p) => [p.label, p]));
  const rows = stretch.rows.map((r) => {
    const p = byLabel.get(r.label);
    const rep = report.pieces.find((q) => q.label === r.label);
    return {
      flagged: r.flagged,
      cells: [
        r.label,
        rep ? cutCountText({ ...rep, mirrorOf: mirrorOfLabel(rep) }) : "",
        p ? formatArea(p.areaMm2) : "-",
        r.maxStretch == null ? "-" : formatPercent(r.maxStretch),
        r.p95Stretch == null ? "-" : formatPercent(r.p95Stretch),
        r.maxCompress == null ? "-" : formatPercent(r.maxCompress),
        r.note,
      ],
    };
  });
  drawTable(ctx, box, y, [
    { title: "Piece", chars: 5 },
    { title: "Cut", chars: 19 },
    { title: "Area", chars: 11, align: "right" },
    { title: "Max str.", chars: 8, align: "right" },
    { title: "P95", chars: 7, align: "right" },
    { title: "Compr.", chars: 7, align: "right" },
    { title: "Note", chars: Math.max(10, Math.floor(box.w / 4.5) - 72) },
  ], rows, { kind: "cover", title: "Pieces and stretch (continued)" });
}
