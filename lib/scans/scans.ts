import { randomUUID } from "node:crypto";
import { createReadStream } from "node:fs";
import { AppError } from "@/lib/errors/app-error";
import { detectFormat } from "@/lib/geometry/intake/detect-format";
import { isGeometryError } from "@/lib/geometry/errors";
import type { LengthUnit } from "@/lib/geometry/mesh";
import type { MeshReport } from "@/lib/geometry/report-types";
import { getSequelize } from "@/lib/db/sequelize";
import { enqueueScanIntake } from "@/lib/jobs/queues";
import { findProject } from "@/lib/projects/projects";
import { putObject } from "@/lib/storage/s3";
import { scanUploadFieldsSchema } from "@/lib/validations/scans";
import { formatIssues } from "@/lib/validations/format-issues";
import { scanKeys } from "@/lib/scans/storage-keys";
import { receiveUpload } from "@/lib/scans/receive-upload";
import { Scan, SeamMap } from "@/models";
import type { ScanStatus } from "@/models/scan";

/** The API shape of a scan (GET /api/scans/[id], list entries, the upload's answer). */
export interface ScanDto {
  id: string;
  projectId: string;
  name: string;
  units: LengthUnit;
  status: ScanStatus;
  /** one sentence when status is "failed" */
  error: string | null;
  format: MeshReport["format"] | null;
  byteSize: number;
  report: MeshReport | null;
  vertexCount: number | null;
  faceCount: number | null;
  /** latest saved seam-map version, null when none */
  seamMapVersion: number | null;
  /** the viewer mesh, once ready */
  meshUrl: string | null;
  createdAt: string;
  updatedAt: string;
}

export function toScanDto(s: Scan, seamMapVersion: number | null): ScanDto {
  return {
    id: s.id,
    projectId: s.projectId,
    name: s.name,
    units: s.units,
    status: s.status,
    error: s.error ?? null,
    format: s.format ?? null,
    byteSize: s.byteSize,
    report: s.report ?? null,
    vertexCount: s.vertexCount ?? null,
    faceCount: s.faceCount ?? null,
    seamMapVersion,
    meshUrl: s.status === "ready" ? `/api/scans/${s.id}/mesh` : null,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

async function latestVersions(scanIds: string[]): Promise<Map<string, number>> {
  if (scanIds.length === 0) return new Map();
  const rows = (await SeamMap.findAll({
    attributes: ["scanId", [getSequelize().fn("MAX", getSequelize().col("version")), "latest"]],
    where: { scanId: scanIds },
    group: ["scanId"],
    raw: true,
  })) as unknown as { scanId: string; latest: number }[];
  return new Map(rows.map((r) => [r.scanId, Number(r.latest)]));
}

/** A scan of this shop; another shop's id answers NOT_FOUND exactly like an unknown one. */
export async function findScan(shopId: string, id: string): Promise<Scan> {
  getSequelize();
  const s = await Scan.findOne({ where: { id, shopId } });
  if (!s) throw new AppError("NOT_FOUND", "No such scan in this shop.");
  return s;
}

export async function getScanDto(shopId: string, id: string): Promise<ScanDto> {
  const s = await findScan(shopId, id);
  return toScanDto(s, (await latestVersions([s.id])).get(s.id) ?? null);
}

/** Scans of a project, newest first. */
export async function listScans(shopId: string, projectId: string): Promise<ScanDto[]> {
  await findProject(shopId, projectId);
  const rows = await Scan.findAll({ where: { shopId, projectId }, order: [["createdAt", "DESC"]] });
  const versions = await latestVersions(rows.map((r) => r.id));
  return rows.map((r) => toScanDto(r, versions.get(r.id) ?? null));
}

const CONTENT_TYPES: Record<MeshReport["format"], string> = {
  obj: "model/obj",
  "stl-ascii": "model/stl",
  "stl-binary": "model/stl",
};

/**
 * POST /api/projects/[id]/scans: receives the multipart upload, checks the content is OBJ or STL (by its bytes, not
 * its name), stores the original in S3 with its exact length, creates the scan row (status "processing") and queues
 * the intake job.
 */
export async function uploadScan(req: Request, shopId: string, userId: string, projectId: string, maxBytes: number): Promise<ScanDto> {
  await findProject(shopId, projectId);
  const upload = await receiveUpload(req, maxBytes);
  try {
    const fields = scanUploadFieldsSchema.safeParse(upload.fields);
    if (!fields.success) throw new AppError("VALIDATION", formatIssues(fields.error));
    let format: MeshReport["format"];
    try {
      // the probe is the file's start; a binary STL is told by its facets there (see detectFormat, rule 5)
      format = detectFormat(upload.probe);
    } catch (e) {
      if (isGeometryError(e)) throw new AppError("VALIDATION", `file: ${e.message}`);
      throw e;
    }
    const id = randomUUID();
    const keys = scanKeys(id);
    await putObject(keys.original, createReadStream(upload.filePath), { contentLength: upload.byteSize, contentType: CONTENT_TYPES[format] });
    const scan = await Scan.create({
      id,
      shopId,
      projectId,
      createdById: userId,
      name: upload.fileName,
      units: fields.data.units,
      status: "processing",
      format,
      byteSize: upload.byteSize,
      originalKey: keys.original,
    });
    try {
      await enqueueScanIntake(scan.id);
    } catch (e) {
      await scan.update({ status: "failed", error: "The scan could not be queued for processing; upload it again." });
      throw e;
    }
    return toScanDto(scan, null);
  } finally {
    await upload.cleanup();
  }
}
