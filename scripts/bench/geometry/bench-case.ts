/**
 * One geometry benchmark case, run in its own process so its peak RSS is its own. Prints one JSON line on stdout.
 *   tsx scripts/bench/geometry/bench-case.ts disk FACES   generated bumped disk → binary STL → readMesh → flattenMesh
 *   tsx scripts/bench/geometry/bench-case.ts stl FACES    binary STL → readMesh (parse + weld, no decimation), then
 *                                                         readMesh with the default face budget (+ decimation)
 */
import os from "node:os";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { writeBinaryStl } from "@/lib/geometry/intake/write-mesh";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { flattenMesh } from "@/lib/geometry/pipeline/flatten-mesh";

export interface BenchCaseResult {
  kind: "disk" | "stl";
  faces: number;
  parseMs: number;
  flattenMs?: number;
  lscmMs?: number;
  refineMs?: number;
  refineIterations?: number;
  maxStretch?: number;
  decimateMs?: number;
  decimatedFaces?: number;
  /** CPU time (user + system) of the flatten / parse step, ms: wall time suffers when the machine is shared */
  parseCpuMs: number;
  flattenCpuMs?: number;
  /** 1-minute load average when the case started */
  load: number;
  peakRssMb: number;
}

function cpuMs(): number {
  const c = process.cpuUsage();
  return (c.user + c.system) / 1000;
}

async function main(): Promise<void> {
  const [kind, facesText] = process.argv.slice(2);
  const faces = Number(facesText);
  if ((kind !== "disk" && kind !== "stl") || !Number.isInteger(faces) || faces < 2) {
    throw new Error("usage: bench-case.ts disk|stl FACES");
  }
  // a 1 m square sheet with a 15 cm bump: not developable, so the refinement has work to do
  const mesh = flatGrid({ faces, size: 1000, bump: 150 });
  const stl = writeBinaryStl(mesh);
  const realFaces = mesh.triangles.length / 3;
  const load = os.loadavg()[0];
  let t = performance.now();
  let c = cpuMs();
  const intake = await readMesh(stl, { units: "mm", faceBudget: 10 * realFaces });
  const parseMs = performance.now() - t;
  const out: BenchCaseResult = { kind, faces: realFaces, parseMs, parseCpuMs: cpuMs() - c, load, peakRssMb: 0 };
  if (kind === "disk") {
    t = performance.now();
    c = cpuMs();
    const res = flattenMesh(intake, new Uint32Array(0), {});
    out.flattenMs = performance.now() - t;
    out.flattenCpuMs = cpuMs() - c;
    const p = res.report.pieces[0];
    out.lscmMs = p.solver.lscm?.ms;
    out.refineMs = p.solver.refine?.ms;
    out.refineIterations = p.solver.refine?.iterations;
    out.maxStretch = p.metrics?.maxStretch;
  } else {
    t = performance.now();
    const dec = await readMesh(stl, { units: "mm" });
    out.decimateMs = performance.now() - t;
    out.decimatedFaces = dec.mesh.triangles.length / 3;
  }
  // Source: Node.js process.resourceUsage().maxRSS is in kilobytes (getrusage ru_maxrss on Linux)
  out.peakRssMb = process.resourceUsage().maxRSS / 1024;
  process.stdout.write(JSON.stringify(out) + "\n");
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
});
