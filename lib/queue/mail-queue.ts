import { Queue } from "bullmq";
import type { Redis } from "ioredis";
import { mailMessageSchema, type MailMessage } from "@/lib/mail/send-mail";
import { queueSettings } from "@/lib/jobs/queue-settings";
import { createRedis, QUEUE_NAMES } from "./connection";

/**
 * The "mail" queue: the web app enqueues a message, a worker sends it (workers/processors/send-mail.ts). SMTP
 * hiccups are retried with exponential backoff (5 tries over about 30 s); a malformed message fails at once.
 * The job holds the rendered message (an e-mail carries its link by nature) and is removed once sent.
 */
export const mailJobSchema = mailMessageSchema;
export type MailJob = MailMessage;

export const MAIL_JOB_OPTIONS = {
  attempts: 5,
  backoff: { type: "exponential", delay: 2_000 },
  removeOnComplete: true,
  removeOnFail: { age: 7 * 24 * 3600 },
} as const;

let queue: Queue | undefined;
let connection: Redis | undefined;

/** The process-wide producer side of the mail queue (created on first use). */
export function getMailQueue(): Queue {
  if (!queue) {
    connection = createRedis();
    // Same key prefix as the workers (QUEUE_PREFIX), or they would never see the job.
    queue = new Queue(QUEUE_NAMES.mail, { connection, prefix: queueSettings().QUEUE_PREFIX });
  }
  return queue;
}

/** Validates and queues one e-mail; resolves with the job id once Redis has it. */
export async function enqueueMail(message: MailJob): Promise<string> {
  const data = mailJobSchema.parse(message);
  const job = await getMailQueue().add("send", data, MAIL_JOB_OPTIONS);
  return String(job.id);
}

/** Closes the producer (tests, scripts). */
export async function closeMailQueue(): Promise<void> {
  await queue?.close();
  await connection?.quit();
  queue = undefined;
  connection = undefined;
}
