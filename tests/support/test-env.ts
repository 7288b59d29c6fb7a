import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

/**
 * The environment of the test stack for integration and e2e tests. `npm test` exports it already
 * (PEELFORM_TEST_STACK=1); when a test runs on its own (`npx vitest run --project integration …`) against a stack
 * kept up with `npm run test:stack`, it is read from .data-test/stack-env.json. Importing this module fills
 * process.env (NODE_ENV stays vitest's "test").
 */
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

export function loadTestStackEnv(): void {
  if (process.env.PEELFORM_TEST_STACK === "1") return;
  const dataDir = path.resolve(root, process.env.PEELFORM_TEST_DATA_DIR || ".data-test");
  const file = path.join(dataDir, "stack-env.json");
  if (!fs.existsSync(file)) {
    throw new Error(`no test stack is running (${file} is missing): run \`npm test\`, or keep one up with \`npm run test:stack\` in another shell`);
  }
  const env = JSON.parse(fs.readFileSync(file, "utf8")) as Record<string, string>;
  for (const [key, value] of Object.entries(env)) if (key !== "NODE_ENV") process.env[key] = value;
  process.env.PEELFORM_TEST_STACK = "1";
}

loadTestStackEnv();

/** Base URL of the production web app of the test stack, e.g. http://127.0.0.1:3100 (no trailing slash). */
export function appUrl(): string {
  const url = process.env.APP_URL;
  if (!url) throw new Error("APP_URL is not set: the test stack environment is missing");
  return url.replace(/\/$/, "");
}

/** Demo accounts loaded by seedDemo() (password for all: peelform-demo). */
export const DEMO_PASSWORD = "peelform-demo";
export const DEMO_USERS = {
  owner: "owner@peelform.test",
  designer: "designer@peelform.test",
  reviewer: "reviewer@peelform.test",
  fabricator: "fabricator@peelform.test",
  outsider: "outsider@peelform.test",
} as const;
