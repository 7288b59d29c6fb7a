/**
 * Command-line flattener:
 *   npm run flatten -- MESH [--seams SEAMS.json] [--units mm|cm|m|in] [--out-units mm|cm|m|in]
 *     [--scale F | --target-width LEN [--target-axis x|y|z|largest]] [--thickness LEN --scan-face outer|inner] [--k K]
 *     [--tick-spacing LEN] [--mirror AXIS[=OFFSET]] [--face-budget N] [--json OUT.json | --json -]
 *     [--pdf OUT.pdf [--paper letter|a4|a3|tabloid|full]] [--svg OUT.svg] [--material ID]
 *
 * Prints a short summary (stderr when the JSON goes to stdout) and writes the full FlattenReport with timing.
 * Exit 0 for a valid mesh (pieces that cannot be flattened are only reported), 2 for bad arguments, 1 for a file that
 * cannot be read or a mesh/seam/option error; always one line on stderr, never a stack trace.
 */
import { readFile, writeFile } from "node:fs/promises";
import { parseArgs } from "node:util";
import { z } from "zod";
import { isGeometryError } from "@/lib/geometry/errors";
import { LENGTH_UNITS, type LengthUnit } from "@/lib/geometry/mesh";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { parseSeamsJson, resolveSeams } from "@/lib/geometry/seams/parse-seams";
import { flattenMesh, type PipelineReport } from "@/lib/geometry/pipeline/flatten-mesh";
import { parseFlattenOptions, type FlattenOptionsInput } from "@/lib/geometry/pipeline/flatten-options";
import { MM_PER_UNIT } from "@/lib/geometry/mesh";
import { renderPatternPdf, renderPatternSvg } from "@/lib/patterns";
import { PAPER_IDS, type PaperId } from "@/lib/patterns/paper-sizes";
import { patternDocumentInput } from "@/lib/patterns-store/document-input";

class UsageError extends Error {}

const unitEnum = z.enum(LENGTH_UNITS as unknown as [LengthUnit, ...LengthUnit[]]);
const numberText = (what: string) =>
  z.string().trim().regex(/^[+-]?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i, `${what} must be a number`).transform(Number);

const argsSchema = z
  .object({
    mesh: z.string().min(1),
    seams: z.string().min(1).optional(),
    units: unitEnum.default("mm"),
    "out-units": unitEnum.optional(),
    scale: numberText("--scale").pipe(z.number().positive("--scale must be positive")).optional(),
    "target-width": z.string().min(1).optional(),
    "target-axis": z.enum(["x", "y", "z", "largest"]).optional(),
    thickness: z.string().min(1).optional(),
    "scan-face": z.enum(["outer", "inner"]).optional(),
    k: numberText("--k").pipe(z.number().min(0, "--k must be between 0 and 1").max(1, "--k must be between 0 and 1")).optional(),
    "tick-spacing": z.string().min(1).optional(),
    mirror: z.string().regex(/^[xyz](=[+-]?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?)?$/i, "--mirror must be x, y or z, optionally =OFFSET (e.g. x=0)").optional(),
    "face-budget": numberText("--face-budget").pipe(z.number().int("--face-budget must be a whole number").positive()).optional(),
    json: z.string().min(1).optional(),
    pdf: z.string().min(1).optional(),
    svg: z.string().min(1).optional(),
    paper: z.enum(PAPER_IDS as unknown as [PaperId, ...PaperId[]], { message: `expected one of ${PAPER_IDS.join(", ")}` }).optional(),
    material: z.string().trim().min(1).max(80).optional(),
  })
  .refine((a) => !(a.scale !== undefined && a["target-width"] !== undefined), { message: "use either --scale or --target-width, not both" })
  .refine((a) => a["scan-face"] === undefined || a.thickness !== undefined, { message: "--scan-face needs --thickness" })
  .refine((a) => a.paper === undefined || a.pdf !== undefined, { message: "--paper needs --pdf" })
  .refine((a) => (a.pdf === undefined && a.svg === undefined) || a.thickness !== undefined, {
    message: "--pdf and --svg need --thickness (the foam thickness is printed on the pattern)",
  });

type CliArgs = z.output<typeof argsSchema>;

function parseCli(argv: string[]): CliArgs {
  let parsed;
  try {
    parsed = parseArgs({
      args: argv,
      allowPositionals: true,
      strict: true,
      options: {
        seams: { type: "string" },
        units: { type: "string" },
        "out-units": { type: "string" },
        scale: { type: "string" },
        "target-width": { type: "string" },
        "target-axis": { type: "string" },
        thickness: { type: "string" },
        "scan-face": { type: "string" },
        k: { type: "string" },
        "tick-spacing": { type: "string" },
        mirror: { type: "string" },
        "face-budget": { type: "string" },
        json: { type: "string" },
        pdf: { type: "string" },
        svg: { type: "string" },
        paper: { type: "string" },
        material: { type: "string" },
        help: { type: "boolean", short: "h" },
      },
    });
  } catch (e) {
    // node's message continues with advice about "--"; the first sentence is the point
    const first = (e as Error).message.split("\n")[0];
    throw new UsageError(first.replace(/^(Unknown option '[^']*')\..*$/, "$1"));
  }
  if (parsed.values.help) throw new UsageError("help");
  if (parsed.positionals.length !== 1) {
    throw new UsageError(parsed.positionals.length === 0 ? "missing MESH (an .obj or .stl file)" : `expected one MESH file, got ${parsed.positionals.length}: ${parsed.positionals.join(" ")}`);
  }
  const { help: _help, ...values } = parsed.values;
  const r = argsSchema.safeParse({ mesh: parsed.positionals[0], ...values });
  if (!r.success) {
    const issue = r.error.issues[0];
    const field = issue.path.length ? `--${String(issue.path[0])}` : "arguments";
    throw new UsageError(issue.message.startsWith("--") || issue.path.length === 0 ? issue.message : `${field}: ${issue.message}`);
  }
  return r.data;
}

const USAGE =
  "usage: npm run flatten -- MESH [--seams SEAMS.json] [--units mm|cm|m|in] [--out-units U] [--scale F | --target-width LEN] " +
  "[--thickness LEN --scan-face outer|inner] [--k K] [--tick-spacing LEN] [--mirror x=0] [--face-budget N] [--json OUT.json|-] " +
  "[--pdf OUT.pdf [--paper letter|a4|a3|tabloid|full]] [--svg OUT.svg] [--material eva|eva-hd|craft-foam|upholstery-foam|pe-foam]";

async function readInput(path: string, what: string): Promise<Buffer> {
  try {
    return await readFile(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a folder" : code === "EACCES" ? "permission denied" : (e as Error).message;
    throw new InputError(`Cannot read the ${what} ${path}: ${why}.`);
  }
}

class InputError extends Error {}

function summary(report: PipelineReport, meshPath: string): string {
  const u = report.units;
  const lines: string[] = [];
  const m = report.mesh;
  lines.push(`${meshPath}: ${m.format}, ${m.faces} faces, ${m.vertices} vertices, ${m.components} part${m.components === 1 ? "" : "s"}`);
  lines.push(
    `scale ×${report.scale.factor.toPrecision(4)} (${report.scale.percent} %), ` +
      (report.surface.kind === "neutral"
        ? `neutral surface of ${report.surface.thickness} ${u} foam (${report.surface.scanFace} face scanned, K ${report.surface.k})`
        : "scanned surface (no thickness)"),
  );
  const rows = [["piece", "faces", `area ${u}²`, "max stretch", "p95 stretch", "bevel runs", "cut"]];
  for (const p of report.pieces) {
    const kinds = { ridge: 0, valley: 0, straight: 0 };
    for (const b of p.bevels) kinds[b.kind]++;
    const runs = p.bevels.length === 0 ? "0" : `${p.bevels.length} (${kinds.ridge} ridge, ${kinds.valley} valley, ${kinds.straight} straight)`;
    rows.push([
      p.label,
      String(p.faces),
      String(Number((p.flattenable ? p.area2d : p.area3d).toPrecision(5))),
      p.metrics ? `${(p.metrics.maxStretch * 100).toFixed(2)} %` : "not flat",
      p.metrics ? `${(p.metrics.p95Stretch * 100).toFixed(2)} %` : "-",
      runs,
      p.flattenable ? (p.mirrored ? `${p.count} (1 mirrored)` : String(p.count)) : "-",
    ]);
  }
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
  for (const r of rows) lines.push(r.map((cell, c) => (c === 0 || c === 5 ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join("  ").trimEnd());
  for (const w of report.warnings) lines.push(`warning: ${w}`);
  lines.push(`parse ${report.timing.parseMs.toFixed(0)} ms, flatten ${report.timing.flattenMs.toFixed(0)} ms, total ${report.timing.totalMs.toFixed(0)} ms`);
  return lines.join("\n") + "\n";
}

async function main(): Promise<number> {
  const t0 = performance.now();
  const args = parseCli(process.argv.slice(2));
  const bytes = await readInput(args.mesh, "mesh file");
  const seamText = args.seams ? (await readInput(args.seams, "seam file")).toString("utf8") : null;
  const intake = await readMesh(new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength), { units: args.units, faceBudget: args["face-budget"] });
  const seams = seamText === null ? new Uint32Array(0) : resolveSeams(parseSeamsJson(seamText), intake);
  const parseMs = performance.now() - t0;

  let mirror: FlattenOptionsInput["mirror"] = null;
  if (args.mirror) {
    const [axis, offset] = args.mirror.toLowerCase().split("=");
    mirror = { axis: axis as "x" | "y" | "z", offset: offset === undefined ? 0 : Number(offset) };
  }
  const opts = parseFlattenOptions({
    units: args["out-units"] ?? args.units,
    scale: args.scale,
    targetWidth: args["target-width"],
    targetAxis: args["target-axis"],
    thickness: args.thickness,
    scanFace: args["scan-face"],
    k: args.k,
    tickSpacing: args["tick-spacing"],
    mirror,
  } satisfies FlattenOptionsInput);
  const result = flattenMesh(intake, seams, opts);
  const report = result.report;
  report.timing = { parseMs, flattenMs: report.timing.flattenMs, totalMs: performance.now() - t0 };

  const toStdout = args.json === "-";
  (toStdout ? process.stderr : process.stdout).write(summary(report, args.mesh));
  if (args.json) {
    const text = JSON.stringify(report, null, 1) + "\n";
    if (toStdout) process.stdout.write(text);
    else {
      try {
        await writeFile(args.json, text);
      } catch (e) {
        throw new InputError(`Cannot write the report to ${args.json}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}.`);
      }
    }
  }
  if (args.pdf || args.svg) {
    // the same documents the worker stores for a pattern (lib/patterns via patternDocumentInput)
    const name = args.mesh.replace(/^.*[\\/]/, "");
    const input = patternDocumentInput(report, result.facePiece, intake.mesh, {
      projectName: name.replace(/\.[^.]+$/, ""),
      scanName: name,
      material: args.material ?? "eva",
      thicknessMm: report.surface.thickness * MM_PER_UNIT[report.units],
      createdAt: new Date(),
    });
    const out = toStdout ? process.stderr : process.stdout;
    if (args.pdf) {
      await writeOutput(args.pdf, await renderPatternPdf(input, { paper: args.paper ?? "letter" }));
      out.write(`wrote ${args.pdf}\n`);
    }
    if (args.svg) {
      await writeOutput(args.svg, renderPatternSvg(input));
      out.write(`wrote ${args.svg}\n`);
    }
  }
  return 0;
}

async function writeOutput(file: string, data: string | Uint8Array): Promise<void> {
  try {
    await writeFile(file, data);
  } catch (e) {
    throw new InputError(`Cannot write ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}.`);
  }
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    if (e instanceof UsageError) {
      process.stderr.write(e.message === "help" ? `${USAGE}\n` : `flatten: ${e.message} (see --help)\n`);
      process.exitCode = e.message === "help" ? 0 : 2;
    } else if (e instanceof InputError || isGeometryError(e)) {
      process.stderr.write(`flatten: ${(e as Error).message}\n`);
      process.exitCode = 1;
    } else {
      process.stderr.write(`flatten: unexpected error: ${e instanceof Error ? e.message : String(e)}\n`);
      process.exitCode = 70;
    }
  },
);
