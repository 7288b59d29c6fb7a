/**
 * The flatten pipeline: working mesh + seams → pattern report and per-piece arrays.
 *
 * thickness offset (neutral surface) → cutPieces → flattenPiece per disk piece → scale to final size and output
 * units → layout on the sheet → seam runs, bevels, registration ticks, neighbour letters → FlattenReport.
 * Lengths in the report are in `units` at final size. Pieces that are not disks are reported (flattenable false,
 * problem, suggestedCut in input-file vertex ids) and not flattened; the run still succeeds.
 */
import { GeometryError, isGeometryError } from "../errors";
import type { LengthUnit } from "../mesh";
import type { FlattenReport, PieceReport, StretchMetrics } from "../report-types";
import type { IntakeResult } from "../intake/read-mesh";
import { cutPieces } from "../topology/cut-pieces";
import type { PieceMesh } from "../topology/piece-mesh";
import { flattenPiece, type FlatPiece } from "../flatten/flatten-piece";
import { computeScale, referencedBoxSize } from "../scale/compute-scale";
import { neutralSurface } from "../thickness/neutral-surface";
import { seamEdgeFaces } from "../marks/seam-edge-faces";
import { dihedralAngles } from "../marks/dihedral-angles";
import { buildSeamRuns } from "../marks/seam-runs";
import { pieceFaceIndex } from "../marks/piece-face-index";
import { seamMarks, type SeamBevelRun } from "../marks/seam-marks";
import { boundaryLoops } from "../layout/boundary-loops";
import { layoutPieces } from "../layout/layout-pieces";
import { mirrorTwins, pieceMoments } from "../layout/mirror-plane";
import { DEFAULT_GAP_MM, DEFAULT_TICK_SPACING_MM, parseFlattenOptions, resolveLength, type FlattenOptions, type FlattenOptionsInput } from "./flatten-options";
import { MM_PER_UNIT } from "../mesh";

/** Typed arrays of one piece, for heat maps and documents. */
export interface FlattenedPiece {
  label: string;
  flattenable: boolean;
  /** #F working face ids; local face i = faces[i] */
  faces: Uint32Array;
  /** #V local → working vertex id */
  vertexIds: Uint32Array;
  /** #F×3 local faces, counter-clockwise on the sheet */
  triangles: Uint32Array;
  /** #V×2 laid-out coordinates on the sheet, output units at final size; null when not flattened */
  uv: Float64Array | null;
  /** #F singular values of each triangle's 3D→2D map (s1 ≥ s2; 1 = no distortion); null when not flattened */
  triangleS1: Float64Array | null;
  triangleS2: Float64Array | null;
}

/** Report piece plus Peelform's extra fields. */
export interface PipelinePieceReport extends PieceReport {
  bevels: SeamBevelRun[];
  /** label of the piece this one is the mirror image of (count 0: it is cut as that piece's mirrored copy) */
  mirrorOf: string | null;
}

/** FlattenReport with the extra piece fields (still assignable to FlattenReport). */
export interface PipelineReport extends Omit<FlattenReport, "pieces"> {
  pieces: PipelinePieceReport[];
}

export interface FlattenResult {
  report: PipelineReport;
  pieces: FlattenedPiece[];
  /** #F working face → piece index, −1 none */
  facePiece: Int32Array;
}

/** Distance of the neighbour letter from its seam. // Common practice: letters about half an inch in from the edge. */
const LETTER_INSET_MM = 12;

const percent = (x: number): string => `${(x * 100).toFixed(1)} %`;

/**
 * @param intake      working mesh, its report and the input → working vertex map (readMesh)
 * @param seamEdges   2 per seam edge, working vertex ids (resolveSeams)
 * @param optsInput   FlattenOptions (validated here again, so raw job payloads are safe)
 * @param onProgress  (step, overall fraction 0…1); "flatten" is reported once per piece
 * @throws GeometryError BAD_PARAMETER for bad options; never for a valid mesh with awkward pieces
 */
export function flattenMesh(
  intake: IntakeResult,
  seamEdges: Uint32Array,
  optsInput: FlattenOptions | FlattenOptionsInput,
  onProgress?: (step: string, fraction: number) => void,
): FlattenResult {
  const t0 = performance.now();
  const opts = parseFlattenOptions(optsInput);
  const progress = onProgress ?? (() => {});
  const scanUnits = intake.report.units;
  const units: LengthUnit = opts.units ?? scanUnits;
  const { mesh } = intake;
  const nv = mesh.positions.length / 3, nf = mesh.triangles.length / 3;
  if (nf === 0) throw new GeometryError("NO_FACES", "The mesh has no faces to flatten.");
  if (seamEdges.length % 2 !== 0) throw new GeometryError("BAD_SEAMS", "Seam edges must come in vertex pairs.");
  const warnings: string[] = [];

  // scale (from the scan as taped: its own bounding box)
  const box = referencedBoxSize(mesh.positions, mesh.triangles);
  const targetLen = resolveLength(opts.targetWidth, units, "target width");
  const scale = computeScale(box, scanUnits, units, {
    factor: opts.scale,
    target: targetLen !== undefined ? { length: targetLen, axis: opts.targetAxis } : undefined,
  });
  const cf = scale.coordinateFactor;

  // thickness: the foam thickness is a final-size length; offset in scan units
  progress("thickness", 0.01);
  const thickness = resolveLength(opts.thickness, units, "thickness") ?? 0;
  const neutral = neutralSurface(mesh.positions, mesh.triangles, thickness / cf, opts.scanFace, opts.k);
  if (neutral.invertedFaces > 0) {
    warnings.push(
      `The thickness offset turned ${neutral.invertedFaces} faces inside out: the foam (${fmt(thickness, units)}) is thicker than the ` +
        `radius of the tightest curves; check those areas or use thinner foam.`,
    );
  }
  const positions = neutral.positions;
  const working = { positions, triangles: mesh.triangles };

  // cut
  progress("cut", 0.04);
  const cut: PieceMesh[] = cutPieces(working, seamEdges);
  const { facePiece, faceLocal } = pieceFaceIndex(cut, nf);

  // flatten each disk piece
  const workingToInput = new Int32Array(nv).fill(-1);
  for (let i = 0; i < intake.inputToWorking.length; i++) {
    const w = intake.inputToWorking[i];
    if (w < nv && workingToInput[w] < 0) workingToInput[w] = i;
  }
  const totalDiskFaces = cut.reduce((s, p) => s + (p.topology.isDisk ? p.faces.length : 0), 0) || 1;
  let doneFaces = 0;
  const flats: (FlatPiece | null)[] = [];
  const problems: (string | null)[] = [];
  for (const p of cut) {
    if (!p.topology.isDisk) {
      flats.push(null);
      problems.push(p.topology.problem ?? `Piece ${p.label} is not a disk and cannot be flattened.`);
      warnings.push(`Piece ${p.label} was not flattened: ${p.topology.problem ?? "it is not a disk."}`);
      continue;
    }
    try {
      const flat = flattenPiece(p, { refine: opts.refine });
      orientCounterClockwise(flat.uv, p.triangles);
      flats.push(flat);
      problems.push(null);
    } catch (e) {
      if (!isGeometryError(e)) throw e;
      flats.push(null);
      problems.push(`The flattening of piece ${p.label} failed (${e.message}); add a seam to split it.`);
      warnings.push(`Piece ${p.label} was not flattened: ${e.message}`);
    }
    doneFaces += p.faces.length;
    progress("flatten", 0.05 + 0.85 * (doneFaces / totalDiskFaces));
  }

  // mirror twins (in scan coordinates, on the neutral surface)
  const count = cut.map(() => 1), mirrored = cut.map(() => false), mirrorOf: (string | null)[] = cut.map(() => null);
  if (opts.mirror) {
    const moments = cut.map((p, i) => (flats[i] ? pieceMoments(positions, mesh.triangles, p.faces) : null));
    const diag = Math.hypot(box[0], box[1], box[2]);
    const tw = mirrorTwins(moments, opts.mirror, diag);
    cut.forEach((p, i) => {
      if (!flats[i]) return;
      count[i] = tw.count[i];
      mirrored[i] = tw.mirrored[i];
      if (tw.mirrorOf[i] >= 0) mirrorOf[i] = cut[tw.mirrorOf[i]].label;
    });
    if (tw.unmatched.length > 0) {
      warnings.push(
        `No mirror twin across the ${opts.mirror.axis} = ${opts.mirror.offset} plane for piece${tw.unmatched.length > 1 ? "s" : ""} ` +
          `${tw.unmatched.map((i) => cut[i].label).join(", ")}; ${tw.unmatched.length > 1 ? "they are" : "it is"} cut once.`,
      );
    }
  }

  // scale to output units, then lay out
  progress("layout", 0.92);
  const mm = MM_PER_UNIT[units];
  const gap = resolveLength(opts.gap, units, "gap", DEFAULT_GAP_MM)!;
  const sheetWidth = resolveLength(opts.sheetWidth, units, "sheet width");
  const flatIdx = cut.map((_, i) => i).filter((i) => flats[i] !== null);
  const laid = layoutPieces(
    flatIdx.map((i) => {
      const src = flats[i]!.uv, uv = new Float64Array(src.length);
      for (let j = 0; j < src.length; j++) uv[j] = src[j] * cf;
      return { uv, triangles: cut[i].triangles, onSheet: count[i] > 0 };
    }),
    { gap, sheetWidth },
  );
  const laidOf = new Map<number, (typeof laid)[number]>();
  flatIdx.forEach((i, k) => laidOf.set(i, laid[k]));

  // seams: runs, bevels, ticks, letters
  progress("marks", 0.96);
  const sef = seamEdgeFaces(mesh.triangles, nv, seamEdges);
  if (sef.duplicates > 0) warnings.push(`${sef.duplicates} seam edge${sef.duplicates > 1 ? "s were" : " was"} listed twice; counted once.`);
  let border = 0;
  for (let e = 0; e < sef.count; e++) if (sef.faceAB[e] < 0 || sef.faceBA[e] < 0) border++;
  if (border > 0) warnings.push(`${border} seam edge${border > 1 ? "s lie" : " lies"} on the open border of the mesh and cut nothing.`);
  if (sef.nonManifold > 0) warnings.push(`${sef.nonManifold} seam edge${sef.nonManifold > 1 ? "s touch" : " touches"} more than two faces; extra faces were ignored for bevels.`);
  const runs = buildSeamRuns(sef, facePiece, nv);
  // angles from the scanned surface (the form the foam goes on); lengths from the neutral surface (what is cut)
  const dihedral = dihedralAngles(mesh.positions, mesh.triangles, sef.a, sef.b, sef.faceAB, sef.faceBA);
  const tickSpacing = resolveLength(opts.tickSpacing, units, "tick spacing", DEFAULT_TICK_SPACING_MM)!;
  const inset = new Float64Array(cut.length);
  cut.forEach((_, i) => {
    const l = laidOf.get(i);
    inset[i] = l ? Math.min(LETTER_INSET_MM / mm, 0.15 * Math.min(l.placement.width, l.placement.height)) : 0;
  });
  const marks = seamMarks({
    positions,
    sef,
    runs,
    dihedral,
    facePiece,
    faceLocal,
    pieces: cut.map((p, i) => ({ label: p.label, uv: laidOf.get(i)?.uv ?? null, triangles: p.triangles, vertexIds: p.vertexIds })),
    lengthFactor: cf,
    tickSpacing,
    letterInset: inset,
    straightThresholdDeg: opts.straightBevelDeg,
  });

  // report
  const pieceReports: PipelinePieceReport[] = [];
  const pieceArrays: FlattenedPiece[] = [];
  cut.forEach((p, i) => {
    const flat = flats[i];
    const l = laidOf.get(i);
    const area3d = surfaceArea(p.positions, p.triangles) * cf * cf;
    const loops = boundaryLoops(p.triangles, p.positions.length / 3);
    const outer = l ? l.outlineLoop : null;
    const bl3 = outer ? loopLength3d(p.positions, outer) * cf : loops.reduce((s, lp) => s + loopLength3d(p.positions, lp), 0) * cf;
    const bl2 = l && outer ? loopLength2d(l.uv, outer) : 0;
    const suggested = p.topology.suggestedCut?.map(([a, b]) => [workingToInput[a], workingToInput[b]] as [number, number]) ?? null;
    if (flat) checkStretch(p.label, flat.metrics, opts.stretchLimit, warnings);
    if (flat && (!flat.solver.lscm.converged || !flat.solver.refine.converged)) {
      warnings.push(`The solver for piece ${p.label} stopped before converging (residual ${flat.solver.refine.residual.toExponential(2)}); its stretch figures are what it reached.`);
    }
    pieceReports.push({
      label: p.label,
      faces: p.faces.length,
      vertices: p.vertexIds.length,
      flattenable: flat !== null,
      problem: problems[i],
      suggestedCut: flat ? null : suggested,
      area3d,
      area2d: l ? Math.abs(surfaceArea2d(l.uv, p.triangles)) : 0,
      boundaryLength3d: bl3,
      boundaryLength2d: bl2,
      metrics: flat?.metrics ?? null,
      lscmMetrics: flat?.lscmMetrics ?? null,
      solver: { lscm: flat?.solver.lscm ?? null, refine: flat?.solver.refine ?? null },
      outline: l ? l.outline : [],
      placement: l ? l.placement : { x: 0, y: 0, rotationDeg: 0, width: 0, height: 0 },
      bevels: marks.bevels[i],
      ticks: marks.ticks[i],
      count: count[i],
      mirrored: mirrored[i],
      mirrorOf: mirrorOf[i],
    });
    pieceArrays.push({
      label: p.label,
      flattenable: flat !== null,
      faces: p.faces,
      vertexIds: p.vertexIds,
      triangles: p.triangles,
      uv: l ? l.uv : null,
      triangleS1: flat?.triangleS1 ?? null,
      triangleS2: flat?.triangleS2 ?? null,
    });
  });
  if (intake.report.decimated) {
    const d = intake.report.decimated;
    warnings.unshift(
      `The mesh has ${d.originalFaces} faces, over the budget of ${d.faceBudget}: a simplified copy with ${d.workingFaces} faces ` +
        `(largest deviation ${fmt(d.maxError * MM_PER_UNIT[scanUnits] / mm * scale.factor, units)} at final size) was flattened.`,
    );
  }
  const flattenMs = performance.now() - t0;
  progress("done", 1);
  return {
    report: {
      units,
      scale: { factor: scale.factor, percent: scale.percent, targetWidth: scale.targetWidth },
      surface: {
        kind: thickness > 0 ? "neutral" : "scan",
        thickness,
        scanFace: opts.scanFace,
        k: opts.k,
        offset: neutral.offset * cf,
      },
      mesh: intake.report,
      pieces: pieceReports,
      warnings,
      // parseMs is the caller's (intake happens before this call); callers that parse fill it in
      timing: { parseMs: 0, flattenMs, totalMs: flattenMs },
    },
    pieces: pieceArrays,
    facePiece,
  };
}

function fmt(x: number, units: LengthUnit): string {
  return `${Number(x.toPrecision(3))} ${units}`;
}

function checkStretch(label: string, m: StretchMetrics, limit: number, warnings: string[]): void {
  if (m.maxStretch > limit || m.maxCompress > limit) {
    warnings.push(
      `Piece ${label} stretches up to ${percent(m.maxStretch)} and compresses up to ${percent(m.maxCompress)} ` +
        `(95 % of its area within ${percent(m.p95Stretch)}), more than the ${percent(limit)} the material allows: add a dart or a seam there.`,
    );
  }
  if (m.flippedTriangles > 0) {
    warnings.push(`Piece ${label} has ${m.flippedTriangles} folded-over triangles in its pattern: add a seam through the fold.`);
  }
}

/** Mirror the flat map if it came out clockwise (a reflection is as good a flattening; outlines must be CCW). */
function orientCounterClockwise(uv: Float64Array, triangles: Uint32Array): void {
  if (surfaceArea2d(uv, triangles) >= 0) return;
  for (let i = 0; i < uv.length; i += 2) uv[i] = -uv[i];
}

function surfaceArea(p: Float64Array, t: Uint32Array): number {
  let s = 0;
  for (let f = 0; f < t.length; f += 3) {
    const a = 3 * t[f], b = 3 * t[f + 1], c = 3 * t[f + 2];
    const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
    const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
    s += Math.hypot(uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx) / 2;
  }
  return s;
}

/** Signed area of the flat image (positive = counter-clockwise). */
function surfaceArea2d(uv: Float64Array, t: Uint32Array): number {
  let s = 0;
  for (let f = 0; f < t.length; f += 3) {
    const a = 2 * t[f], b = 2 * t[f + 1], c = 2 * t[f + 2];
    s += ((uv[b] - uv[a]) * (uv[c + 1] - uv[a + 1]) - (uv[c] - uv[a]) * (uv[b + 1] - uv[a + 1])) / 2;
  }
  return s;
}

function loopLength3d(p: Float64Array, loop: Uint32Array): number {
  let s = 0;
  for (let i = 0; i < loop.length; i++) {
    const a = 3 * loop[i], b = 3 * loop[(i + 1) % loop.length];
    s += Math.hypot(p[b] - p[a], p[b + 1] - p[a + 1], p[b + 2] - p[a + 2]);
  }
  return s;
}

function loopLength2d(uv: Float64Array, loop: Uint32Array): number {
  let s = 0;
  for (let i = 0; i < loop.length; i++) {
    const a = 2 * loop[i], b = 2 * loop[(i + 1) % loop.length];
    s += Math.hypot(uv[b] - uv[a], uv[b + 1] - uv[a + 1]);
  }
  return s;
}


/** Compile-time check that the extended report stays a FlattenReport. */
export const asFlattenReport = (r: PipelineReport): FlattenReport => r;
