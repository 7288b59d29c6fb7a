import { Worker, type Processor } from "bullmq";
import type { Redis } from "ioredis";
import { getEnv } from "@/lib/env";
import { createRedis } from "@/lib/queue/connection";
import { workerTimingOptions } from "@/lib/jobs/queue-settings";

export interface WorkerEntry {
  queue: string;
  processor: Processor;
  concurrency?: number;
}

/**
 * One BullMQ Worker per entry with QUEUE_PREFIX and the lock/stalled timing of lib/jobs/queue-settings.ts, each on
 * its own connection. `close()` lets running jobs finish, then closes the connections. workers/main.ts builds its
 * workers the same way (it should pass workerTimingOptions() too); tests start a worker process with this.
 */
export async function startQueueWorkers(entries: readonly WorkerEntry[], log: (line: string) => void): Promise<{ workers: Worker[]; close: () => Promise<void> }> {
  const env = getEnv();
  const connections: Redis[] = [];
  const workers = entries.map(({ queue, processor, concurrency }) => {
    const connection = createRedis();
    connections.push(connection);
    const worker = new Worker(queue, processor, { connection, concurrency: concurrency ?? env.WORKER_CONCURRENCY, ...workerTimingOptions() });
    worker.on("error", (error) => log(`${queue}: ${error.message}`));
    worker.on("failed", (job, error) => log(`${queue}: job ${job?.id ?? "?"} failed (attempt ${job?.attemptsMade ?? "?"}): ${error.message}`));
    worker.on("completed", (job) => log(`${queue}: job ${job.id} done`));
    return worker;
  });
  await Promise.all(workers.map((w) => w.waitUntilReady()));
  return {
    workers,
    close: async () => {
      await Promise.all(workers.map((w) => w.close()));
      await Promise.all(connections.map((c) => c.quit().catch(() => undefined)));
    },
  };
}
