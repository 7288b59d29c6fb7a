import { clearEnvCache, getEnv } from "@/lib/env";

/**
 * Settings of the job queues, validated with the rest of the environment in lib/env.ts:
 * - QUEUE_PREFIX: BullMQ key prefix (default "bull"). Tests run their own worker process on a fresh prefix so it
 *   never collides with the stack's worker; every producer and worker of one deployment must use the same prefix.
 * - JOB_LOCK_DURATION_MS / JOB_STALLED_INTERVAL_MS: how long a worker holds a job without renewing its lock, and how
 *   often workers look for jobs whose worker died (stalled-job recovery). Defaults are BullMQ's (30 s each).
 * - FLATTEN_CONCURRENCY / SCAN_INTAKE_CONCURRENCY: jobs per worker process (default WORKER_CONCURRENCY).
 * - SCAN_MAX_BYTES: upload limit (default 300 MiB: a 1M-face binary STL is 50 MB, its ASCII form ~250 MB).
 */
export interface QueueSettings {
  QUEUE_PREFIX: string;
  JOB_LOCK_DURATION_MS: number | undefined;
  JOB_STALLED_INTERVAL_MS: number | undefined;
  FLATTEN_CONCURRENCY: number | undefined;
  SCAN_INTAKE_CONCURRENCY: number | undefined;
  SCAN_MAX_BYTES: number;
}

export function queueSettings(): QueueSettings {
  const env = getEnv();
  return {
    QUEUE_PREFIX: env.QUEUE_PREFIX,
    JOB_LOCK_DURATION_MS: env.JOB_LOCK_DURATION_MS,
    JOB_STALLED_INTERVAL_MS: env.JOB_STALLED_INTERVAL_MS,
    FLATTEN_CONCURRENCY: env.FLATTEN_CONCURRENCY,
    SCAN_INTAKE_CONCURRENCY: env.SCAN_INTAKE_CONCURRENCY,
    SCAN_MAX_BYTES: env.SCAN_MAX_BYTES,
  };
}

/** Makes the next call read process.env again (tests that change these variables). */
export function clearQueueSettings(): void {
  clearEnvCache();
}

/** Options every Worker of the queues gets (prefix, lock and stalled-job timing). */
export function workerTimingOptions(): { prefix: string; lockDuration?: number; stalledInterval?: number; maxStalledCount: number } {
  const s = queueSettings();
  return {
    prefix: s.QUEUE_PREFIX,
    ...(s.JOB_LOCK_DURATION_MS ? { lockDuration: s.JOB_LOCK_DURATION_MS } : {}),
    ...(s.JOB_STALLED_INTERVAL_MS ? { stalledInterval: s.JOB_STALLED_INTERVAL_MS } : {}),
    // a job whose worker died twice is failed instead of being taken up for ever
    maxStalledCount: 2,
  };
}
