import path from "node:path";
import type { Profile } from "./profiles";
import type { StackSecrets } from "./secrets";
import { pgUrl } from "./postgres";
import { redisUrl } from "./redis";

/**
 * The environment of the web app, the worker and the tests of one local stack (names validated by lib/env.ts).
 * Local fakes for S3 and SMTP; DEV_MAILBOX on, so the .eml files under MAIL_DIR show in the app.
 */
export function stackEnv(profile: Profile, secrets: StackSecrets, nodeEnv: "production" | "development"): Record<string, string> {
  const appUrl = `http://127.0.0.1:${profile.ports.web}`;
  return {
    NODE_ENV: nodeEnv,
    PORT: String(profile.ports.web),
    APP_URL: appUrl,
    NEXTAUTH_URL: appUrl,
    NEXTAUTH_SECRET: secrets.nextauthSecret,
    DATABASE_URL: pgUrl({ port: profile.ports.pg, password: secrets.pgPassword, database: profile.database }),
    REDIS_URL: redisUrl(profile.ports.redis, secrets.redisPassword),
    S3_ENDPOINT: `http://127.0.0.1:${profile.ports.s3}`,
    S3_REGION: "us-east-1",
    S3_BUCKET: profile.bucket,
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(profile.ports.smtp),
    SMTP_SECURE: "false",
    SMTP_USER: "",
    SMTP_PASS: "",
    MAIL_FROM: "Peelform <no-reply@peelform.test>",
    MAIL_DIR: path.join(profile.dataDir, "mail"),
    PEELFORM_DATA_DIR: profile.dataDir,
    DEV_MAILBOX: "true",
    WORKER_CONCURRENCY: "2",
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true",
    NEXT_TELEMETRY_DISABLED: "1",
  };
}

/** Our process environment without values that would leak into the children from the caller's shell. */
export function childEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  const base = { ...process.env };
  // npm sets these for its own child; next/tsx must not inherit a parent's NODE_OPTIONS debugging flags by accident.
  delete base.NODE_OPTIONS;
  return { ...base, ...extra } as NodeJS.ProcessEnv;
}
