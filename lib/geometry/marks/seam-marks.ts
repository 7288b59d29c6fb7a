/**
 * Bevels, registration ticks and neighbour letters along every seam run, on both pieces of the run.
 *
 * Tick rule: a run of length L (final size) gets n = floor(L / spacing) ticks, numbered 1…n from the run's start, at
 * arc lengths (i − ½)·L/n measured on the 3D seam. Each tick is placed on both pieces at the same point of the same
 * seam edge (same edge, same fraction along it), so the two pieces line up where the seam was in 3D; the 2D arc
 * lengths then agree up to the flattening stretch. A run shorter than the spacing gets no tick: the neighbour letter
 * alone registers it. // Common practice: registration ticks every few inches (50 mm default), numbered per seam.
 */
import type { BevelRun, Tick } from "../report-types";
import { bevelFromDihedral, classifyBevel } from "./bevel-kind";
import type { SeamEdgeFaces } from "./seam-edge-faces";
import { runEdgeFace, runVertices, type SeamRuns } from "./seam-runs";

/** Where to write the neighbour's letter along a run: inside the piece, reading along the seam, top to the seam. */
export interface NeighborLetter {
  text: string;
  x: number;
  y: number;
  /** unit baseline direction of the text (layout coordinates); the top of the letters points to the seam */
  dx: number;
  dy: number;
}

/** BevelRun plus Peelform's extra fields (kept JSON-compatible with the report contract). */
export interface SeamBevelRun extends BevelRun {
  /** 0: this piece lies left of the run's walking direction (seen from outside), 1: right */
  side: 0 | 1;
  letter: NeighborLetter;
  /** number of registration ticks on the run (the same on both sides) */
  tickCount: number;
}

export interface MarkPiece {
  label: string;
  /** #V×2 laid-out coordinates, output units; null when the piece was not flattened */
  uv: Float64Array | null;
  /** #F×3 local faces; face i is working face `faces[i]` */
  triangles: Uint32Array;
  /** local → working vertex id */
  vertexIds: Uint32Array;
}

export interface SeamMarksInput {
  /** #V×3 working positions of the surface that was flattened, scan units */
  positions: Float64Array;
  sef: SeamEdgeFaces;
  runs: SeamRuns;
  /** #E outside dihedral angle per seam edge, degrees */
  dihedral: Float64Array;
  facePiece: Int32Array;
  /** working face → local face index in its piece */
  faceLocal: Int32Array;
  pieces: MarkPiece[];
  /** scan units → output units at final size */
  lengthFactor: number;
  /** tick spacing, output units */
  tickSpacing: number;
  /** distance of the neighbour letter from the seam, output units (one value, or one per piece) */
  letterInset: number | Float64Array;
  /** |bevel| below which a seam is straight, degrees */
  straightThresholdDeg?: number;
}

export interface SeamMarks {
  /** per piece */
  bevels: SeamBevelRun[][];
  ticks: Tick[][];
}

/** Builds the marks of every run. Allocation here is per run, not per face. */
export function seamMarks(inp: SeamMarksInput): SeamMarks {
  const { positions, sef, runs, dihedral, pieces, lengthFactor } = inp;
  const bevels: SeamBevelRun[][] = pieces.map(() => []);
  const ticks: Tick[][] = pieces.map(() => []);
  for (let r = 0; r < runs.count; r++) {
    const s = runs.edgeStart[r], n = runs.edgeStart[r + 1] - s;
    const verts = runVertices(runs, sef, r);
    // cumulative 3D arc length, output units at final size
    const cum = new Float64Array(n + 1);
    let wsum = 0, dsum = 0;
    for (let i = 0; i < n; i++) {
      const p = verts[i] * 3, q = verts[i + 1] * 3;
      const len = Math.hypot(positions[q] - positions[p], positions[q + 1] - positions[p + 1], positions[q + 2] - positions[p + 2]) * lengthFactor;
      cum[i + 1] = cum[i] + len;
      const d = dihedral[runs.edges[s + i]];
      if (Number.isFinite(d)) {
        wsum += len;
        dsum += len * d;
      }
    }
    const length = cum[n];
    const dihedralDeg = wsum > 0 ? dsum / wsum : 180;
    const bevelDeg = bevelFromDihedral(dihedralDeg);
    const { kind, opensTo } = classifyBevel(dihedralDeg, inp.straightThresholdDeg);
    const tickCount = inp.tickSpacing > 0 ? Math.floor(length / inp.tickSpacing + 1e-9) : 0;
    const sidePieces = [runs.pieceL[r], runs.pieceR[r]];
    for (const side of [0, 1] as const) {
      const pi = sidePieces[side];
      const piece = pieces[pi];
      if (!piece || !piece.uv) continue;
      const uv = piece.uv;
      const local = sideLocalVertices(inp, s, n, verts, side, piece);
      const path: [number, number][] = new Array(n + 1);
      for (let i = 0; i <= n; i++) path[i] = [uv[2 * local[i]], uv[2 * local[i] + 1]];
      const neighbor = pieces[sidePieces[1 - side]]?.label ?? "?";
      const at = (arc: number): { x: number; y: number; tx: number; ty: number } => {
        let k = 0;
        while (k < n - 1 && cum[k + 1] < arc) k++;
        const segLen = cum[k + 1] - cum[k];
        const u = segLen > 0 ? Math.min(1, Math.max(0, (arc - cum[k]) / segLen)) : 0;
        const [x0, y0] = path[k], [x1, y1] = path[k + 1];
        let tx = x1 - x0, ty = y1 - y0;
        const tl = Math.hypot(tx, ty) || 1;
        tx /= tl;
        ty /= tl;
        return { x: x0 + u * (x1 - x0), y: y0 + u * (y1 - y0), tx, ty };
      };
      // Inward normal: the piece is left of the walking direction on side 0, right of it on side 1.
      const inward = (tx: number, ty: number): [number, number] => (side === 0 ? [-ty, tx] : [ty, -tx]);
      for (let i = 1; i <= tickCount; i++) {
        const p = at(((i - 0.5) * length) / tickCount);
        const [nx, ny] = inward(p.tx, p.ty);
        ticks[pi].push({ run: r + 1, number: i, x: p.x, y: p.y, nx, ny });
      }
      const mid = at(length / 2);
      const [mx, my] = inward(mid.tx, mid.ty);
      // Baseline so that the letters' top (baseline turned +90°) points outward, to the seam.
      const inset = typeof inp.letterInset === "number" ? inp.letterInset : inp.letterInset[pi];
      const letter: NeighborLetter = {
        text: neighbor,
        x: mid.x + inset * mx,
        y: mid.y + inset * my,
        dx: -my,
        dy: mx,
      };
      bevels[pi].push({ run: r + 1, neighbor, length, dihedralDeg, bevelDeg, kind, opensTo, path, side, letter, tickCount });
    }
  }
  return { bevels, ticks };
}

/** Local vertex ids of the run on one side (#edges+1). */
function sideLocalVertices(inp: SeamMarksInput, s: number, n: number, verts: Uint32Array, side: 0 | 1, piece: MarkPiece): Int32Array {
  const out = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    const f = runEdgeFace(inp.runs, inp.sef, s + i, side);
    const lf = inp.faceLocal[f];
    out[i] = localCorner(piece, lf, verts[i]);
    if (i === n - 1) out[n] = localCorner(piece, lf, verts[n]);
  }
  return out;
}

function localCorner(piece: MarkPiece, lf: number, working: number): number {
  for (let c = 0; c < 3; c++) {
    const l = piece.triangles[3 * lf + c];
    if (piece.vertexIds[l] === working) return l;
  }
  throw new Error(`piece ${piece.label}: face ${lf} has no corner for vertex ${working}`);
}
