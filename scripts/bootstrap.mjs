#!/usr/bin/env node
/**
 * Entry of `npm start`, `npm run dev`, `npm test` and `npm run test:stack`. Plain JavaScript on purpose: it runs
 * before node_modules exists. It installs the npm dependencies when missing or older than package-lock.json,
 * then loads TypeScript (tsx) and hands over to scripts/stack/main.ts.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const modes = ["start", "dev", "test", "test-stack"];
const [mode, ...args] = process.argv.slice(2);
if (!modes.includes(mode)) {
  process.stderr.write(`usage: node scripts/bootstrap.mjs <${modes.join("|")}> [vitest arguments]\n`);
  process.exit(2);
}

// When our output pipe closes (e.g. `npm start | tee log` and Ctrl-C ends tee), keep going: the shutdown that
// follows must still stop every service, even with nobody left to read about it.
for (const stream of [process.stdout, process.stderr]) stream.on("error", () => {});

const t0 = Date.now();
process.env.PEELFORM_STARTED_AT = String(t0);
const clock = () => `[${((Date.now() - t0) / 1000).toFixed(1).padStart(6)}s]`;

function mtime(file) {
  try {
    return fs.statSync(file).mtimeMs;
  } catch {
    return 0;
  }
}

function npmCiNeeded() {
  const marker = path.join(root, "node_modules", ".package-lock.json");
  if (!fs.existsSync(path.join(root, "node_modules")) || !fs.existsSync(marker)) return "node_modules is missing";
  if (mtime(marker) < mtime(path.join(root, "package-lock.json"))) return "package-lock.json is newer than node_modules";
  return null;
}

const reason = npmCiNeeded();
if (reason) {
  process.stdout.write(`${clock()} ▶ npm ci (${reason})\n`);
  const result = spawnSync("npm", ["ci", "--no-audit", "--no-fund"], { cwd: root, stdio: ["ignore", "inherit", "inherit"] });
  if (result.status !== 0) {
    process.stderr.write(`${clock()} ERROR: npm ci failed (exit ${result.status ?? result.signal})\n`);
    process.exit(1);
  }
  process.stdout.write(`${clock()} ✔ npm ci (${((Date.now() - t0) / 1000).toFixed(1)} s)\n`);
} else {
  process.stdout.write(`${clock()} ✔ node_modules is up to date with package-lock.json\n`);
}

process.chdir(root);
const { register } = await import("tsx/esm/api");
register();
const { main } = await import(pathToFileURL(path.join(root, "scripts", "stack", "main.ts")).href);
const code = await main(mode, args, root);
process.exit(code);
