import fs from "node:fs";
import path from "node:path";

/**
 * A pid-file lock so two runs never share one data folder (or one `next build`): the second waits or stops with
 * a clear message. A lock whose process is gone is taken over.
 */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

function holder(file: string): number | null {
  try {
    const pid = Number(fs.readFileSync(file, "utf8").trim());
    return Number.isInteger(pid) && pid > 0 && pid !== process.pid && alive(pid) ? pid : null;
  } catch {
    return null;
  }
}

function tryTake(file: string): boolean {
  try {
    fs.writeFileSync(file, `${process.pid}\n`, { flag: "wx" });
    return true;
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
    if (holder(file) !== null) return false;
    fs.rmSync(file, { force: true }); // stale: its process is gone
    return tryTake(file);
  }
}

export interface Lock {
  release(): void;
}

/** Takes the lock at once, or throws naming the process that holds it. */
export function lockOrFail(file: string, what: string): Lock {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  if (!tryTake(file)) {
    throw new Error(`${what} is in use by process ${holder(file)} (another npm start / npm test in this folder?). Stop that one first.`);
  }
  return { release: () => releaseIfOurs(file) };
}

/** Waits (polling) until the lock is free, up to `timeoutMs`. */
export async function lockWait(file: string, what: string, timeoutMs: number, onWait: (pid: number) => void): Promise<Lock> {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const deadline = Date.now() + timeoutMs;
  let told = false;
  while (!tryTake(file)) {
    const pid = holder(file);
    if (pid !== null && !told) {
      onWait(pid);
      told = true;
    }
    if (Date.now() > deadline) throw new Error(`gave up waiting for ${what} held by process ${pid}`);
    await new Promise((r) => setTimeout(r, 500));
  }
  return { release: () => releaseIfOurs(file) };
}

function releaseIfOurs(file: string): void {
  try {
    if (Number(fs.readFileSync(file, "utf8").trim()) === process.pid) fs.rmSync(file, { force: true });
  } catch {
    // already gone
  }
}
