import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "../../../..");

export interface SpawnedWorker {
  child: ChildProcess;
  output: () => string;
  /** resolves once the output contains `text` */
  waitForOutput: (text: string) => Promise<void>;
  /** resolves when the process has exited */
  exited: Promise<number | null>;
  stop: () => Promise<void>;
}

/**
 * Starts tests/integration/jobs/support/worker-process.ts under `node --import tsx` (like the stack's worker) with
 * the test stack's environment plus `env`, and resolves once it prints "ready".
 */
export async function spawnWorker(env: Record<string, string>): Promise<SpawnedWorker> {
  const { NODE_ENV: _n, ...base } = process.env;
  const child = spawn(process.execPath, ["--import", "tsx", "tests/integration/jobs/support/worker-process.ts"], {
    cwd: root,
    env: { ...base, NODE_ENV: "production", ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let out = "";
  const outputWaiters: { text: string; resolve: () => void }[] = [];
  const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
  await new Promise<void>((resolve, reject) => {
    const onData = (b: Buffer) => {
      out += b.toString();
      for (const w of [...outputWaiters]) {
        if (out.includes(w.text)) {
          outputWaiters.splice(outputWaiters.indexOf(w), 1);
          w.resolve();
        }
      }
      if (out.includes(" ready\n")) resolve();
    };
    child.stdout!.on("data", onData);
    child.stderr!.on("data", (b: Buffer) => (out += b.toString()));
    void exited.then((code) => reject(new Error(`worker exited with ${code} before it was ready:\n${out}`)));
  });
  return {
    child,
    output: () => out,
    waitForOutput: (text) => (out.includes(text) ? Promise.resolve() : new Promise<void>((resolve) => outputWaiters.push({ text, resolve }))),
    exited,
    stop: async () => {
      if (child.exitCode !== null || child.signalCode !== null) return;
      child.kill("SIGTERM");
      await exited;
    },
  };
}
