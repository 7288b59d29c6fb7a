import { Worker } from "bullmq";
import type { Redis } from "ioredis";
import { getEnv } from "@/lib/env";
import { createRedis } from "@/lib/queue/connection";
import { PROCESSORS } from "./registry";

/**
 * The worker process: one BullMQ Worker per registered queue, all in this process. Stateless: run as many of these
 * on as many machines as needed against one Redis and one PostgreSQL. SIGTERM/SIGINT finish the running jobs
 * (worker.close waits for them) and exit 0.
 */
function log(message: string): void {
  process.stdout.write(`${new Date().toISOString()} worker[${process.pid}] ${message}\n`);
}

async function main(): Promise<void> {
  const env = getEnv();
  const connections: Redis[] = [];
  const workers = PROCESSORS.map(({ queue, processor, concurrency }) => {
    const connection = createRedis();
    connections.push(connection);
    const worker = new Worker(queue, processor, { connection, concurrency: concurrency ?? env.WORKER_CONCURRENCY });
    worker.on("error", (error) => log(`${queue}: ${error.message}`));
    worker.on("failed", (job, error) =>
      log(`${queue}: job ${job?.id ?? "?"} failed (attempt ${job?.attemptsMade ?? "?"}): ${error.message}`),
    );
    worker.on("completed", (job) => log(`${queue}: job ${job.id} done`));
    return worker;
  });
  await Promise.all(workers.map((w) => w.waitUntilReady()));
  log(`ready: ${PROCESSORS.map((p) => p.queue).join(", ")} (concurrency ${env.WORKER_CONCURRENCY})`);

  let closing = false;
  const shutdown = async (signal: string) => {
    if (closing) return;
    closing = true;
    log(`${signal}: finishing running jobs`);
    const timer = setTimeout(() => {
      log("jobs did not finish within 30 s; exiting");
      process.exit(1);
    }, 30_000);
    await Promise.all(workers.map((w) => w.close()));
    await Promise.all(connections.map((c) => c.quit().catch(() => undefined)));
    clearTimeout(timer);
    log("stopped");
    process.exit(0);
  };
  process.on("SIGTERM", () => void shutdown("SIGTERM"));
  process.on("SIGINT", () => void shutdown("SIGINT"));
}

main().catch((error: unknown) => {
  log(`could not start: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
