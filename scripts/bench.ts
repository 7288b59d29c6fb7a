/**
 * `npm run bench`: runs every benchmark module in scripts/bench/ (top-level *.ts files exporting
 * `run(): Promise<BenchRow[]>`, in alphabetical order), prints one table and a pass/fail line per target.
 * Exit code 1 when a target fails. `npm run bench -- geometry` runs only the modules whose name contains "geometry".
 */
import { readdir } from "node:fs/promises";
import path from "node:path";
import { pathToFileURL } from "node:url";
import type { BenchRow } from "./bench/bench-row";

const dir = path.join(import.meta.dirname, "bench");

async function main(): Promise<number> {
  const filter = process.argv.slice(2);
  const files = (await readdir(dir, { withFileTypes: true }))
    .filter((d) => d.isFile() && d.name.endsWith(".ts") && !d.name.endsWith(".d.ts") && d.name !== "bench-row.ts")
    .map((d) => d.name)
    .filter((n) => filter.length === 0 || filter.some((f) => n.includes(f)))
    .sort();
  const rows: { module: string; row: BenchRow }[] = [];
  let failed = 0;
  for (const f of files) {
    const mod = (await import(pathToFileURL(path.join(dir, f)).href)) as { run?: () => Promise<BenchRow[]> };
    if (typeof mod.run !== "function") continue;
    const name = f.replace(/\.ts$/, "");
    process.stderr.write(`bench: ${name} …\n`);
    try {
      for (const row of await mod.run()) rows.push({ module: name, row });
    } catch (e) {
      failed++;
      process.stderr.write(`bench: ${name} failed: ${e instanceof Error ? e.message : String(e)}\n`);
    }
  }
  const table = [["module", "measure", "value", "target", "result"]];
  for (const { module, row } of rows) {
    const v = `${Number(row.value.toPrecision(4))} ${row.unit}`;
    const t = row.target === undefined ? "" : `< ${row.target} ${row.unit}`;
    const r = row.pass === undefined ? "" : row.pass ? "pass" : "FAIL";
    if (row.pass === false) failed++;
    table.push([module, row.name, v, t, r]);
  }
  const w = table[0].map((_, c) => Math.max(...table.map((r) => r[c].length)));
  const line = (r: string[]): string => r.map((c, i) => (i === 2 ? c.padStart(w[i]) : c.padEnd(w[i]))).join("  ").trimEnd();
  process.stdout.write([line(table[0]), w.map((n) => "-".repeat(n)).join("  "), ...table.slice(1).map(line)].join("\n") + "\n");
  const targets = rows.filter((r) => r.row.pass !== undefined);
  process.stdout.write(`${targets.filter((r) => r.row.pass).length}/${targets.length} targets met${failed ? `, ${failed} failed` : ""}\n`);
  return failed ? 1 : 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`bench: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exitCode = 1;
  },
);
