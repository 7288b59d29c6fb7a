import { isGeometryError } from "@/lib/geometry/errors";
import { getSequelize } from "@/lib/db/sequelize";
import { runCompute } from "@/lib/jobs/run-compute";
import { getObjectBuffer, putObject } from "@/lib/storage/s3";
import { encodeIntake, encodeViewerMesh } from "@/lib/scans/mesh-binary";
import { scanKeys } from "@/lib/scans/storage-keys";
import { Scan } from "@/models";

/** Outcome of one intake attempt: done, or bad input with the sentence to show (never retried). */
export type IntakeOutcome = { ok: true; faces: number } | { ok: false; error: string };

/**
 * The scan-intake job: original from S3 → readMesh (parse, weld, clean, report, decimate over the face budget) in
 * a compute thread → viewer mesh and lossless intake copy to S3 (keys from the scan id: a retry overwrites) → the
 * row becomes "ready" with report and counts. Bad input marks the row "failed" with the geometry core's sentence.
 * Storage or database errors are thrown for BullMQ to retry.
 */
export async function processScanIntake(scanId: string, progress: (pct: number) => Promise<void>): Promise<IntakeOutcome | null> {
  getSequelize();
  const scan = await Scan.findByPk(scanId);
  if (!scan) return null;
  if (scan.status === "ready") return { ok: true, faces: scan.faceCount ?? 0 };
  const bytes = await getObjectBuffer(scan.originalKey);
  if (!bytes) {
    await scan.update({ status: "failed", error: "The uploaded file is missing from storage; upload it again." });
    return { ok: false, error: "original missing" };
  }
  await progress(10);
  let result;
  try {
    result = await runCompute({ kind: "intake", bytes: new Uint8Array(bytes), units: scan.units });
  } catch (e) {
    if (!isGeometryError(e)) throw e;
    await scan.update({ status: "failed", error: e.message });
    return { ok: false, error: e.message };
  }
  await progress(70);
  const mesh = { positions: result.positions, triangles: result.triangles };
  const keys = scanKeys(scan.id);
  await putObject(keys.working, encodeViewerMesh(mesh), { contentType: "application/octet-stream" });
  await putObject(keys.intake, encodeIntake({ mesh, inputToWorking: result.inputToWorking }), { contentType: "application/octet-stream" });
  await progress(90);
  await scan.update({
    status: "ready",
    error: null,
    format: result.report.format,
    report: result.report,
    workingKey: keys.working,
    intakeKey: keys.intake,
    vertexCount: result.positions.length / 3,
    faceCount: result.triangles.length / 3,
  });
  return { ok: true, faces: result.triangles.length / 3 };
}
