import { describe, expect, it } from "vitest";
import { flattenMesh } from "@/lib/geometry/pipeline/flatten-mesh";
import { parseFlattenOptions, resolveLength } from "@/lib/geometry/pipeline/flatten-options";
import { GeometryError } from "@/lib/geometry/errors";
import { cube } from "@/lib/geometry/shapes/cube";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import { intakeOf, seamedTube, transformed, treeCutCube } from "./fixtures";

const polygonPerimeter = (r: number, n: number): number => 2 * n * r * Math.sin(Math.PI / n);

describe("flattenMesh on a seamed cylinder", () => {
  const r = 100, height = 200, N = 64, bands = 8, t = 6;

  it("unrolls to the neutral-radius rectangle: width = perimeter at r − t/2, height = tube height", async () => {
    const { mesh, seams } = seamedTube(r, height, N, bands);
    const res = flattenMesh(await intakeOf(mesh), seams, { thickness: t, scanFace: "outer" });
    const { report } = res;
    expect(report.surface).toEqual({ kind: "neutral", thickness: 6, scanFace: "outer", k: 0.5, offset: -3 });
    expect(report.pieces.length).toBe(1);
    const p = report.pieces[0];
    expect(p.flattenable).toBe(true);
    // Source: bend allowance θ·(R + K·T) with R = r − t (inside), K = 0.5 → neutral radius r − t/2 (on the N-gon)
    expect(p.placement.width / polygonPerimeter(r - t / 2, N)).toBeCloseTo(1, 3);
    expect(p.placement.height / height).toBeCloseTo(1, 4);
    expect(p.area2d / p.area3d).toBeCloseTo(1, 4);
    expect(p.metrics!.maxStretch).toBeLessThan(1e-3);
    // outline: CCW, a rectangle's worth of boundary
    expect(p.boundaryLength2d / (2 * polygonPerimeter(r - t / 2, N) + 2 * height)).toBeCloseTo(1, 3);
    // the seam is one run with the piece itself, both sides, ticks: floor(200 / 50) = 4 per side
    expect(p.bevels.length).toBe(2);
    expect(new Set(p.bevels.map((b) => b.run)).size).toBe(1);
    expect(p.bevels.every((b) => b.neighbor === "A" && b.kind === "straight")).toBe(true);
    // a 2.8° bevel counts as a ridge when the square-cut threshold is lowered below it
    const strict = flattenMesh(await intakeOf(mesh), seams, { straightBevelDeg: 2 }).report.pieces[0];
    expect(strict.bevels.every((b) => b.kind === "ridge")).toBe(true);
    // a 64-gon turns 360/64 = 5.625° per edge: outside dihedral 185.625°
    expect(p.bevels[0].dihedralDeg).toBeCloseTo(180 + 360 / N, 6);
    expect(p.ticks.length).toBe(8);
    expect(res.pieces[0].uv!.length).toBe(2 * p.vertices);
    expect(res.facePiece.every((x) => x === 0)).toBe(true);
  });

  it("scan of the inner face offsets outward; scale by target width in other units", async () => {
    const { mesh, seams } = seamedTube(r, height, N, bands);
    // bbox width of the 64-gon along x is 2r = 200 mm; target 50 cm → ×2.5
    const res = flattenMesh(await intakeOf(mesh), seams, { units: "cm", targetWidth: "50cm", thickness: "10mm", scanFace: "inner", k: 0.4 });
    const { report } = res;
    expect(report.units).toBe("cm");
    expect(report.scale.factor).toBeCloseTo(2.5, 9);
    expect(report.scale.percent).toBe(250);
    expect(report.surface.offset).toBeCloseTo(0.4, 9);
    const p = report.pieces[0];
    // final radius 25 cm, neutral at 25 + 0.4·1 cm (inner face scanned; Source: θ·(R + K·T), R = inner radius)
    expect(p.placement.width / polygonPerimeter(25.4, N)).toBeCloseTo(1, 3);
    expect(p.placement.height).toBeCloseTo(50, 2);
    // tick spacing default 50 mm = 5 cm: floor(50 / 5) = 10 per side
    expect(p.ticks.length).toBe(20);
  });

  it("is unchanged when the mesh is moved, rotated and scaled by 1e±3 (with the scale compensated)", async () => {
    const { mesh, seams } = seamedTube(r, height, 48, 6);
    const base = flattenMesh(await intakeOf(mesh), seams, {}).report.pieces[0];
    for (const s of [1e-3, 1e3]) {
      const moved = transformed(mesh, s, 0.7, [5 * s, -300 * s, 42 * s]);
      const p = flattenMesh(await intakeOf(moved), seams, { scale: 1 / s }).report.pieces[0];
      const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
      expect(rel(p.area2d, base.area2d)).toBeLessThan(1e-5);
      expect(rel(p.area3d, base.area3d)).toBeLessThan(1e-9);
      expect(rel(p.boundaryLength2d, base.boundaryLength2d)).toBeLessThan(1e-5);
      expect(rel(p.placement.width * p.placement.height, base.placement.width * base.placement.height)).toBeLessThan(1e-4);
      expect(p.bevels.map((b) => b.length.toFixed(6))).toEqual(base.bevels.map((b) => b.length.toFixed(6)));
      expect(p.bevels.map((b) => b.dihedralDeg.toFixed(6))).toEqual(base.bevels.map((b) => b.dihedralDeg.toFixed(6)));
      expect(p.ticks.length).toBe(base.ticks.length);
      expect(Math.abs(p.metrics!.maxStretch - base.metrics!.maxStretch)).toBeLessThan(1e-5);
    }
  });
});

describe("flattenMesh on a cube cut along a spanning tree", () => {
  it("one disk that unfolds without stretch; 5 runs on both sides of the cut, all 45° ridges", async () => {
    const size = 40;
    const { mesh, seams } = treeCutCube(size, 4);
    const res = flattenMesh(await intakeOf(mesh), seams, { tickSpacing: 15 });
    const { report } = res;
    expect(report.pieces.length).toBe(1);
    const p = report.pieces[0];
    expect(p.flattenable).toBe(true);
    expect(p.area3d).toBeCloseTo(6 * size * size, 6);
    expect(p.area2d / p.area3d).toBeCloseTo(1, 4);
    expect(p.metrics!.maxStretch).toBeLessThan(1e-3);
    expect(p.metrics!.flippedTriangles).toBe(0);
    // tree of 7 cube edges; both sides of each cut are boundary: 14 edge lengths
    expect(p.boundaryLength2d / (14 * size)).toBeCloseTo(1, 4);
    // runs split at the branch corners t1, t2 (3 seam edges) and end at the 4 bottom corners: 5 runs
    const runs = new Set(p.bevels.map((b) => b.run));
    expect(runs.size).toBe(5);
    expect(p.bevels.length).toBe(10);
    const lengths = [...runs].map((r) => p.bevels.find((b) => b.run === r)!.length).sort((a, b) => a - b);
    expect(lengths.map((l) => Math.round(l / size))).toEqual([1, 1, 1, 2, 2]);
    for (const b of p.bevels) {
      // Source: cube dihedral 90° (270° outside); mitre rule: half of 90° = 45° per side
      expect(b.dihedralDeg).toBeCloseTo(270, 6);
      expect(b.bevelDeg).toBeCloseTo(-45, 6);
      expect(b.kind).toBe("ridge");
      expect(b.opensTo).toBe("inner");
      // ticks: floor(L / 15) per side
    }
    const expectedTicks = 2 * lengths.reduce((s, l) => s + Math.floor(l / 15), 0);
    expect(p.ticks.length).toBe(expectedTicks);
  });

  it("ticks of a run sit at equal arc length on both sides of the cut", async () => {
    const { mesh, seams } = treeCutCube(40, 4);
    const p = flattenMesh(await intakeOf(mesh), seams, { tickSpacing: 15 }).report.pieces[0];
    for (const b of p.bevels) {
      const other = p.bevels.find((o) => o.run === b.run && o !== b)!;
      const mine = p.ticks.filter((t) => t.run === b.run);
      expect(mine.length).toBe(2 * Math.floor(b.length / 15));
      for (let i = 1; i <= Math.floor(b.length / 15); i++) {
        const onPath = (path: [number, number][]) => {
          const tk = mine.filter((t) => t.number === i).find((t) => distToPath(path, t.x, t.y) < 1e-6)!;
          return arcTo(path, tk.x, tk.y);
        };
        expect(Math.abs(onPath(b.path) - onPath(other.path))).toBeLessThan(0.01 * 15);
      }
    }
  });

  it("a closed cube without seams is reported, not flattened, with a suggested cut in file vertex ids", async () => {
    const m = cube({ size: 10, subdivisions: 2 });
    const intake = await intakeOf(m);
    const res = flattenMesh(intake, new Uint32Array(0), {});
    const p = res.report.pieces[0];
    expect(p.flattenable).toBe(false);
    expect(p.problem).toBeTruthy();
    expect(p.outline).toEqual([]);
    expect(res.report.warnings.some((w) => w.includes("Piece A was not flattened"))).toBe(true);
    // the suggested cut is a list of edges of the input file (OBJ vertex order)
    expect(p.suggestedCut).not.toBeNull();
    expect(p.suggestedCut!.length).toBeGreaterThan(0);
    const edges = new Set<string>();
    for (let f = 0; f < m.triangles.length; f += 3) {
      for (let c = 0; c < 3; c++) {
        const a = m.triangles[f + c], b = m.triangles[f + ((c + 1) % 3)];
        edges.add(`${Math.min(a, b)}-${Math.max(a, b)}`);
      }
    }
    for (const [a, b] of p.suggestedCut!) expect(edges.has(`${Math.min(a, b)}-${Math.max(a, b)}`)).toBe(true);
    // cutting there makes a disk that flattens
    const again = flattenMesh(intake, new Uint32Array(p.suggestedCut!.flat()), {});
    expect(again.report.pieces.every((q) => q.flattenable)).toBe(true);
    expect(res.pieces[0].uv).toBeNull();
  });

  it("mirror plane: cube faces cut apart, the ±x pair is cut twice (one mirrored)", async () => {
    const m = cube({ size: 2 });
    const edges: number[] = [];
    for (let a = 0; a < 8; a++) for (const bit of [4, 2, 1]) if (!(a & bit)) edges.push(a, a | bit);
    const res = flattenMesh(await intakeOf(m), new Uint32Array(edges), { mirror: { axis: "x", offset: 0 } });
    const counts = res.report.pieces.map((p) => p.count).sort();
    expect(counts).toEqual([0, 1, 1, 1, 1, 2]);
    const twin = res.report.pieces.find((p) => p.count === 2)!;
    expect(twin.mirrored).toBe(true);
    expect(res.report.pieces.find((p) => p.count === 0)!.mirrorOf).toBe(twin.label);
    // 12 runs, each with one side on each of two pieces
    expect(res.report.pieces.reduce((s, p) => s + p.bevels.length, 0)).toBe(24);
  });
});

describe("flattenMesh warnings and options", () => {
  it("warns about a piece stretched beyond the material limit, not below it", async () => {
    // a tall bump is not developable: its pattern must stretch somewhere
    const bump = flatGrid({ faces: 800, size: 100, bump: 40 });
    const intake = await intakeOf(bump);
    const strict = flattenMesh(intake, new Uint32Array(0), { stretchLimit: 0.01 });
    const p = strict.report.pieces[0];
    expect(p.flattenable).toBe(true);
    expect(Math.max(p.metrics!.maxStretch, p.metrics!.maxCompress)).toBeGreaterThan(0.01);
    expect(strict.report.warnings.some((w) => w.startsWith("Piece A stretches"))).toBe(true);
    const loose = flattenMesh(intake, new Uint32Array(0), { stretchLimit: 5 });
    expect(loose.report.warnings.some((w) => w.startsWith("Piece A stretches"))).toBe(false);
  });

  it("warns when a decimated copy was flattened, and when the foam is thicker than a curve's radius", async () => {
    const grid = flatGrid({ faces: 2000, size: 100, bump: 20 });
    const intake = await readMesh(new TextEncoder().encode(writeObj(grid)), { units: "mm", faceBudget: 500 });
    expect(intake.report.decimated).not.toBeNull();
    const res = flattenMesh(intake, new Uint32Array(0), {});
    expect(res.report.warnings[0]).toMatch(/over the budget of 500/);
    const { mesh, seams } = seamedTube(5, 20, 32, 2);
    const thick = flattenMesh(await intakeOf(mesh), seams, { thickness: 30 });
    expect(thick.report.warnings.some((w) => w.includes("inside out"))).toBe(true);
  });

  it("a closed sphere without seams is reported as not flattenable", async () => {
    const s = uvSphere({ radius: 50, latitudeBands: 8, longitudeSegments: 16 });
    const res = flattenMesh(await intakeOf(s), new Uint32Array(0), {});
    expect(res.report.pieces[0].flattenable).toBe(false);
    expect(res.report.pieces[0].problem).toBeTruthy();
  });

  it("rejects bad options with one sentence naming the field", () => {
    expect(() => parseFlattenOptions({ scale: -2 })).toThrow(GeometryError);
    expect(() => parseFlattenOptions({ scale: 2, targetWidth: 3 })).toThrow(/targetWidth/);
    expect(() => parseFlattenOptions({ k: 2 })).toThrow(/Flatten option k/);
    expect(() => parseFlattenOptions({ colour: "red" })).toThrow(/options|colour/);
    expect(() => resolveLength("-6mm", "mm", "thickness")).toThrow(/thickness must be a length of zero or more/);
    expect(resolveLength("0.25in", "mm", "thickness")).toBeCloseTo(6.35, 12);
    expect(resolveLength(undefined, "in", "tick spacing", 50.8)).toBeCloseTo(2, 12);
    expect(parseFlattenOptions({})).toMatchObject({ scanFace: "outer", k: 0.5, thickness: 0, mirror: null, stretchLimit: 0.05 });
  });

  it("refine: false gives the conformal map only", async () => {
    const bump = flatGrid({ faces: 400, size: 100, bump: 30 });
    const p = flattenMesh(await intakeOf(bump), new Uint32Array(0), { refine: false }).report.pieces[0];
    expect(p.solver.refine!.iterations).toBe(0);
    expect(p.metrics).toEqual(p.lscmMetrics);
  });

  it("reports progress per piece and ends at 1", async () => {
    const { mesh, seams } = treeCutCube(10, 2);
    const steps: [string, number][] = [];
    flattenMesh(await intakeOf(mesh), seams, {}, (s, f) => steps.push([s, f]));
    expect(steps.filter(([s]) => s === "flatten").length).toBe(1);
    expect(steps[steps.length - 1]).toEqual(["done", 1]);
    for (let i = 1; i < steps.length; i++) expect(steps[i][1]).toBeGreaterThanOrEqual(steps[i - 1][1]);
  });
});

function distToPath(path: [number, number][], x: number, y: number): number {
  let best = Infinity;
  for (let i = 0; i + 1 < path.length; i++) {
    const [x0, y0] = path[i], [x1, y1] = path[i + 1];
    const l2 = (x1 - x0) ** 2 + (y1 - y0) ** 2;
    const u = Math.max(0, Math.min(1, ((x - x0) * (x1 - x0) + (y - y0) * (y1 - y0)) / l2));
    best = Math.min(best, Math.hypot(x0 + u * (x1 - x0) - x, y0 + u * (y1 - y0) - y));
  }
  return best;
}

function arcTo(path: [number, number][], x: number, y: number): number {
  let best = Infinity, bestArc = 0, acc = 0;
  for (let i = 0; i + 1 < path.length; i++) {
    const [x0, y0] = path[i], [x1, y1] = path[i + 1];
    const l = Math.hypot(x1 - x0, y1 - y0);
    const u = Math.max(0, Math.min(1, ((x - x0) * (x1 - x0) + (y - y0) * (y1 - y0)) / (l * l)));
    const d = Math.hypot(x0 + u * (x1 - x0) - x, y0 + u * (y1 - y0) - y);
    if (d < best) {
      best = d;
      bestArc = acc + u * l;
    }
    acc += l;
  }
  return bestArc;
}
