/**
 * The pattern sheet as SVG at true size, for cutters (laser, drag knife, vinyl plotter) and vector editors.
 *
 * Units: `width` and `height` carry "mm" and the viewBox is in millimetres, so one user unit = 1 mm
 * (SVG 1.1 §7.10: "mm" = millimetres; with a viewBox of the same numbers the user unit is 1 mm).
 * Report lengths are converted with MM_PER_UNIT; y is flipped (layout y up → SVG y down).
 *
 * Structure (one group per piece, its marks in sub-groups, so a cutter can select by class):
 *   <svg>
 *     <title/>, <desc/> (project, foam, safety cautions)
 *     <g id="pieces">
 *       <g id="{label}" class="piece" data-count="…" data-mirrored="…">
 *         <path id="{label}-outline" class="outline cut"/>      cut line (closed path)
 *         <g id="{label}-ticks" class="ticks">…</g>              registration ticks (lines) + numbers (text)
 *         <g id="{label}-bevels" class="bevels">…</g>            bevel chevrons (filled = wide on top, open = under)
 *         <g id="{label}-labels" class="labels">…</g>            letter, count/area/foam, seam texts
 *       </g>
 *     </g>
 *     <g id="notes" class="notes">  project line and the safety cautions, in a band below the sheet (never cut)
 *   </svg>
 * Labels are `<text>` in JetBrains Mono (monospace fallback); cutters usually ignore or engrave text.
 */
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { buildLayout, RUN_TEXT_SIZE_MM, TICK_NUMBER_SIZE_MM, type LayoutPiece } from "./layout";
import { findFoamMaterial } from "./materials";
import { createdAtDate, validatePatternInput, type PatternInput } from "./pattern-input";
import { formatDate } from "./format";

function esc(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

/** Millimetres to text with 3 decimals (1 µm), trailing zeros trimmed. */
function n(v: number): string {
  const s = v.toFixed(3);
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

export function renderPatternSvg(input: PatternInput): string {
  validatePatternInput(input);
  const { meta } = input;
  const material = findFoamMaterial(meta.material);
  const materialName = material ? material.name : meta.material;
  const layout = buildLayout(input.report, materialName, meta.thicknessMm);
  const { minX, maxY } = layout.box;
  const X = (x: number) => n(x - minX);
  const Y = (y: number) => n(maxY - y);
  // Notes band under the sheet: project line plus the cautions, sized to fit the sheet's width.
  const noteLines = [
    `${meta.projectName} - ${meta.scanName} - ${materialName} ${meta.thicknessMm} mm - true size, millimetres`,
    ...SAFETY_CAUTIONS.flatMap((c) => [`${c.title.toUpperCase()}:`, ...c.lines]),
  ];
  const longest = Math.max(...noteLines.map((l) => [...l].length));
  const noteSize = Math.min(2.5, (layout.widthMm - 4) / (longest * 0.6));
  const notesH = noteLines.length * noteSize * 1.35 + 4;
  const W = n(layout.widthMm), H = n(layout.heightMm + notesH);
  const out: string[] = [];
  out.push(`<?xml version="1.0" encoding="UTF-8"?>`);
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${W}mm" height="${H}mm" viewBox="0 0 ${W} ${H}" font-family="JetBrains Mono, monospace">`);
  out.push(`<title>${esc(`${meta.projectName} - ${meta.scanName} - pattern at true size (mm)`)}</title>`);
  const desc = [
    `Peelform pattern, ${formatDate(createdAtDate(meta))}. Units: millimetres, true size. Foam: ${materialName} ${meta.thicknessMm} mm.`,
    `Scale ${input.report.scale.percent.toFixed(1)} %. Pieces drawn outer face up.`,
    ...SAFETY_CAUTIONS.map((c) => `${c.title}: ${c.lines.join(" ")}`),
  ];
  out.push(`<desc>${esc(desc.join("\n"))}</desc>`);
  out.push(`<g id="pieces">`);
  for (const p of layout.pieces) out.push(pieceSvg(p, X, Y));
  out.push(`</g>`);
  out.push(`<g id="notes" class="notes" fill="#7f1d1d" font-size="${n(noteSize)}">`);
  noteLines.forEach((l, i) => {
    out.push(`<text x="2" y="${n(layout.heightMm + 2 + (i + 0.8) * noteSize * 1.35)}">${esc(l)}</text>`);
  });
  out.push(`</g>`);
  out.push(`</svg>`);
  return out.join("\n") + "\n";
}

function pieceSvg(p: LayoutPiece, X: (x: number) => string, Y: (y: number) => string): string {
  const id = esc(p.label);
  const o = p.outline;
  let d = `M${X(o[0])} ${Y(o[1])}`;
  for (let i = 2; i < o.length; i += 2) d += `L${X(o[i])} ${Y(o[i + 1])}`;
  d += "Z";
  const s: string[] = [];
  s.push(`<g id="${id}" class="piece" data-count="${p.report.count}" data-mirrored="${p.report.mirrored}">`);
  s.push(`<path id="${id}-outline" class="outline cut" d="${d}" fill="none" stroke="#000000" stroke-width="0.25"/>`);
  s.push(`<g id="${id}-ticks" class="ticks" stroke="#1d4ed8" stroke-width="0.25" fill="#1d4ed8" font-size="${TICK_NUMBER_SIZE_MM}" text-anchor="middle" dominant-baseline="central">`);
  for (const t of p.ticks) {
    s.push(`<line x1="${X(t.x0)}" y1="${Y(t.y0)}" x2="${X(t.x1)}" y2="${Y(t.y1)}" data-run="${t.run}"/>`);
    s.push(`<text x="${X(t.numX)}" y="${Y(t.numY)}" stroke="none">${t.number}</text>`);
  }
  s.push(`</g>`);
  s.push(`<g id="${id}-bevels" class="bevels" stroke="#b91c1c" stroke-width="0.25">`);
  for (const r of p.runs) for (const c of r.chevrons) {
    const pts = `${X(c.ax)},${Y(c.ay)} ${X(c.apexX)},${Y(c.apexY)} ${X(c.bx)},${Y(c.by)}`;
    s.push(c.filled ? `<polygon points="${pts}" fill="#b91c1c" data-run="${r.run}"/>` : `<polyline points="${pts}" fill="none" data-run="${r.run}"/>`);
  }
  s.push(`</g>`);
  s.push(`<g id="${id}-labels" class="labels" fill="#000000" text-anchor="middle" dominant-baseline="central">`);
  const blockH = p.labelSizeMm + p.infoLines.length * p.infoSizeMm * 1.25;
  let y = p.labelY + blockH / 2 - p.labelSizeMm / 2;
  s.push(`<text x="${X(p.labelX)}" y="${Y(y)}" font-size="${n(p.labelSizeMm)}" font-weight="700">${id}</text>`);
  y -= p.labelSizeMm / 2 + p.infoSizeMm * 0.9;
  for (const l of p.infoLines) {
    s.push(`<text x="${X(p.labelX)}" y="${Y(y)}" font-size="${n(p.infoSizeMm)}">${esc(l)}</text>`);
    y -= p.infoSizeMm * 1.25;
  }
  for (const r of p.runs) for (const l of r.labels) {
    const fill = r.kind !== "straight" && r.opensTo !== "none" ? "#b91c1c" : "#374151";
    s.push(`<text x="${X(l.x)}" y="${Y(l.y)}" font-size="${RUN_TEXT_SIZE_MM}" fill="${fill}" transform="rotate(${n(-l.angleDeg)} ${X(l.x)} ${Y(l.y)})" data-run="${r.run}">${esc(r.text)}</text>`);
  }
  s.push(`</g>`);
  s.push(`</g>`);
  return s.join("\n");
}
