import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { info, warn } from "./log";

/**
 * Long-running children (web app, worker). Each runs in its own process group, so a terminal Ctrl-C reaches only
 * the bootstrap, which then stops them in order. Their pid is kept in <runDir>/<name>.pid, so a run that was
 * killed outright leaves nothing behind: the next run ends a leftover that still runs in this repository.
 */
export interface ChildSpec {
  name: string;
  command: string;
  args: string[];
  cwd: string;
  env: NodeJS.ProcessEnv;
  /** Restart when it exits unexpectedly, with exponential backoff (1 s, 2 s, 4 s … 30 s). */
  restart: boolean;
  /** Where its output goes: "console" prefixes each line with the name, otherwise the path of a log file. */
  output: "console" | string;
  runDir: string;
  /** Where restart and stop notices go (default: the bootstrap's log). */
  notify?: (message: string) => void;
}

export interface Supervised {
  readonly name: string;
  pid(): number | undefined;
  /** Resolves when the child has stopped for good (after stop(), or a crash of a non-restarting child). */
  exited: Promise<number>;
  stop(timeoutMs?: number): Promise<void>;
  restarts(): number;
}

function pidFile(runDir: string, name: string): string {
  return path.join(runDir, `${name}.pid`);
}

/** Ends a leftover child of an earlier run (same repository as cwd), found through its pid file, and waits for it. */
export async function killLeftover(runDir: string, name: string, root: string): Promise<void> {
  const file = pidFile(runDir, name);
  if (!fs.existsSync(file)) return;
  const pid = Number(fs.readFileSync(file, "utf8").trim());
  fs.rmSync(file, { force: true });
  if (!Number.isInteger(pid) || pid <= 1) return;
  let cwd: string;
  try {
    cwd = fs.readlinkSync(`/proc/${pid}/cwd`);
  } catch {
    return; // not running
  }
  if (path.resolve(cwd) !== path.resolve(root)) return; // pid reused by something else
  warn(`${name} from an earlier run (pid ${pid}) is still running; stopping it`);
  try {
    process.kill(-pid, "SIGKILL");
  } catch {
    try {
      process.kill(pid, "SIGKILL");
    } catch {
      // gone meanwhile
    }
  }
  // Its port is free only once the process is gone.
  const deadline = Date.now() + 10_000;
  while (fs.existsSync(`/proc/${pid}`) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
}

function pipeLines(stream: NodeJS.ReadableStream | null, prefix: string, sink: (line: string) => void): void {
  if (!stream) return;
  let buffer = "";
  stream.on("data", (chunk: Buffer) => {
    buffer += chunk.toString();
    let i;
    while ((i = buffer.indexOf("\n")) >= 0) {
      sink(`${prefix}${buffer.slice(0, i)}\n`);
      buffer = buffer.slice(i + 1);
    }
  });
  stream.on("end", () => buffer && sink(`${prefix}${buffer}\n`));
}

export function supervise(spec: ChildSpec): Supervised {
  fs.mkdirSync(spec.runDir, { recursive: true });
  let child: ChildProcess | undefined;
  let stopping = false;
  let restartCount = 0;
  let restartTimer: NodeJS.Timeout | undefined;
  let resolveExited!: (code: number) => void;
  const exited = new Promise<number>((r) => (resolveExited = r));
  const logStream = spec.output === "console" ? null : fs.createWriteStream(spec.output, { flags: "a" });
  const sink = (line: string) => (logStream ? logStream.write(line) : process.stdout.write(line));
  const prefix = spec.output === "console" ? `${spec.name.padEnd(6)} | ` : "";
  const notice = spec.notify ?? warn;
  const stopped = spec.notify ?? ((m: string) => info(`  ${m}`));

  const launch = () => {
    const startedAt = Date.now();
    const c = spawn(spec.command, spec.args, { cwd: spec.cwd, env: spec.env, stdio: ["ignore", "pipe", "pipe"], detached: true });
    child = c;
    if (c.pid) fs.writeFileSync(pidFile(spec.runDir, spec.name), `${c.pid}\n`);
    pipeLines(c.stdout, prefix, sink);
    pipeLines(c.stderr, prefix, sink);
    c.on("error", (error) => notice(`${spec.name} could not start: ${error.message}`));
    c.on("exit", (code, signal) => {
      fs.rmSync(pidFile(spec.runDir, spec.name), { force: true });
      const status = code ?? (signal ? `signal ${signal}` : "?");
      if (stopping) return;
      if (!spec.restart) {
        notice(`${spec.name} exited (${status})`);
        resolveExited(typeof code === "number" ? code : 1);
        return;
      }
      // A child that ran for a minute starts the backoff again from 1 s.
      if (Date.now() - startedAt > 60_000) restartCount = 0;
      const delay = Math.min(30_000, 1000 * 2 ** restartCount);
      restartCount += 1;
      notice(`${spec.name} exited (${status}); restarting in ${delay / 1000} s`);
      restartTimer = setTimeout(() => {
        restartTimer = undefined;
        if (!stopping) launch();
      }, delay);
    });
  };
  launch();

  return {
    name: spec.name,
    pid: () => child?.pid,
    exited,
    restarts: () => restartCount,
    async stop(timeoutMs = 15_000) {
      stopping = true;
      if (restartTimer) clearTimeout(restartTimer);
      const c = child;
      if (c && c.exitCode === null && c.signalCode === null && c.pid) {
        const done = new Promise<void>((r) => c.once("exit", () => r()));
        try {
          process.kill(-c.pid, "SIGTERM");
        } catch {
          c.kill("SIGTERM");
        }
        const timer = setTimeout(() => {
          notice(`${spec.name} did not stop within ${timeoutMs / 1000} s; killing it`);
          try {
            process.kill(-c.pid!, "SIGKILL");
          } catch {
            c.kill("SIGKILL");
          }
        }, timeoutMs);
        await done;
        clearTimeout(timer);
        stopped(`${spec.name} stopped`);
      }
      logStream?.end();
      resolveExited(0);
    },
  };
}

/** Polls `url` until it answers with any HTTP status, the child dies, or `timeoutMs` passes. */
export async function waitForHttp(url: string, timeoutMs: number, child?: Supervised): Promise<number> {
  const deadline = Date.now() + timeoutMs;
  let dead = false;
  void child?.exited.then(() => (dead = true));
  for (;;) {
    try {
      const response = await fetch(url, { redirect: "manual", signal: AbortSignal.timeout(5_000) });
      await response.body?.cancel();
      return response.status;
    } catch {
      if (dead) throw new Error(`${child?.name} exited before ${url} answered`);
      if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
      await new Promise((r) => setTimeout(r, 250));
    }
  }
}
