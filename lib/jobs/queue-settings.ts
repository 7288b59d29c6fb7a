import { z } from "zod";

/**
 * Settings of the scan and flatten queues, from the environment (validated once, here, with zod):
 * - QUEUE_PREFIX: BullMQ key prefix (default "bull"). Tests run their own worker process on a fresh prefix so it
 *   never collides with the stack's worker; every producer and worker of one deployment must use the same prefix.
 * - JOB_LOCK_DURATION_MS / JOB_STALLED_INTERVAL_MS: how long a worker holds a job without renewing its lock, and how
 *   often workers look for jobs whose worker died (stalled-job recovery). Defaults are BullMQ's (30 s each).
 * - FLATTEN_CONCURRENCY / SCAN_INTAKE_CONCURRENCY: jobs per worker process (default WORKER_CONCURRENCY).
 * - SCAN_MAX_BYTES: upload limit (default 300 MiB: a 1M-face binary STL is 50 MB, its ASCII form ~250 MB).
 * These belong in lib/env.ts; they live here until the stack owner moves them.
 */
const positiveInt = (min: number, max: number) =>
  z
    .string()
    .optional()
    .transform((v, ctx): number | undefined => {
      if (v === undefined || v.trim() === "") return undefined;
      const n = Number(v);
      if (!Number.isInteger(n) || n < min || n > max) {
        ctx.addIssue({ code: "custom", message: `expected a whole number from ${min} to ${max}` });
        return z.NEVER;
      }
      return n;
    });

const settingsSchema = z.object({
  QUEUE_PREFIX: z
    .string()
    .optional()
    .transform((v) => (v === undefined || v.trim() === "" ? "bull" : v.trim()))
    .pipe(z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, "expected 1-40 letters, digits, _ or -")),
  JOB_LOCK_DURATION_MS: positiveInt(1_000, 3_600_000),
  JOB_STALLED_INTERVAL_MS: positiveInt(500, 3_600_000),
  FLATTEN_CONCURRENCY: positiveInt(1, 64),
  SCAN_INTAKE_CONCURRENCY: positiveInt(1, 64),
  SCAN_MAX_BYTES: positiveInt(1024, 4 * 1024 * 1024 * 1024).transform((v) => v ?? 300 * 1024 * 1024),
});

export type QueueSettings = z.output<typeof settingsSchema>;

let cached: QueueSettings | undefined;

/** The validated settings (read once; clearQueueSettings() makes the next call read process.env again). */
export function queueSettings(): QueueSettings {
  if (cached) return cached;
  const r = settingsSchema.safeParse(process.env);
  if (!r.success) {
    const lines = r.error.issues.map((i) => `  - ${String(i.path[0])}: ${i.message}`).join("\n");
    throw new Error(`Invalid environment configuration:\n${lines}`);
  }
  cached = r.data;
  return cached;
}

export function clearQueueSettings(): void {
  cached = undefined;
}

/** Options every Worker of these queues gets (prefix, lock and stalled-job timing). */
export function workerTimingOptions(): { prefix: string; lockDuration?: number; stalledInterval?: number; maxStalledCount: number } {
  const s = queueSettings();
  return {
    prefix: s.QUEUE_PREFIX,
    ...(s.JOB_LOCK_DURATION_MS ? { lockDuration: s.JOB_LOCK_DURATION_MS } : {}),
    ...(s.JOB_STALLED_INTERVAL_MS ? { stalledInterval: s.JOB_STALLED_INTERVAL_MS } : {}),
    // a job whose worker died twice is failed instead of being taken up forever
    maxStalledCount: 2,
  };
}
