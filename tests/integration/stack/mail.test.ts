import "@/tests/support/test-env";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { QueueEvents } from "bullmq";
import { afterAll, describe, expect, it } from "vitest";
import { clearEnvCache, getEnv } from "@/lib/env";
import { queueSettings } from "@/lib/jobs/queue-settings";
import { listMailbox, MailboxDisabledError, readMailboxMessage } from "@/lib/mail/mailbox";
import { sendMail } from "@/lib/mail/send-mail";
import { createRedis, QUEUE_NAMES } from "@/lib/queue/connection";
import { closeMailQueue, enqueueMail } from "@/lib/queue/mail-queue";

/** E-mail through the SMTP fake of the test stack into MAIL_DIR, read back with the dev mailbox functions. */
describe("mail: sendMail → SMTP fake → .eml → mailbox", () => {
  afterAll(async () => {
    await closeMailQueue();
  });

  it("stores a sent message as .eml and parses it back", async () => {
    const subject = `Invitation to the Harbour Parade shop ${randomBytes(4).toString("hex")}`;
    await sendMail({
      to: "designer@peelform.test",
      subject,
      text: "Open http://127.0.0.1/invite/abc to join. Ventilate when gluing.",
      html: "<p>Open <a href='http://127.0.0.1/invite/abc'>the invitation</a> to join.</p>",
    });
    const entry = (await listMailbox()).find((m) => m.subject === subject);
    expect(entry).toBeDefined();
    expect(entry!.to).toContain("designer@peelform.test");
    expect(entry!.from).toContain("no-reply@peelform.test");
    expect(fs.existsSync(path.join(getEnv().MAIL_DIR!, `${entry!.id}.eml`))).toBe(true);

    const message = await readMailboxMessage(entry!.id);
    expect(message?.text).toContain("/invite/abc");
    expect(message?.html).toContain("<a href");
  });

  it("answers null for unknown or malformed ids", async () => {
    expect(await readMailboxMessage("20000101T000000000Z-00000000")).toBeNull();
    expect(await readMailboxMessage("../secrets")).toBeNull();
  });

  it("refuses bad messages with the field named", async () => {
    await expect(sendMail({ to: "not-an-address", subject: "x", text: "y" })).rejects.toThrow(/to: expected an e-mail address/);
  });

  it("delivers a queued message through the worker process", async () => {
    const subject = `Pattern approved ${randomBytes(4).toString("hex")}`;
    const connection = createRedis();
    const events = new QueueEvents(QUEUE_NAMES.mail, { connection, prefix: queueSettings().QUEUE_PREFIX });
    try {
      const completed = new Set<string>();
      const failures = new Map<string, string>();
      let notify = () => {};
      events.on("completed", ({ jobId }) => {
        completed.add(jobId);
        notify();
      });
      events.on("failed", ({ jobId, failedReason }) => {
        failures.set(jobId, failedReason);
        notify();
      });
      await events.waitUntilReady();
      const id = await enqueueMail({ to: "fabricator@peelform.test", subject, text: "The cut list is ready." });
      await new Promise<void>((resolve, reject) => {
        notify = () => {
          if (completed.has(id)) resolve();
          else if (failures.has(id)) reject(new Error(`mail job failed: ${failures.get(id)}`));
        };
        notify();
      });
      const entry = (await listMailbox()).find((m) => m.subject === subject);
      expect(entry?.to).toContain("fabricator@peelform.test");
    } finally {
      await events.close();
      await connection.quit();
    }
  });

  it("is off unless DEV_MAILBOX is on", async () => {
    const before = process.env.DEV_MAILBOX;
    process.env.DEV_MAILBOX = "false";
    clearEnvCache();
    try {
      await expect(listMailbox()).rejects.toBeInstanceOf(MailboxDisabledError);
      await expect(readMailboxMessage("x")).rejects.toBeInstanceOf(MailboxDisabledError);
    } finally {
      process.env.DEV_MAILBOX = before;
      clearEnvCache();
    }
  });
});
