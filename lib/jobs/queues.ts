import { Queue, type JobsOptions } from "bullmq";
import type { Redis } from "ioredis";
import { createRedis, QUEUE_NAMES } from "@/lib/queue/connection";
import { queueSettings } from "@/lib/jobs/queue-settings";

/**
 * Producers of the scan-intake and flatten queues. Payloads carry ids only (`{ scanId }`, `{ patternId }`); the
 * worker loads everything else. The job id IS the scan or pattern id, so adding the same job twice is a no-op and
 * GET /api/jobs/[id] can find a flatten job from its pattern.
 *
 * Retries: a crash (S3 or database hiccup, a worker killed mid-job) is retried 3 times with exponential backoff from
 * 5 s; bad input fails at once (the processors throw UnrecoverableError). Finished jobs are kept a week so their
 * state and progress can still be read; the pattern/scan row holds the outcome for good.
 */
export const JOB_OPTIONS = {
  attempts: 3,
  backoff: { type: "exponential", delay: 5_000 },
  removeOnComplete: { age: 7 * 24 * 3600 },
  removeOnFail: { age: 30 * 24 * 3600 },
} as const satisfies JobsOptions;

export interface ScanIntakePayload {
  scanId: string;
}
export interface FlattenPayload {
  patternId: string;
}

let connection: Redis | undefined;
const queues = new Map<string, Queue>();

/** The process-wide producer of a queue (created on first use, with QUEUE_PREFIX). */
export function getJobQueue(name: (typeof QUEUE_NAMES)[keyof typeof QUEUE_NAMES]): Queue {
  let q = queues.get(name);
  if (!q) {
    connection ??= createRedis();
    q = new Queue(name, { connection, prefix: queueSettings().QUEUE_PREFIX });
    queues.set(name, q);
  }
  return q;
}

export async function enqueueScanIntake(scanId: string): Promise<string> {
  const job = await getJobQueue(QUEUE_NAMES.scanIntake).add("intake", { scanId } satisfies ScanIntakePayload, { ...JOB_OPTIONS, jobId: scanId });
  return String(job.id);
}

export async function enqueueFlatten(patternId: string): Promise<string> {
  const job = await getJobQueue(QUEUE_NAMES.flatten).add("flatten", { patternId } satisfies FlattenPayload, { ...JOB_OPTIONS, jobId: patternId });
  return String(job.id);
}

/** Closes the producers (tests, scripts). */
export async function closeJobQueues(): Promise<void> {
  const all = [...queues.values()];
  queues.clear();
  await Promise.all(all.map((q) => q.close()));
  await connection?.quit().catch(() => undefined);
  connection = undefined;
}
