import { getEnv } from "@/lib/env";
import { queueSettings } from "@/lib/jobs/queue-settings";
import { startQueueWorkers } from "@/lib/jobs/start-workers";
import { PROCESSORS } from "./registry";

/**
 * The worker process: one BullMQ Worker per registered queue (workers/registry.ts), all in this process, with
 * QUEUE_PREFIX and the lock/stalled timing of lib/jobs/queue-settings.ts. Stateless: run as many of these on as many
 * machines as needed against one Redis and one PostgreSQL. SIGTERM/SIGINT let running jobs finish
 * (worker.close()) and exit 0; a crash exits non-zero, and `npm start` restarts the process with backoff.
 */
function log(message: string): void {
  process.stdout.write(`${new Date().toISOString()} worker[${process.pid}] ${message}\n`);
}

async function main(): Promise<void> {
  const env = getEnv();
  const { close } = await startQueueWorkers(PROCESSORS, log);
  log(`ready: ${PROCESSORS.map((p) => p.queue).join(", ")} (concurrency ${env.WORKER_CONCURRENCY}, prefix ${queueSettings().QUEUE_PREFIX})`);

  let closing = false;
  const shutdown = async (signal: string) => {
    if (closing) return;
    closing = true;
    log(`${signal}: finishing running jobs`);
    const timer = setTimeout(() => {
      log("jobs did not finish within 30 s; exiting");
      process.exit(1);
    }, 30_000);
    await close();
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
