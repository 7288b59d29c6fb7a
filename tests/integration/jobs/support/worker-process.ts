/**
 * A worker process for the queue tests: every registered processor (workers/registry.ts) on the QUEUE_PREFIX of its
 * environment, so a test runs its own worker on a fresh prefix next to the test stack's worker. Prints "ready" once
 * the workers listen; SIGTERM closes them (running jobs finish); SIGKILL is the crash the tests simulate.
 */
import { startQueueWorkers } from "@/lib/jobs/start-workers";
import { PROCESSORS } from "@/workers/registry";

const log = (line: string) => process.stdout.write(`worker[${process.pid}] ${line}\n`);

const { close } = await startQueueWorkers(PROCESSORS, log);
log("ready");
process.on("SIGTERM", () => {
  void close().then(() => process.exit(0));
});
