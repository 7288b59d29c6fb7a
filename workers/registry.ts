import type { Processor } from "bullmq";
import { QUEUE_NAMES, type QueueName } from "@/lib/queue/connection";
import { processSendMail } from "./processors/send-mail";
import { processScanIntakeJob } from "./processors/scan-intake";
import { processFlattenJob } from "./processors/flatten-pattern";
import { queueSettings } from "@/lib/jobs/queue-settings";

/**
 * Which processor serves which queue. One file per processor in workers/processors/; add a queue name in
 * lib/queue/connection.ts, a processor file, and a line here.
 */
export interface ProcessorEntry {
  queue: QueueName;
  processor: Processor;
  /** Per-queue concurrency; defaults to WORKER_CONCURRENCY. */
  concurrency?: number;
}

export const PROCESSORS: ProcessorEntry[] = [
  { queue: QUEUE_NAMES.mail, processor: processSendMail },
  // concurrency read when the workers start (getters), so importing the registry never reads the environment
  {
    queue: QUEUE_NAMES.scanIntake,
    processor: processScanIntakeJob,
    get concurrency() {
      return queueSettings().SCAN_INTAKE_CONCURRENCY;
    },
  },
  {
    queue: QUEUE_NAMES.flatten,
    processor: processFlattenJob,
    get concurrency() {
      return queueSettings().FLATTEN_CONCURRENCY;
    },
  },
];
