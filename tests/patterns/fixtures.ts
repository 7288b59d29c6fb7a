/**
 * Builders for FlattenReport fixtures used by the pattern-document tests and the documents benchmark.
 * Shapes are exact (rectangles, regular polygons) so sizes can be checked against closed-form values.
 */
import type { BevelRun, FlattenReport, PieceReport, StretchMetrics, Tick } from "@/lib/geometry/report-types";
import type { LengthUnit } from "@/lib/geometry/mesh";
import type { PatternAssembly, PatternInput } from "@/lib/patterns/pattern-input";

export function metrics(maxStretch = 0.01): StretchMetrics {
  return { maxStretch, p95Stretch: maxStretch * 0.6, maxCompress: maxStretch * 0.5, meanConformal: 1.01, maxConformal: 1.05, flippedTriangles: 0 };
}

export function labelOf(i: number): string {
  let s = "";
  let n = i;
  do { s = String.fromCharCode(65 + (n % 26)) + s; n = Math.floor(n / 26) - 1; } while (n >= 0);
  return s;
}

/** Ticks evenly along a straight segment (a → b) with inward normal n, numbered 1…count. */
export function ticksAlong(run: number, a: [number, number], b: [number, number], n: [number, number], count: number): Tick[] {
  const out: Tick[] = [];
  for (let k = 1; k <= count; k++) {
    const t = k / (count + 1);
    out.push({ run, number: k, x: a[0] + t * (b[0] - a[0]), y: a[1] + t * (b[1] - a[1]), nx: n[0], ny: n[1] });
  }
  return out;
}

export function piece(label: string, outline: [number, number][], extra: Partial<PieceReport> = {}): PieceReport {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity, area = 0, perim = 0;
  for (let i = 0; i < outline.length; i++) {
    const [x, y] = outline[i];
    const [x2, y2] = outline[(i + 1) % outline.length];
    minX = Math.min(minX, x); maxX = Math.max(maxX, x); minY = Math.min(minY, y); maxY = Math.max(maxY, y);
    area += x * y2 - x2 * y; perim += Math.hypot(x2 - x, y2 - y);
  }
  return {
    label, faces: 200, vertices: 121, flattenable: true, problem: null, suggestedCut: null,
    area3d: area / 2, area2d: area / 2, boundaryLength3d: perim, boundaryLength2d: perim,
    metrics: metrics(), lscmMetrics: metrics(0.02),
    solver: { lscm: { converged: true, iterations: 40, residual: 1e-9, ms: 3 }, refine: { converged: true, iterations: 12, residual: 1e-6, ms: 5 } },
    outline, placement: { x: minX, y: minY, rotationDeg: 0, width: maxX - minX, height: maxY - minY },
    bevels: [], ticks: [], count: 1, mirrored: false,
    ...extra,
  };
}

/**
 * The stretchout of a cylinder cut along one seam: a 2πr × h rectangle whose left and right edges are the same seam
 * run (the piece joins itself), with `ticks` registration ticks on each of those edges.
 * Source: lateral surface of a right circular cylinder unrolls to a rectangle 2πr by h (developable surface).
 */
export function cylinderStretchout(opts: { radius: number; height: number; x?: number; y?: number; label?: string; ticks?: number }): PieceReport {
  const w = 2 * Math.PI * opts.radius, h = opts.height, x = opts.x ?? 0, y = opts.y ?? 0;
  const label = opts.label ?? "A";
  const n = opts.ticks ?? 3;
  const left: BevelRun = { run: 0, neighbor: label, length: h, dihedralDeg: 180, bevelDeg: 0, kind: "straight", opensTo: "none", path: [[x, y + h], [x, y]] };
  const right: BevelRun = { ...left, path: [[x + w, y], [x + w, y + h]] };
  return piece(label, [[x, y], [x + w, y], [x + w, y + h], [x, y + h]], {
    bevels: [left, right],
    ticks: [...ticksAlong(0, [x, y + h], [x, y], [1, 0], n), ...ticksAlong(0, [x + w, y + h], [x + w, y], [-1, 0], n)],
  });
}

export function report(pieces: PieceReport[], units: LengthUnit = "mm", extra: Partial<FlattenReport> = {}): FlattenReport {
  return {
    units,
    scale: { factor: 2.5, percent: 250, targetWidth: 254 / (units === "in" ? 25.4 : units === "cm" ? 10 : units === "m" ? 1000 : 1) },
    surface: { kind: "neutral", thickness: 6, scanFace: "outer", k: 0.5, offset: 3 },
    mesh: {
      format: "obj", units, inputVertices: 100, inputFaces: 196, vertices: 100, faces: 196, weldedVertices: 0,
      droppedDegenerateFaces: 0, droppedDuplicateFaces: 0, components: 1, boundaryLoops: 2, nonManifoldEdges: 0,
      eulerCharacteristic: 0, bbox: { min: [0, 0, 0], max: [1, 1, 1], size: [1, 1, 1] }, decimated: null,
    },
    pieces, warnings: [], timing: { parseMs: 1, flattenMs: 2, totalMs: 3 },
    ...extra,
  };
}

/** A regular polygon with `sides` corners, circumradius r, centred at (cx, cy), counter-clockwise. */
function regular(cx: number, cy: number, r: number, sides: number, phase: number): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < sides; i++) {
    const a = phase + (2 * Math.PI * i) / sides;
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return out;
}

/**
 * `n` pieces in rows on a sheet `sheetWidthMm` wide: regular polygons (5…9 sides, 35…80 mm radius), each joined to the
 * next piece along its first edge (ridge bevel, opens to the outer face) and to the previous along its third edge
 * (valley, inner), with ticks on those edges. Every fourth piece is cut twice, one mirrored; piece 2 is over stretch.
 */
export function manyPieces(n: number, sheetWidthMm = 1200): PieceReport[] {
  const out: PieceReport[] = [];
  let x = 0, y = 0, rowH = 0;
  for (let i = 0; i < n; i++) {
    const r = 35 + ((i * 37) % 46);
    const sides = 5 + (i % 5);
    if (x + 2 * r > sheetWidthMm) { x = 0; y -= rowH + 12; rowH = 0; }
    const cx = x + r, cy = y - r;
    const outline = regular(cx, cy, r, sides, 0.3 * i);
    const label = labelOf(i);
    const bevels: BevelRun[] = [];
    const ticks: Tick[] = [];
    const edge = (k: number, run: number, neighbor: string, kind: BevelRun["kind"], opensTo: BevelRun["opensTo"], deg: number) => {
      const a = outline[k], b = outline[(k + 1) % sides];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const nx = -(b[1] - a[1]) / len, ny = (b[0] - a[0]) / len; // left normal of a CCW edge points inward
      bevels.push({ run, neighbor, length: len, dihedralDeg: 180 - 2 * deg, bevelDeg: deg, kind, opensTo, path: [a, b] });
      ticks.push(...ticksAlong(run, a, b, [nx, ny], 2));
    };
    if (i + 1 < n) edge(0, i, labelOf(i + 1), "ridge", "outer", 12 + (i % 20));
    if (i > 0) edge(2, i - 1, labelOf(i - 1), "valley", "inner", 12 + ((i - 1) % 20));
    out.push(piece(label, outline, {
      bevels, ticks,
      count: i % 4 === 3 ? 2 : 1, mirrored: i % 4 === 3,
      metrics: metrics(i === 2 ? 0.09 : 0.012 + (i % 7) * 0.003),
    }));
    x += 2 * r + 12;
    rowH = Math.max(rowH, 2 * r);
  }
  return out;
}

/** A closed cylinder-like tube mesh (radius 1, height 2) split into `pieces` vertical strips, for assembly views. */
export function tubeAssembly(pieces: number, around = 24, up = 6): PatternAssembly {
  const positions = new Float64Array(around * (up + 1) * 3);
  for (let j = 0; j <= up; j++) for (let i = 0; i < around; i++) {
    const a = (2 * Math.PI * i) / around, v = j * around + i;
    positions[3 * v] = Math.cos(a); positions[3 * v + 1] = (2 * j) / up - 1; positions[3 * v + 2] = Math.sin(a);
  }
  const tris: number[] = [];
  const fp: number[] = [];
  for (let j = 0; j < up; j++) for (let i = 0; i < around; i++) {
    const a = j * around + i, b = j * around + ((i + 1) % around), c = a + around, d = b + around;
    const p = Math.floor((i * pieces) / around);
    tris.push(a, c, b, b, c, d);
    fp.push(p, p);
  }
  return {
    positions, triangles: Uint32Array.from(tris), facePiece: Int32Array.from(fp),
    labels: Array.from({ length: pieces }, (_, i) => labelOf(i)),
  };
}

export function input(pieces: PieceReport[], extra: Partial<PatternInput> = {}, units: LengthUnit = "mm"): PatternInput {
  return {
    report: report(pieces, units),
    meta: { projectName: "Harbour Lantern Festival - Sea Serpent", scanName: "serpent-head-v3.obj", material: "eva", thicknessMm: 6, createdAt: "2026-11-30T12:00:00Z" },
    ...extra,
  };
}
