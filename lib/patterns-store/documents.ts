import { AppError } from "@/lib/errors/app-error";
import type { PipelineReport } from "@/lib/geometry/pipeline/flatten-mesh";
import { renderPatternPdf } from "@/lib/patterns/render-pattern-pdf";
import type { PaperId } from "@/lib/patterns/paper-sizes";
import { getObjectBuffer, putObject } from "@/lib/storage/s3";
import { patternKeys } from "@/lib/scans/storage-keys";
import { decodeHeatmap, decodeIntake } from "@/lib/scans/mesh-binary";
import { flattenParamsSchema } from "@/lib/validations/flatten";
import { Pattern, PatternPiece, Project, Scan } from "@/models";

/** A document to send: bytes, type and the file name for Content-Disposition. */
export interface PatternDocument {
  body: Buffer;
  contentType: string;
  fileName: string;
}

function ready(p: Pattern): void {
  if (p.status !== "ready" || !p.files) {
    throw new AppError("CONFLICT", p.status === "failed" ? `This pattern could not be made: ${p.error ?? ""}`.trim() : "This pattern is still being made; download it once it is ready.");
  }
}

/** File name stem from the project and scan names: letters, digits and dashes only. */
export async function documentStem(p: Pattern): Promise<string> {
  const [project, scan] = await Promise.all([Project.findByPk(p.projectId), Scan.findByPk(p.scanId)]);
  const slug = (s: string) => s.normalize("NFKD").replace(/[^A-Za-z0-9]+/g, "-").replace(/^-+|-+$/g, "").toLowerCase().slice(0, 40);
  const parts = [slug(project?.name ?? ""), slug((scan?.name ?? "").replace(/\.[A-Za-z0-9]+$/, ""))].filter(Boolean);
  return `${parts.join("-") || "pattern"}-${p.id.slice(0, 8)}`;
}

async function stored(key: string): Promise<Buffer> {
  const body = await getObjectBuffer(key);
  if (!body) throw new Error(`pattern document missing from storage: ${key}`);
  return body;
}

export async function patternReportJson(p: Pattern): Promise<PatternDocument> {
  ready(p);
  return { body: await stored(p.files!.report), contentType: "application/json", fileName: `${await documentStem(p)}-report.json` };
}

export async function patternSvg(p: Pattern): Promise<PatternDocument> {
  ready(p);
  return { body: await stored(p.files!.svg), contentType: "image/svg+xml", fileName: `${await documentStem(p)}.svg` };
}

/**
 * The PDF on `paper` (default: the paper chosen when it was queued). The queued paper was rendered by the job;
 * other papers are rendered from the stored report on first request with lib/patterns and cached under their own
 * key (deterministic, so two requests at once write the same object).
 */
export async function patternPdf(p: Pattern, paper?: PaperId): Promise<PatternDocument> {
  ready(p);
  const params = flattenParamsSchema.parse(p.params);
  const want = paper ?? (p.files!.pdfPaper as PaperId);
  const key = patternKeys(p.id).pdf(want);
  const fileName = `${await documentStem(p)}-${want}.pdf`;
  const cached = await getObjectBuffer(key);
  if (cached) return { body: cached, contentType: "application/pdf", fileName };

  const report = JSON.parse((await stored(p.files!.report)).toString("utf8")) as PipelineReport;
  const [project, scan] = await Promise.all([Project.findByPk(p.projectId), Scan.findByPk(p.scanId)]);
  let assembly;
  const bytes = scan?.intakeKey ? await getObjectBuffer(scan.intakeKey) : null;
  if (bytes) {
    const { mesh } = decodeIntake(bytes);
    const facePiece = await facePieceOf(p.id, mesh.triangles.length / 3);
    if (facePiece) assembly = { positions: mesh.positions, triangles: mesh.triangles, facePiece, labels: report.pieces.map((x) => x.label) };
  }
  const body = await renderPatternPdf(
    {
      report,
      meta: { projectName: project?.name ?? "Project", scanName: scan?.name ?? "scan", material: params.material, thicknessMm: params.thicknessMm, createdAt: p.createdAt },
      assembly,
    },
    { paper: want, overlapMm: params.overlapMm },
  );
  await putObject(key, body, { contentType: "application/pdf" });
  return { body, contentType: "application/pdf", fileName };
}

/** Working face → piece index from the stored heat maps (their face lists), or null when one is missing. */
async function facePieceOf(patternId: string, faceCount: number): Promise<Int32Array | null> {
  const out = new Int32Array(faceCount).fill(-1);
  const rows = await PatternPiece.findAll({ where: { patternId }, attributes: ["position", "heatmapKey"] });
  for (const r of rows) {
    if (!r.heatmapKey) continue;
    const bytes = await getObjectBuffer(r.heatmapKey);
    if (!bytes) return null;
    const { faces } = decodeHeatmap(bytes);
    for (let i = 0; i < faces.length; i++) out[faces[i]] = r.position;
  }
  return out;
}

/** A download response with a Content-Disposition file name. */
export function downloadResponse(doc: PatternDocument, inline = false): Response {
  return new Response(new Uint8Array(doc.body), {
    status: 200,
    headers: {
      "content-type": doc.contentType,
      "content-length": String(doc.body.byteLength),
      "content-disposition": `${inline ? "inline" : "attachment"}; filename="${doc.fileName}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
