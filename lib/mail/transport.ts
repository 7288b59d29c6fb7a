import nodemailer, { type Transporter } from "nodemailer";
import { getEnv } from "@/lib/env";

/**
 * One nodemailer SMTP transport per process, configured from the environment: the local SMTP fake for
 * `npm start` / `npm test` (127.0.0.1, no TLS, no auth), a real relay in production (SMTP_HOST, SMTP_PORT,
 * SMTP_SECURE, SMTP_USER, SMTP_PASS).
 */
let transport: Transporter | undefined;

export function getMailTransport(): Transporter {
  if (transport) return transport;
  const env = getEnv();
  transport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS } : undefined,
    // The fake on loopback offers no STARTTLS; a remote relay must.
    ignoreTLS: isLoopback(env.SMTP_HOST),
    requireTLS: !env.SMTP_SECURE && !isLoopback(env.SMTP_HOST),
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return transport;
}

function isLoopback(host: string): boolean {
  return host === "localhost" || host === "::1" || host.startsWith("127.");
}
