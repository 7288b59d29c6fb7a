/**
 * The pattern sheet in millimetres with every annotation placed: the one model both writers (PDF, SVG) draw, so
 * the two documents agree mark for mark.
 *
 * Coordinates: layout coordinates of the report (x right, y up) converted to millimetres with MM_PER_UNIT.
 * Pieces are drawn outer face up (the report's outlines are counter-clockwise seen from the outside of the foam).
 */
import type { BevelRun, FlattenReport, PieceReport } from "@/lib/geometry/report-types";
import { MM_PER_UNIT } from "@/lib/geometry/mesh";
import {
  labelPoint, pointAlongPolyline, pointInPolygon, polygonBox, polygonPerimeter, polygonSignedArea, polylineLength,
  type Box,
} from "./polygon";
import { formatArea, formatLength } from "./format";

/** Registration tick, mm: from the edge point (x0, y0) inward to (x1, y1); number centred at (nx, ny). */
export interface TickMark {
  run: number;
  number: number;
  x0: number; y0: number; x1: number; y1: number;
  numX: number; numY: number;
}

/** Bevel chevron, mm: a triangle (apex, a, b); filled = wide on top (traced face), hollow V = wide underneath. */
export interface Chevron {
  apexX: number; apexY: number; ax: number; ay: number; bx: number; by: number;
  filled: boolean;
}

/** Where a run's text goes: centred at (x, y), rotated by angleDeg (counter-clockwise, layout frame), mm. */
export interface RunLabel {
  x: number; y: number;
  angleDeg: number;
}

/**
 * One seam run's annotation: the neighbour text ("joins B, bevel 20° wide on top"), repeated along long runs so
 * every tile that shows part of the seam names the neighbour, and the bevel chevrons.
 */
export interface RunMark {
  run: number;
  neighbor: string;
  kind: BevelRun["kind"];
  opensTo: BevelRun["opensTo"];
  bevelDeg: number;
  text: string;
  labels: RunLabel[];
  chevrons: Chevron[];
}

/** Longest stretch of seam with one copy of its text, mm (a bit under a Letter tile's width). */
export const RUN_TEXT_REPEAT_MM = 160;

export interface LayoutPiece {
  label: string;
  /** index of the piece in the report (palette colour index, shared with the assembly views) */
  index: number;
  report: PieceReport;
  /** outline, mm, [x0, y0, x1, y1, …], counter-clockwise, not closed */
  outline: Float64Array;
  box: Box;
  areaMm2: number;
  perimeterMm: number;
  /** label anchor and sizes, mm */
  labelX: number;
  labelY: number;
  labelSizeMm: number;
  infoSizeMm: number;
  /** text lines under the label: count, area, foam */
  infoLines: string[];
  ticks: TickMark[];
  runs: RunMark[];
}

export interface PatternLayout {
  pieces: LayoutPiece[];
  /** pieces not drawn, with the reason: not flattenable, or cut as another piece's mirrored copy (count 0) */
  skipped: { piece: PieceReport; reason: string }[];
  /** sheet extents including the padding, mm */
  box: Box;
  widthMm: number;
  heightMm: number;
  mmPerUnit: number;
}

/** Space kept around the pieces on the sheet, mm. */
export const SHEET_PADDING_MM = 6;
export const TICK_LENGTH_MM = 4;
export const TICK_NUMBER_SIZE_MM = 2.4;
export const RUN_TEXT_SIZE_MM = 2.4;
/** Seam text centre, mm in from the edge: beyond the tick (4 mm) and its number (centre 6.2 mm, 2.4 mm high). */
export const RUN_TEXT_INSET_MM = 9.5;

/** Label of the piece a count-0 piece is the mirrored copy of (the pipeline adds `mirrorOf`), or null. */
export function mirrorOfLabel(p: PieceReport): string | null {
  const m = (p as PieceReport & { mirrorOf?: unknown }).mirrorOf;
  return typeof m === "string" && m.length > 0 ? m : null;
}

/** Text shown for how many to cut. */
export function cutCountText(p: Pick<PieceReport, "count" | "mirrored"> & { mirrorOf?: string | null }): string {
  if (p.count === 0) return p.mirrorOf ? `mirror copy of ${p.mirrorOf}` : "not cut";
  if (!p.mirrored) return `cut ${p.count}`;
  if (p.count === 2) return "cut 2, one mirrored";
  return `cut ${p.count}, ${Math.floor(p.count / 2)} mirrored`;
}

/** The words for a run's bevel: which face the wider cut is on. "top" = the face the pattern is traced on. */
export function bevelText(b: Pick<BevelRun, "kind" | "opensTo" | "bevelDeg">): string {
  if (b.kind === "straight" || b.opensTo === "none") return "square cut";
  return `bevel ${Math.abs(b.bevelDeg).toFixed(0)}\u00b0 wide ${b.opensTo === "outer" ? "on top" : "underneath"}`;
}

function upright(angleDeg: number): number {
  let a = angleDeg;
  while (a > 90) a -= 180;
  while (a <= -90) a += 180;
  return a;
}

function toMm(pts: [number, number][], f: number): Float64Array {
  const out = new Float64Array(pts.length * 2);
  for (let i = 0; i < pts.length; i++) { out[2 * i] = pts[i][0] * f; out[2 * i + 1] = pts[i][1] * f; }
  return out;
}

/** Sign (+1/−1) that turns the left normal of tangent t at point p into the inward normal of the outline. */
function inwardSign(outline: Float64Array, x: number, y: number, tx: number, ty: number): number {
  for (const d of [0.5, 1.5, 4]) {
    const inL = pointInPolygon(outline, x - ty * d, y + tx * d);
    const inR = pointInPolygon(outline, x + ty * d, y - tx * d);
    if (inL !== inR) return inL ? 1 : -1;
  }
  return 1;
}

function layoutPiece(p: PieceReport, index: number, f: number, materialText: string, thicknessMm: number): LayoutPiece {
  let outline = toMm(p.outline, f);
  if (polygonSignedArea(outline) < 0) {
    // Keep a consistent orientation for the area and the normals even if a report lists a piece clockwise.
    const rev = new Float64Array(outline.length);
    const n = outline.length / 2;
    for (let i = 0; i < n; i++) { rev[2 * i] = outline[2 * (n - 1 - i)]; rev[2 * i + 1] = outline[2 * (n - 1 - i) + 1]; }
    outline = rev;
  }
  const box = polygonBox(outline);
  const areaMm2 = Math.abs(polygonSignedArea(outline));
  const perimeterMm = polygonPerimeter(outline);
  const lp = labelPoint(outline);
  const clearance = Math.max(lp.clearance, 1);
  // Sizes from the clearance c (radius of the free circle at the label point). Seam texts sit RUN_TEXT_INSET_MM in,
  // clear of the tick numbers; the label block keeps to the circle of radius r inside them.
  const roomy = clearance >= 16;
  const runInset = roomy ? RUN_TEXT_INSET_MM : Math.max(3, clearance * 0.3);
  const r = roomy ? Math.max(clearance - RUN_TEXT_INSET_MM - 1.5, clearance * 0.35) : clearance * 0.6;
  const labelSizeMm = Math.min(30, Math.max(4, r * 0.75));
  const infoSizeMm = Math.min(4, Math.max(1.8, r * 0.13));

  const ticks: TickMark[] = p.ticks.map((t) => {
    const len = Math.hypot(t.nx, t.ny) || 1;
    const nx = t.nx / len, ny = t.ny / len;
    const x0 = t.x * f, y0 = t.y * f;
    return {
      run: t.run, number: t.number, x0, y0,
      x1: x0 + nx * TICK_LENGTH_MM, y1: y0 + ny * TICK_LENGTH_MM,
      numX: x0 + nx * (TICK_LENGTH_MM + 2.2), numY: y0 + ny * (TICK_LENGTH_MM + 2.2),
    };
  });

  const runs: RunMark[] = [];
  for (const b of p.bevels) {
    const path = toMm(b.path, f);
    if (path.length < 4) continue;
    const L = polylineLength(path);
    if (!(L > 0)) continue;
    const inset = runInset;
    const labels: RunLabel[] = [];
    const copies = Math.max(1, Math.round(L / RUN_TEXT_REPEAT_MM));
    for (let k = 0; k < copies; k++) {
      const at = pointAlongPolyline(path, (L * (k + 0.5)) / copies);
      const sgn = inwardSign(outline, at.x, at.y, at.tx, at.ty);
      labels.push({
        x: at.x - at.ty * sgn * inset, y: at.y + at.tx * sgn * inset,
        angleDeg: upright((Math.atan2(at.ty, at.tx) * 180) / Math.PI),
      });
    }
    const text = `joins ${b.neighbor}, ${bevelText(b)}`;
    const chevrons: Chevron[] = [];
    if (b.kind !== "straight" && b.opensTo !== "none") {
      const count = Math.max(1, Math.round(L / 35));
      const runTicks = ticks.filter((t) => t.run === b.run);
      for (let k = 0; k < count; k++) {
        const s = (L * (k + 0.5)) / count + (count === 1 ? L * 0.2 : 0);
        const q = pointAlongPolyline(path, Math.min(s, L));
        if (runTicks.some((t) => Math.hypot(t.x0 - q.x, t.y0 - q.y) < 3)) continue;
        const s2 = inwardSign(outline, q.x, q.y, q.tx, q.ty);
        const nx = -q.ty * s2, ny = q.tx * s2;
        const filled = b.opensTo === "outer";
        const near = 1, far = 3.5, half = 1.8;
        const apexD = filled ? near : far, baseD = filled ? far : near;
        chevrons.push({
          apexX: q.x + nx * apexD, apexY: q.y + ny * apexD,
          ax: q.x + nx * baseD + q.tx * half, ay: q.y + ny * baseD + q.ty * half,
          bx: q.x + nx * baseD - q.tx * half, by: q.y + ny * baseD - q.ty * half,
          filled,
        });
      }
    }
    runs.push({ run: b.run, neighbor: b.neighbor, kind: b.kind, opensTo: b.opensTo, bevelDeg: b.bevelDeg, text, labels, chevrons });
  }

  return {
    label: p.label, index, report: p, outline, box, areaMm2, perimeterMm,
    labelX: lp.x, labelY: lp.y, labelSizeMm, infoSizeMm,
    infoLines: [cutCountText(p), `area ${formatArea(areaMm2)}`, `${materialText} ${formatLength(thicknessMm)}`],
    ticks, runs,
  };
}

/** Builds the millimetre layout of the report's pieces. */
export function buildLayout(report: FlattenReport, materialText: string, thicknessMm: number): PatternLayout {
  const f = MM_PER_UNIT[report.units];
  const pieces: LayoutPiece[] = [];
  const skipped: PatternLayout["skipped"] = [];
  for (const [index, p] of report.pieces.entries()) {
    if (!p.flattenable || p.outline.length < 3) {
      skipped.push({ piece: p, reason: p.problem ?? "it could not be flattened" });
      continue;
    }
    if (p.count === 0) {
      const twin = mirrorOfLabel(p);
      skipped.push({ piece: p, reason: twin ? `it is cut as the mirrored copy of ${twin} (see ${twin}: cut 2, one mirrored)` : "its count is 0" });
      continue;
    }
    pieces.push(layoutPiece(p, index, f, materialText, thicknessMm));
  }
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const p of pieces) {
    minX = Math.min(minX, p.box.minX); minY = Math.min(minY, p.box.minY);
    maxX = Math.max(maxX, p.box.maxX); maxY = Math.max(maxY, p.box.maxY);
  }
  if (pieces.length === 0) { minX = 0; minY = 0; maxX = 100; maxY = 100; }
  const box = { minX: minX - SHEET_PADDING_MM, minY: minY - SHEET_PADDING_MM, maxX: maxX + SHEET_PADDING_MM, maxY: maxY + SHEET_PADDING_MM };
  return { pieces, skipped, box, widthMm: box.maxX - box.minX, heightMm: box.maxY - box.minY, mmPerUnit: f };
}
