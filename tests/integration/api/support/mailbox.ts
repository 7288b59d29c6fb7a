import fs from "node:fs/promises";
import path from "node:path";
import { simpleParser, type AddressObject } from "mailparser";

/**
 * Reads what sendMail delivered: the SMTP fake of the test stack stores each message as MAIL_DIR/<id>.eml. Returns
 * the newest message to `to` (parsed, text body), or null.
 */
export async function latestMailTo(to: string): Promise<{ subject: string; text: string } | null> {
  const dir = process.env.MAIL_DIR;
  if (!dir) throw new Error("MAIL_DIR is not set: run the integration tests through npm test (or start the SMTP fake).");
  const names = (await fs.readdir(dir)).filter((n) => n.endsWith(".eml")).sort().reverse();
  for (const name of names) {
    const raw = await fs.readFile(path.join(dir, name));
    if (!raw.includes(Buffer.from(to))) continue;
    const mail = await simpleParser(raw);
    const recipients = ([] as AddressObject[]).concat(mail.to ?? []).flatMap((a) => a.value.map((v) => v.address?.toLowerCase()));
    if (recipients.includes(to.toLowerCase())) return { subject: mail.subject ?? "", text: mail.text ?? "" };
  }
  return null;
}

/** The token of the first `${APP_URL}/<kind>/<token>` link in a text. */
export function linkToken(text: string, kind: "invite" | "reset-password"): string {
  const base = (process.env.APP_URL ?? "").replace(/\/+$/, "");
  const m = new RegExp(`${base.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}/${kind}/([A-Za-z0-9_-]{43})`).exec(text);
  if (!m) throw new Error(`no ${kind} link in: ${text}`);
  return m[1];
}
