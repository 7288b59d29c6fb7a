import type { Processor } from "bullmq";
import { QUEUE_NAMES, type QueueName } from "@/lib/queue/connection";
import { processSendMail } from "./processors/send-mail";

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

export const PROCESSORS: ProcessorEntry[] = [{ queue: QUEUE_NAMES.mail, processor: processSendMail }];
