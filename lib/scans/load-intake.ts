import { AppError } from "@/lib/errors/app-error";
import type { IntakeResult } from "@/lib/geometry/intake/read-mesh";
import { getObjectBuffer } from "@/lib/storage/s3";
import { decodeIntake } from "@/lib/scans/mesh-binary";
import type { Scan } from "@/models";

/**
 * The scan's intake result as the intake job made it (lossless copy from S3 + the report of the row), for seam
 * checks and flattening. @throws AppError CONFLICT while the scan is not ready
 */
export async function loadIntake(scan: Scan): Promise<IntakeResult> {
  if (scan.status !== "ready" || !scan.intakeKey || !scan.report) {
    throw new AppError(
      "CONFLICT",
      scan.status === "failed" ? `This scan could not be read: ${scan.error ?? "see its report"}` : "This scan is still being processed; try again in a moment.",
    );
  }
  const bytes = await getObjectBuffer(scan.intakeKey);
  if (!bytes) throw new Error(`intake copy of scan ${scan.id} is missing from storage (${scan.intakeKey})`);
  const { mesh, inputToWorking } = decodeIntake(bytes);
  return { mesh, inputToWorking, report: scan.report };
}
