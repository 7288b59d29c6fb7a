import { spawn, type SpawnOptions } from "node:child_process";

export interface RunResult {
  code: number;
  stdout: string;
  stderr: string;
}

/** Thrown by `run` when a command exits non-zero; the message carries the command and its stderr tail. */
export class CommandError extends Error {
  constructor(
    readonly command: string,
    readonly result: RunResult,
  ) {
    const tail = (result.stderr || result.stdout).trim().split("\n").slice(-15).join("\n");
    super(`command failed (exit ${result.code}): ${command}\n${tail}`);
    this.name = "CommandError";
  }
}

export interface RunOptions extends Pick<SpawnOptions, "cwd" | "env"> {
  /** Reject if the command has not finished after this many milliseconds. */
  timeoutMs?: number;
  /** Resolve with the result instead of throwing on a non-zero exit. */
  allowFailure?: boolean;
  /** Stream the command's output to our stdout (long steps such as npm ci or next build). */
  inherit?: boolean;
  /** Start in its own session so a terminal Ctrl-C does not reach it (daemons we stop ourselves). */
  detached?: boolean;
}

/** Runs a command without a shell, collects its output, never reads stdin. */
export function run(file: string, args: string[], options: RunOptions = {}): Promise<RunResult> {
  const command = [file, ...args].join(" ");
  return new Promise((resolve, reject) => {
    const child = spawn(file, args, {
      cwd: options.cwd,
      env: options.env ?? process.env,
      stdio: ["ignore", options.inherit ? "inherit" : "pipe", options.inherit ? "inherit" : "pipe"],
      detached: options.detached ?? false,
    });
    let stdout = "";
    let stderr = "";
    child.stdout?.on("data", (chunk: Buffer) => (stdout += chunk.toString()));
    child.stderr?.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
    const timer = options.timeoutMs
      ? setTimeout(() => {
          child.kill("SIGKILL");
          reject(new Error(`command timed out after ${options.timeoutMs} ms: ${command}`));
        }, options.timeoutMs)
      : undefined;
    child.on("error", (error) => {
      if (timer) clearTimeout(timer);
      reject(new Error(`could not run ${file}: ${error.message}`));
    });
    child.on("close", (code, signal) => {
      if (timer) clearTimeout(timer);
      const result = { code: code ?? (signal ? 128 : 1), stdout, stderr };
      if (result.code !== 0 && !options.allowFailure) reject(new CommandError(command, result));
      else resolve(result);
    });
  });
}

/** True when `file` can be found on PATH (or is an existing absolute path). */
export async function which(file: string): Promise<string | null> {
  const result = await run("sh", ["-c", `command -v ${file}`], { allowFailure: true });
  return result.code === 0 ? result.stdout.trim() : null;
}
