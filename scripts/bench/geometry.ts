/**
 * Geometry benchmark: bumped disks of 10k, 100k and 1M faces (generated → binary STL → readMesh → flattenMesh) and a
 * 1M-face binary STL through intake. Each case runs in its own child process so its peak RSS is measured alone.
 * Targets (2-core machine): 100k-face piece LSCM < 1 s and whole flatten < 3 s; 1M faces < 30 s with peak
 * RSS < 2 GB; 1M-face STL parsed and welded < 3 s.
 */
import { execFile } from "node:child_process";
import path from "node:path";
import type { BenchRow } from "./bench-row";
import type { BenchCaseResult } from "./geometry/bench-case";

const root = path.resolve(import.meta.dirname, "../..");
const tsxCli = path.join(root, "node_modules/tsx/dist/cli.mjs");
const caseScript = path.join(import.meta.dirname, "geometry/bench-case.ts");

function runCase(kind: "disk" | "stl", faces: number): Promise<BenchCaseResult> {
  return new Promise((resolve, reject) => {
    execFile(
      process.execPath,
      ["--max-old-space-size=4096", tsxCli, caseScript, kind, String(faces)],
      { cwd: root, timeout: 15 * 60_000, maxBuffer: 1 << 20 },
      (err, stdout, stderr) => {
        if (err) return reject(new Error(`${kind} ${faces}: ${stderr.trim().split("\n").pop() || err.message}`));
        resolve(JSON.parse(stdout.trim().split("\n").pop()!) as BenchCaseResult);
      },
    );
  });
}

const label = (n: number): string => (n >= 1e6 ? `${n / 1e6}M` : `${n / 1e3}k`);

export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  for (const faces of [10_000, 100_000, 1_000_000]) {
    const r = await runCase("disk", faces);
    const L = `disk ${label(faces)} (${r.faces} faces)`;
    const lscmTarget = faces === 100_000 ? 1000 : undefined;
    const flatTarget = faces === 100_000 ? 3000 : faces === 1_000_000 ? 30_000 : undefined;
    const rssTarget = faces === 1_000_000 ? 2048 : undefined;
    rows.push({ name: `${L}: load average at start`, value: r.load, unit: "" });
    rows.push({ name: `${L}: parse + weld`, value: r.parseMs, unit: "ms" });
    rows.push({ name: `${L}: LSCM`, value: r.lscmMs ?? NaN, unit: "ms", target: lscmTarget, pass: lscmTarget ? (r.lscmMs ?? Infinity) < lscmTarget : undefined });
    rows.push({ name: `${L}: refinement (${r.refineIterations} iterations)`, value: r.refineMs ?? NaN, unit: "ms" });
    rows.push({ name: `${L}: whole flatten`, value: r.flattenMs ?? NaN, unit: "ms", target: flatTarget, pass: flatTarget ? (r.flattenMs ?? Infinity) < flatTarget : undefined });
    rows.push({ name: `${L}: whole flatten, CPU time`, value: r.flattenCpuMs ?? NaN, unit: "ms" });
    rows.push({ name: `${L}: max stretch`, value: (r.maxStretch ?? NaN) * 100, unit: "%" });
    rows.push({ name: `${L}: peak RSS`, value: r.peakRssMb, unit: "MB", target: rssTarget, pass: rssTarget ? r.peakRssMb < rssTarget : undefined });
  }
  const s = await runCase("stl", 1_000_000);
  rows.push({ name: `binary STL ${label(1_000_000)}: load average at start`, value: s.load, unit: "" });
  rows.push({ name: `binary STL ${label(1_000_000)} (${s.faces} faces): parse + weld`, value: s.parseMs, unit: "ms", target: 3000, pass: s.parseMs < 3000 });
  rows.push({ name: `binary STL ${label(1_000_000)}: parse + weld, CPU time`, value: s.parseCpuMs, unit: "ms" });
  rows.push({ name: `binary STL ${label(1_000_000)}: parse + weld + decimate to ${s.decimatedFaces} faces`, value: s.decimateMs ?? NaN, unit: "ms" });
  rows.push({ name: `binary STL ${label(1_000_000)}: peak RSS`, value: s.peakRssMb, unit: "MB" });
  return rows;
}
