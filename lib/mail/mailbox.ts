import fs from "node:fs/promises";
import path from "node:path";
import { simpleParser, type AddressObject } from "mailparser";
import { getEnv } from "@/lib/env";

/**
 * The dev mailbox: the .eml files that the local SMTP fake stored under MAIL_DIR, parsed with mailparser. Only
 * available when DEV_MAILBOX is on; otherwise every call throws MailboxDisabledError (pages answer 404).
 * `html` is the sender's HTML as is: show it in a sandboxed iframe (srcDoc + sandbox=""), never inline.
 */
export class MailboxDisabledError extends Error {
  constructor() {
    super("the dev mailbox is off (set DEV_MAILBOX=true and MAIL_DIR)");
    this.name = "MailboxDisabledError";
  }
}

export interface MailboxEntry {
  id: string;
  subject: string;
  from: string;
  to: string;
  /** ISO 8601 date from the Date header, or the file time. */
  date: string;
  sizeBytes: number;
}

export interface MailboxMessage extends MailboxEntry {
  text: string;
  html: string | null;
}

const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_-]{0,100}$/;
const LIST_LIMIT = 200;

export function isMailboxEnabled(): boolean {
  const env = getEnv();
  return env.DEV_MAILBOX && Boolean(env.MAIL_DIR);
}

function mailDir(): string {
  const env = getEnv();
  if (!env.DEV_MAILBOX || !env.MAIL_DIR) throw new MailboxDisabledError();
  return env.MAIL_DIR;
}

function addressText(address: AddressObject | AddressObject[] | undefined): string {
  if (!address) return "";
  return (Array.isArray(address) ? address : [address]).map((a) => a.text).join(", ");
}

async function parseFile(dir: string, id: string): Promise<MailboxMessage> {
  const file = path.join(dir, `${id}.eml`);
  const [raw, stat] = await Promise.all([fs.readFile(file), fs.stat(file)]);
  const mail = await simpleParser(raw);
  return {
    id,
    subject: mail.subject ?? "(no subject)",
    from: addressText(mail.from),
    to: addressText(mail.to),
    date: (mail.date ?? stat.mtime).toISOString(),
    sizeBytes: stat.size,
    text: mail.text ?? "",
    html: typeof mail.html === "string" ? mail.html : null,
  };
}

/** Newest first, at most 200 messages. An absent folder is an empty mailbox. */
export async function listMailbox(): Promise<MailboxEntry[]> {
  const dir = mailDir();
  let names: string[];
  try {
    names = await fs.readdir(dir);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw error;
  }
  const ids = names
    .filter((n) => n.endsWith(".eml"))
    .map((n) => n.slice(0, -4))
    .filter((id) => ID_PATTERN.test(id))
    .sort()
    .reverse()
    .slice(0, LIST_LIMIT);
  const messages = await Promise.all(ids.map((id) => parseFile(dir, id)));
  return messages
    .map(({ text: _text, html: _html, ...entry }) => entry)
    .sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : b.id.localeCompare(a.id)));
}

/** One message with its text and HTML bodies, or null for an unknown (or malformed) id. */
export async function readMailboxMessage(id: string): Promise<MailboxMessage | null> {
  const dir = mailDir();
  if (!ID_PATTERN.test(id)) return null;
  try {
    return await parseFile(dir, id);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw error;
  }
}
