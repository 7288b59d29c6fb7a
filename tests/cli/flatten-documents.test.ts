import { execFile } from "node:child_process";
import { mkdtemp, readFile, rm, stat, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";

/** `npm run flatten -- … --pdf OUT.pdf [--paper …] --svg OUT.svg`: the pattern documents from the CLI. */
const root = path.resolve(import.meta.dirname, "../..");
const tsxCli = path.join(root, "node_modules/tsx/dist/cli.mjs");

function flatten(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [tsxCli, path.join(root, "scripts/flatten.ts"), ...args], { cwd: root, maxBuffer: 64 << 20 }, (err, stdout, stderr) => {
      resolve({ code: err ? (typeof err.code === "number" ? err.code : 1) : 0, stdout, stderr });
    });
  });
}

let dir = "";
const N = 24, bands = 3;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "peelform-cli-docs-"));
  await writeFile(path.join(dir, "lantern.obj"), writeObj(cylinderTube({ radius: 40, height: 90, segments: N, bands })));
  const seams: [number, number][] = [];
  for (let i = 0; i < bands; i++) seams.push([i * N, (i + 1) * N]);
  await writeFile(path.join(dir, "lantern.seams.json"), JSON.stringify({ seams }));
});

afterAll(async () => {
  if (dir) await rm(dir, { recursive: true, force: true });
});

const mesh = () => [path.join(dir, "lantern.obj"), "--seams", path.join(dir, "lantern.seams.json")];

describe("flatten CLI documents", () => {
  it("writes a true-scale PDF on the chosen paper and an SVG in millimetres", async () => {
    const pdfPath = path.join(dir, "lantern.pdf"), svgPath = path.join(dir, "lantern.svg");
    const r = await flatten([...mesh(), "--thickness", "6mm", "--scan-face", "outer", "--pdf", pdfPath, "--paper", "a4", "--svg", svgPath]);
    expect(r.code, r.stderr).toBe(0);
    const pdf = await readFile(pdfPath, "latin1");
    expect(pdf.startsWith("%PDF-")).toBe(true);
    // Source: ISO 216, A4 = 210 × 297 mm = 595.28 × 841.89 pt (1 pt = 1/72 in, ISO 32000-1 §8.3.2.3); the tile pages
    // are A4 (the cover and legend pages too)
    const boxes = [...pdf.matchAll(/\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(boxes.length).toBeGreaterThan(0);
    for (const [w, h] of boxes) {
      expect(Math.min(w, h)).toBeCloseTo((210 * 72) / 25.4, 1);
      expect(Math.max(w, h)).toBeCloseTo((297 * 72) / 25.4, 1);
    }
    const svg = await readFile(svgPath, "utf8");
    expect(svg).toMatch(/<svg[^>]* width="[\d.]+mm" height="[\d.]+mm"/);
    expect(svg).toMatch(/<g id="A" class="piece"/);
    expect(r.stdout).toContain(`wrote ${pdfPath}`);
    expect(r.stdout).toContain(`wrote ${svgPath}`);
  });

  it("defaults to Letter paper", async () => {
    const letter = path.join(dir, "letter.pdf");
    expect((await flatten([...mesh(), "--thickness", "6mm", "--pdf", letter])).code).toBe(0);
    // Source: ANSI/ASME Y14.1, Letter = 8.5 × 11 in = 612 × 792 pt
    expect(await readFile(letter, "latin1")).toMatch(/\/MediaBox \[0 0 612 792\]/);
  });

  it("refuses a paper it does not know and documents without a foam thickness", async () => {
    const out = path.join(dir, "never.pdf");
    const unknown = await flatten([...mesh(), "--thickness", "6mm", "--pdf", out, "--paper", "b5"]);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/^flatten: --paper: .*letter, a4, a3, tabloid, full/);
    const thin = await flatten([...mesh(), "--svg", path.join(dir, "never.svg")]);
    expect(thin.code).toBe(2);
    expect(thin.stderr).toMatch(/--pdf and --svg need --thickness/);
    await expect(stat(out)).rejects.toThrow();
  });
});
