import { UnrecoverableError, type Job } from "bullmq";
import { z } from "zod";
import { getSequelize } from "@/lib/db/sequelize";
import { processScanIntake } from "@/lib/scans/process-intake";
import { Scan } from "@/models";

const payloadSchema = z.object({ scanId: z.uuid() });

/**
 * Intake of an uploaded scan (lib/scans/process-intake.ts). A bad payload, an unknown scan or a mesh the geometry
 * core refuses fails without retries; storage and database errors are thrown and retried with backoff.
 */
export async function processScanIntakeJob(job: Job): Promise<{ faces: number }> {
  const parsed = payloadSchema.safeParse(job.data);
  if (!parsed.success) throw new UnrecoverableError(`invalid scan-intake job ${job.id}: expected { scanId }`);
  let outcome;
  try {
    outcome = await processScanIntake(parsed.data.scanId, (pct) => job.updateProgress(pct));
  } catch (e) {
    // the last try: leave the scan with a sentence instead of "processing" for ever
    if (job.attemptsMade + 1 >= (job.opts.attempts ?? 1)) {
      getSequelize();
      await Scan.update(
        { status: "failed", error: "The scan could not be processed because of a problem on our side; upload it again." },
        { where: { id: parsed.data.scanId, status: "processing" } },
      ).catch(() => undefined);
    }
    throw e;
  }
  if (outcome === null) throw new UnrecoverableError(`scan ${parsed.data.scanId} no longer exists`);
  if (!outcome.ok) throw new UnrecoverableError(outcome.error);
  await job.updateProgress(100);
  return { faces: outcome.faces };
}
