import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { assertPortFree } from "./ports";
import type { RunningService } from "./s3-fake";

/**
 * Local stand-in for an outgoing mail server: smtp-server on 127.0.0.1 that accepts every message and stores it
 * as <mailDir>/<time>-<random>.eml (the dev mailbox reads them). Writes go to a temporary name first, so a reader
 * never sees half a message.
 */
export interface SmtpFakeOptions {
  mailDir: string;
  port: number;
  /** Largest message accepted, bytes. */
  maxBytes?: number;
}

export function newMessageId(now = new Date()): string {
  const stamp = now.toISOString().replace(/[-:]/g, "").replace(/\.(\d{3})Z$/, "$1Z");
  return `${stamp}-${randomBytes(4).toString("hex")}`;
}

export async function startSmtpFake(opts: SmtpFakeOptions): Promise<RunningService> {
  await assertPortFree(opts.port, "the SMTP fake", "SMTP_PORT / TEST_SMTP_PORT");
  fs.mkdirSync(opts.mailDir, { recursive: true, mode: 0o700 });
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    // Any user/password is accepted; the fake only listens on loopback.
    onAuth: (_auth, _session, callback) => callback(null, { user: "local" }),
    size: opts.maxBytes ?? 25 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      const id = newMessageId();
      const tmp = path.join(opts.mailDir, `.${id}.tmp`);
      const out = fs.createWriteStream(tmp, { mode: 0o600 });
      stream.pipe(out);
      stream.on("error", (error) => callback(error));
      out.on("error", (error) => callback(error));
      out.on("finish", () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          fs.rmSync(tmp, { force: true });
          callback(Object.assign(new Error("message too large"), { responseCode: 552 }));
          return;
        }
        fs.renameSync(tmp, path.join(opts.mailDir, `${id}.eml`));
        callback(null, `stored as ${id}`);
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  server.on("error", (error) => process.stderr.write(`smtp fake: ${error.message}\n`));
  return { close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
