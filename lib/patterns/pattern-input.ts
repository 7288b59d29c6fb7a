/**
 * Input of the pattern document writers (PDF and SVG): the flatten report plus project metadata and, optionally,
 * the working mesh with its face → piece map for the assembly views.
 */
import type { FlattenReport } from "@/lib/geometry/report-types";
import { GeometryError } from "@/lib/geometry/errors";
import { LENGTH_UNITS } from "@/lib/geometry/mesh";
import { PAPER_IDS, type PaperId } from "./paper-sizes";

export interface PatternMeta {
  projectName: string;
  scanName: string;
  /** foam material: an id or name from FOAM_MATERIALS, or free text */
  material: string;
  thicknessMm: number;
  /** when the pattern was made (Date or ISO 8601 text); printed as YYYY-MM-DD and used as the PDF creation date */
  createdAt: Date | string;
}

export interface PatternAssembly {
  /** #V×3 working-mesh positions (any unit: only the shape is drawn) */
  positions: Float64Array;
  /** #F×3 vertex indices */
  triangles: Uint32Array;
  /** #F face → index into `labels`, −1 = no piece */
  facePiece: Int32Array;
  /** piece labels by piece index */
  labels: string[];
}

export interface PatternInput {
  report: FlattenReport;
  meta: PatternMeta;
  assembly?: PatternAssembly;
}

export interface PatternPdfOptions {
  paper: PaperId;
  /** duplicated band between neighbouring tiles, millimetres (default 10; 0 … 40) */
  overlapMm?: number;
  /** compress content streams (default true); tests turn it off to read the drawing operators */
  compress?: boolean;
}

export const DEFAULT_OVERLAP_MM = 10;
export const MAX_OVERLAP_MM = 40;

function bad(message: string): never {
  throw new GeometryError("BAD_PARAMETER", message);
}

function finite(v: unknown): boolean {
  return typeof v === "number" && Number.isFinite(v);
}

/** The creation date as a Date; throws on an unreadable date. */
export function createdAtDate(meta: PatternMeta): Date {
  const d = meta.createdAt instanceof Date ? meta.createdAt : new Date(meta.createdAt);
  if (Number.isNaN(d.getTime())) bad(`meta.createdAt is not a date: ${String(meta.createdAt)}`);
  return d;
}

/**
 * Checks the input the writers rely on and throws GeometryError("BAD_PARAMETER") with one sentence naming the
 * field otherwise. The report itself is trusted to follow report-types.ts; only what would make a drawing wrong
 * (non-finite coordinates, unknown units, inconsistent assembly arrays) is checked.
 */
export function validatePatternInput(input: PatternInput): void {
  if (!input || typeof input !== "object") bad("pattern input must be an object");
  const { report, meta, assembly } = input;
  if (!report || !Array.isArray(report.pieces)) bad("report.pieces must be an array");
  if (!LENGTH_UNITS.includes(report.units)) bad(`report.units must be one of ${LENGTH_UNITS.join(", ")}`);
  if (!meta || typeof meta.projectName !== "string" || typeof meta.scanName !== "string" || typeof meta.material !== "string")
    bad("meta.projectName, meta.scanName and meta.material must be text");
  if (!finite(meta.thicknessMm) || meta.thicknessMm <= 0) bad("meta.thicknessMm must be a positive number of millimetres");
  createdAtDate(meta);
  for (const p of report.pieces) {
    if (typeof p.label !== "string" || p.label.length === 0) bad("every piece needs a label");
    if (!Array.isArray(p.outline)) bad(`piece ${p.label}: outline must be an array of [x, y]`);
    if (p.flattenable && p.outline.length < 3) bad(`piece ${p.label}: outline needs at least 3 points`);
    for (const pt of p.outline) if (!finite(pt[0]) || !finite(pt[1])) bad(`piece ${p.label}: outline has a non-finite coordinate`);
    for (const t of p.ticks) if (!finite(t.x) || !finite(t.y) || !finite(t.nx) || !finite(t.ny)) bad(`piece ${p.label}: tick ${t.number} has a non-finite coordinate`);
    for (const b of p.bevels) for (const pt of b.path) if (!finite(pt[0]) || !finite(pt[1])) bad(`piece ${p.label}: seam run ${b.run} has a non-finite coordinate`);
    if (!Number.isInteger(p.count) || p.count < 0) bad(`piece ${p.label}: count must be a whole number (0 = cut as another piece's mirrored copy)`);
  }
  const labels = new Set<string>();
  for (const p of report.pieces) {
    if (labels.has(p.label)) bad(`piece label ${p.label} appears twice`);
    labels.add(p.label);
  }
  if (assembly) {
    const nv = assembly.positions.length / 3;
    const nf = assembly.triangles.length / 3;
    if (!Number.isInteger(nv) || !Number.isInteger(nf)) bad("assembly.positions and assembly.triangles must hold 3 numbers per entry");
    if (assembly.facePiece.length !== nf) bad(`assembly.facePiece has ${assembly.facePiece.length} entries for ${nf} faces`);
    for (let i = 0; i < assembly.triangles.length; i++) if (assembly.triangles[i] >= nv) bad(`assembly.triangles refers to vertex ${assembly.triangles[i]} of ${nv}`);
    for (let f = 0; f < nf; f++) if (assembly.facePiece[f] >= assembly.labels.length) bad(`assembly.facePiece[${f}] has no label`);
  }
}

/** Checks the PDF options and returns the overlap in millimetres. */
export function validatePdfOptions(opts: PatternPdfOptions): number {
  if (!opts || !PAPER_IDS.includes(opts.paper)) bad(`paper must be one of ${PAPER_IDS.join(", ")}`);
  const overlap = opts.overlapMm ?? DEFAULT_OVERLAP_MM;
  if (!finite(overlap) || overlap < 0 || overlap > MAX_OVERLAP_MM) bad(`overlapMm must be between 0 and ${MAX_OVERLAP_MM} millimetres`);
  return overlap;
}
