import { z } from "zod";
import { getEnv } from "@/lib/env";
import { getMailTransport } from "./transport";

export const mailMessageSchema = z.object({
  to: z.email({ message: "to: expected an e-mail address" }),
  subject: z.string().trim().min(1, "subject: must not be empty").max(200, "subject: at most 200 characters"),
  text: z.string().min(1, "text: must not be empty").max(100_000, "text: at most 100000 characters"),
  html: z.string().max(500_000, "html: at most 500000 characters").optional(),
});

export type MailMessage = z.infer<typeof mailMessageSchema>;

/**
 * Sends one e-mail now through the SMTP transport (sender MAIL_FROM). Rejects when the server refuses it; for
 * sending with retries from a request, queue it with `enqueueMail` (lib/queue/mail-queue.ts) instead.
 */
export async function sendMail(message: MailMessage): Promise<void> {
  const parsed = mailMessageSchema.parse(message);
  await getMailTransport().sendMail({
    from: getEnv().MAIL_FROM,
    to: parsed.to,
    subject: parsed.subject,
    text: parsed.text,
    html: parsed.html,
  });
}
