/**
 * Documents benchmark: a 50-piece pattern (with a 6-piece assembly mesh) to a tiled Letter PDF and to SVG.
 * Reports time (first run in the process, which includes font parsing, and the median of three more) and size.
 * Target: under 3 s per PDF (wall time; CPU time is reported beside it because the machine may be shared).
 */
import { renderPatternPdf, planPatternPdf } from "@/lib/patterns/render-pattern-pdf";
import { renderPatternSvg } from "@/lib/patterns/render-pattern-svg";
import { projectViews } from "@/lib/patterns/assembly/project-views";
import { input, manyPieces, tubeAssembly } from "@/tests/patterns/fixtures";
import type { BenchRow } from "./bench-row";


const TARGET_MS = 3000;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

export async function run(): Promise<BenchRow[]> {
  const inp = input(manyPieces(50), { assembly: tubeAssembly(6, 96, 40) });
  const { plan } = planPatternPdf(inp, { paper: "letter" });
  let t = performance.now();
  const cpu0 = process.cpuUsage();
  const first = await renderPatternPdf(inp, { paper: "letter" });
  const firstMs = performance.now() - t;
  const cpu = process.cpuUsage(cpu0);
  const firstCpuMs = (cpu.user + cpu.system) / 1000;
  const times: number[] = [];
  for (let i = 0; i < 3; i++) {
    t = performance.now();
    await renderPatternPdf(inp, { paper: "letter" });
    times.push(performance.now() - t);
  }
  const svgTimes: number[] = [];
  let svg = "";
  for (let i = 0; i < 3; i++) {
    t = performance.now();
    svg = renderPatternSvg(inp);
    svgTimes.push(performance.now() - t);
  }
  const scan = tubeAssembly(12, 500, 100); // 100 000 faces, as a large scan would bring
  t = performance.now();
  projectViews(scan, scan.labels);
  const viewsMs = performance.now() - t;
  const warm = median(times);
  const svgMs = median(svgTimes);
  return [
    { name: "50-piece tiled Letter PDF, first run", value: Math.round(firstMs), unit: "ms", target: TARGET_MS, pass: firstMs < TARGET_MS },
    { name: "50-piece tiled Letter PDF, first run CPU time", value: Math.round(firstCpuMs), unit: "ms" },
    { name: "50-piece tiled Letter PDF, median of 3", value: Math.round(warm), unit: "ms", target: TARGET_MS, pass: warm < TARGET_MS },
    { name: "50-piece tiled Letter PDF, size", value: Math.round(first.length / 1024), unit: "KiB" },
    { name: "50-piece tiled Letter PDF, tiles printed", value: plan.tiles.filter((x) => !x.blank).length, unit: `of ${plan.rows} x ${plan.cols}` },
    { name: "50-piece SVG, median of 3", value: Math.round(svgMs * 10) / 10, unit: "ms", target: TARGET_MS, pass: svgMs < TARGET_MS },
    { name: "50-piece SVG, size", value: Math.round(Buffer.byteLength(svg) / 1024), unit: "KiB" },
    { name: "assembly views of a 100k-face mesh", value: Math.round(viewsMs), unit: "ms", target: 1000, pass: viewsMs < 1000 },
  ];
}
