import { QUEUE_NAMES } from "@/lib/queue/connection";
import { MAIL_JOB_OPTIONS, mailJobSchema, type MailJob } from "@/lib/queue/mail-queue";
import { getJobQueue } from "@/lib/jobs/queues";

/**
 * Queues an e-mail on the mail queue (sent by workers/processors/send-mail.ts) under a fixed job id, so a job that
 * is retried after it already queued its notice does not send it twice. Kept a day after sending for the same
 * reason. Uses QUEUE_PREFIX like the other job queues.
 */
export async function enqueueNoticeMail(dedupeId: string, message: MailJob): Promise<void> {
  const data = mailJobSchema.parse(message);
  await getJobQueue(QUEUE_NAMES.mail).add("send", data, { ...MAIL_JOB_OPTIONS, removeOnComplete: { age: 24 * 3600 }, jobId: dedupeId });
}
