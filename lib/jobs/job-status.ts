import { QUEUE_NAMES } from "@/lib/queue/connection";
import { getJobQueue } from "@/lib/jobs/queues";
import type { Pattern } from "@/models";

export type JobState = "queued" | "active" | "completed" | "failed";

/** GET /api/jobs/[id]: the flatten job of a pattern. */
export interface JobStatusDto {
  id: string;
  state: JobState;
  /** 0-100 */
  progress: number;
  patternId: string;
  error: string | null;
}

const STALLED_TOO_OFTEN = /stalled more than allowable limit/i;

/**
 * The job's state from BullMQ (waiting/delayed/prioritized → queued, active, completed, failed), with the pattern
 * row as the source of truth once it is final (a job removed after a week still answers from the row). A failed
 * attempt that will be retried shows as queued. Failure reasons are the worker's one sentence; a job whose
 * worker died too often gets a sentence of its own.
 */
export async function flattenJobStatus(pattern: Pattern): Promise<JobStatusDto> {
  const base = { id: pattern.id, patternId: pattern.id };
  if (pattern.status === "ready") return { ...base, state: "completed", progress: 100, error: null };
  const job = await getJobQueue(QUEUE_NAMES.flatten).getJob(pattern.id);
  if (!job) {
    if (pattern.status === "failed") return { ...base, state: "failed", progress: 0, error: pattern.error ?? "The pattern could not be made." };
    return { ...base, state: "queued", progress: 0, error: null };
  }
  const raw = await job.getState();
  const progress = typeof job.progress === "number" ? Math.max(0, Math.min(100, Math.round(job.progress))) : 0;
  if (raw === "completed") return { ...base, state: "completed", progress: 100, error: null };
  if (raw === "failed" || pattern.status === "failed") {
    const reason = pattern.error ?? (job.failedReason && STALLED_TOO_OFTEN.test(job.failedReason)
      ? "The worker stopped twice while making this pattern; queue it again."
      : job.failedReason || "The pattern could not be made.");
    return { ...base, state: "failed", progress, error: reason };
  }
  return { ...base, state: raw === "active" ? "active" : "queued", progress, error: null };
}
