import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { run } from "./sh";
import { lockWait } from "./lock";
import { info } from "./log";

/**
 * `next build` only when needed: the build records a hash of the sources it was made from
 * (.next/peelform-source-hash); a missing build, or any source file added, removed or changed, means a rebuild.
 * Tests, docs and CI files do not change the app, so they are left out of the hash.
 */
const HASH_FILE = "peelform-source-hash";
const IGNORED_PREFIXES = ["tests/", ".ci/", ".data", ".next/", "node_modules/", "scripts/bootstrap.mjs", "scripts/stack/"];

async function sourceFiles(root: string): Promise<string[]> {
  const git = await run("git", ["ls-files", "-z", "--cached", "--others", "--exclude-standard"], { cwd: root, allowFailure: true }).catch(() => null);
  let files: string[];
  if (git && git.code === 0) {
    files = git.stdout.split("\0").filter(Boolean);
  } else {
    files = [];
    const walk = (dir: string) => {
      for (const entry of fs.readdirSync(path.join(root, dir), { withFileTypes: true })) {
        const rel = dir ? `${dir}/${entry.name}` : entry.name;
        if (IGNORED_PREFIXES.some((p) => rel.startsWith(p)) || entry.name === ".git") continue;
        if (entry.isDirectory()) walk(rel);
        else if (entry.isFile()) files.push(rel);
      }
    };
    walk("");
  }
  return files.filter((f) => !IGNORED_PREFIXES.some((p) => f.startsWith(p)) && !f.endsWith(".md")).sort();
}

export async function sourceHash(root: string): Promise<string> {
  const hash = createHash("sha256");
  for (const file of await sourceFiles(root)) {
    const abs = path.join(root, file);
    if (!fs.existsSync(abs)) continue; // deleted but still in the index
    hash.update(file).update("\0").update(fs.readFileSync(abs)).update("\0");
  }
  return hash.digest("hex");
}

function builtHash(root: string): string | null {
  const dir = path.join(root, ".next");
  if (!fs.existsSync(path.join(dir, "BUILD_ID"))) return null;
  try {
    return fs.readFileSync(path.join(dir, HASH_FILE), "utf8").trim();
  } catch {
    return null;
  }
}

/** Builds when stale; returns true when it built. `env` is the stack environment (pages may read it at build time). */
export async function buildIfStale(root: string, env: NodeJS.ProcessEnv): Promise<boolean> {
  const lock = await lockWait(path.join(root, "node_modules", ".cache", "peelform", "build.lock"), "the build", 15 * 60_000, (pid) =>
    info(`  another build (process ${pid}) is running in this folder; waiting for it`),
  );
  try {
    const hash = await sourceHash(root);
    const current = builtHash(root);
    if (current === hash) {
      info("  .next is up to date with the sources");
      return false;
    }
    info(current ? "  sources changed since the last build: next build" : "  no build yet: next build");
    // An interrupted build leaves .next half written: forget the old hash first, so it can never look current.
    fs.rmSync(path.join(root, ".next", HASH_FILE), { force: true });
    await run(path.join(root, "node_modules", ".bin", "next"), ["build"], { cwd: root, env, inherit: true, timeoutMs: 30 * 60_000 });
    fs.writeFileSync(path.join(root, ".next", HASH_FILE), `${hash}\n`);
    return true;
  } finally {
    lock.release();
  }
}
