import { UnrecoverableError, type Job } from "bullmq";
import { sendMail } from "@/lib/mail/send-mail";
import { mailJobSchema } from "@/lib/queue/mail-queue";

/**
 * Sends one queued e-mail. A payload that does not validate can never succeed: fail it without retries. SMTP errors
 * are thrown as they are, so BullMQ retries them with the queue's backoff.
 */
export async function processSendMail(job: Job): Promise<{ to: string }> {
  const parsed = mailJobSchema.safeParse(job.data);
  if (!parsed.success) {
    throw new UnrecoverableError(`invalid mail job ${job.id}: ${parsed.error.issues.map((i) => i.message).join("; ")}`);
  }
  await sendMail(parsed.data);
  return { to: parsed.data.to };
}
