import { UnrecoverableError, type Job } from "bullmq";
import { z } from "zod";
import { BadFlattenInput, processFlatten } from "@/lib/patterns-store/process-flatten";

const payloadSchema = z.object({ patternId: z.uuid() });

/**
 * Flattens one pattern (lib/patterns-store/process-flatten.ts). Bad input (payload, parameters, seams, a mesh the
 * geometry core refuses) fails at once; a crash is retried with the queue's backoff. A worker killed mid-job
 * leaves the job to BullMQ's stalled-job check, which hands it to another worker; the result is stored so that the
 * second run replaces, never adds to, anything the first one wrote.
 */
export async function processFlattenJob(job: Job): Promise<{ pieces: number }> {
  const parsed = payloadSchema.safeParse(job.data);
  if (!parsed.success) throw new UnrecoverableError(`invalid flatten job ${job.id}: expected { patternId }`);
  try {
    const out = await processFlatten(parsed.data.patternId, {
      progress: (pct) => job.updateProgress(pct),
      lastAttempt: job.attemptsMade + 1 >= (job.opts.attempts ?? 1),
    });
    if (out === null) throw new UnrecoverableError(`pattern ${parsed.data.patternId} no longer exists`);
    return out;
  } catch (e) {
    if (e instanceof BadFlattenInput) throw new UnrecoverableError(e.message);
    throw e;
  }
}
