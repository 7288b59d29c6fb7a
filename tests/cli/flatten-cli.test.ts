import { execFile } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { writeBinaryStl, writeObj } from "@/lib/geometry/intake/write-mesh";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import type { FlattenReport } from "@/lib/geometry/report-types";

const root = path.resolve(import.meta.dirname, "../..");
const tsxCli = path.join(root, "node_modules/tsx/dist/cli.mjs");

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

function flatten(args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [tsxCli, path.join(root, "scripts/flatten.ts"), ...args], { cwd: root, maxBuffer: 64 << 20 }, (err, stdout, stderr) => {
      const code = err ? (typeof err.code === "number" ? err.code : 1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}

let dir = "";
const N = 32, bands = 4, radius = 50, height = 120;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "peelform-cli-"));
  const tube = cylinderTube({ radius, height, segments: N, bands });
  await writeFile(path.join(dir, "tube.obj"), writeObj(tube));
  await writeFile(path.join(dir, "tube.stl"), writeBinaryStl(tube));
  const seams: [number, number][] = [];
  for (let i = 0; i < bands; i++) seams.push([i * N, (i + 1) * N]);
  await writeFile(path.join(dir, "tube.seams.json"), JSON.stringify({ seams }));
  // STL vertex ids are the order of first appearance over the facets (the intake's contract)
  const stlId = new Int32Array(tube.positions.length / 3).fill(-1);
  let next = 0;
  for (const v of tube.triangles) if (stlId[v] < 0) stlId[v] = next++;
  await writeFile(path.join(dir, "tube.stl.seams.json"), JSON.stringify({ seams: seams.map(([a, b]) => [stlId[a], stlId[b]]) }));
  await writeFile(path.join(dir, "bad.obj"), "v 0 0 0\nv 1 0 0\nf 1 2 9\n");
  await writeFile(path.join(dir, "bad-seams.json"), JSON.stringify({ seams: [[0, 999999]] }));
});

afterAll(async () => {
  if (dir) await rm(dir, { recursive: true, force: true });
});

const oneLine = (s: string): void => {
  expect(s.trim().split("\n").length).toBe(1);
  expect(s).not.toMatch(/\n\s+at /);
};

describe("flatten CLI", () => {
  it("flattens a seamed cylinder: summary on stderr, full report with timing on stdout (--json -)", async () => {
    const r = await flatten([path.join(dir, "tube.obj"), "--seams", path.join(dir, "tube.seams.json"), "--thickness", "6mm", "--scan-face", "outer", "--target-width", "30cm", "--json", "-"]);
    expect(r.code).toBe(0);
    const report = JSON.parse(r.stdout) as FlattenReport;
    expect(report.scale.percent).toBe(300);
    expect(report.surface).toMatchObject({ kind: "neutral", thickness: 6, scanFace: "outer", k: 0.5 });
    expect(report.pieces.length).toBe(1);
    const p = report.pieces[0];
    expect(p.flattenable).toBe(true);
    // final radius 150 mm, neutral 147 mm; Source: θ·(R + K·T) with R = 150 − 6, K = 0.5
    expect(p.placement.width / (2 * N * 147 * Math.sin(Math.PI / N))).toBeCloseTo(1, 3);
    expect(p.placement.height).toBeCloseTo(360, 1);
    expect(report.timing.totalMs).toBeGreaterThanOrEqual(report.timing.flattenMs);
    expect(report.timing.parseMs).toBeGreaterThan(0);
    expect(r.stderr).toMatch(/piece\s+faces/);
    expect(r.stderr).toMatch(/^A\s+256\s/m);
  });

  it("writes the report to a file and prints the table on stdout", async () => {
    const out = path.join(dir, "out.json");
    const r = await flatten([path.join(dir, "tube.stl"), "--units", "mm", "--out-units", "in", "--seams", path.join(dir, "tube.stl.seams.json"), "--json", out]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/stl-binary, 256 faces/);
    const report = JSON.parse(await readFile(out, "utf8")) as FlattenReport;
    expect(report.units).toBe("in");
    // Source: 1 in = 25.4 mm; a 120 mm tall tube is 4.724 in
    expect(report.pieces[0].placement.height).toBeCloseTo(120 / 25.4, 3);
  });

  it("reports a closed-loop piece without a seam as not flattened, still exit 0", async () => {
    const r = await flatten([path.join(dir, "tube.obj"), "--json", "-"]);
    expect(r.code).toBe(0);
    const report = JSON.parse(r.stdout) as FlattenReport;
    expect(report.pieces[0].flattenable).toBe(false);
    expect(report.pieces[0].problem).toBeTruthy();
    expect(r.stderr).toMatch(/not flat/);
  });

  it("fails with one line for a bad mesh file, a missing file and bad seams", async () => {
    const runs = await Promise.all([[path.join(dir, "bad.obj")], [path.join(dir, "missing.obj")], [path.join(dir, "tube.obj"), "--seams", path.join(dir, "bad-seams.json")]].map(flatten));
    for (const r of runs) {
      expect(r.code).toBe(1);
      expect(r.stdout).toBe("");
      oneLine(r.stderr);
      expect(r.stderr).toMatch(/^flatten: /);
    }
  });

  it("fails with one line and exit 2 for bad arguments", async () => {
    const runs = await Promise.all([[], [path.join(dir, "tube.obj"), "--scale", "2", "--target-width", "3in"], [path.join(dir, "tube.obj"), "--units", "yards"]].map(flatten));
    for (const r of runs) {
      expect(r.code).toBe(2);
      oneLine(r.stderr);
    }
  });
});
