import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { supervise } from "@/scripts/stack/supervisor";

/** The worker is restarted with backoff when it dies, and stop() ends it for good. */
const runDir = fs.mkdtempSync(path.join(os.tmpdir(), "peelform-supervisor-"));

describe("scripts/stack/supervisor", () => {
  afterAll(() => fs.rmSync(runDir, { recursive: true, force: true }));

  it("restarts a crashing child with growing delays and stops it on request", async () => {
    const log = path.join(runDir, "crash.log");
    const notices: string[] = [];
    // Each start appends a line, then the process dies.
    const child = supervise({
      name: "crash",
      command: process.execPath,
      args: ["-e", `require("fs").appendFileSync(${JSON.stringify(path.join(runDir, "starts"))}, "x"); process.exit(3)`],
      cwd: runDir,
      env: process.env,
      restart: true,
      output: log,
      runDir,
      notify: (m) => notices.push(m),
    });
    const startsFile = path.join(runDir, "starts");
    // Backoff 1 s then 2 s: the third start comes about 3 s after the first.
    const t0 = Date.now();
    await new Promise<void>((resolve) => {
      const watcher = setInterval(() => {
        if (fs.existsSync(startsFile) && fs.readFileSync(startsFile, "utf8").length >= 3) {
          clearInterval(watcher);
          resolve();
        }
      }, 50);
    });
    expect(Date.now() - t0).toBeGreaterThanOrEqual(2_900);
    expect(child.restarts()).toBeGreaterThanOrEqual(2);
    expect(notices.slice(0, 2)).toEqual(["crash exited (3); restarting in 1 s", "crash exited (3); restarting in 2 s"]);
    await child.stop(2_000);
    const starts = fs.readFileSync(startsFile, "utf8").length;
    await new Promise((r) => setTimeout(r, 1_500)); // long enough for a pending restart, had one been left
    expect(fs.readFileSync(startsFile, "utf8").length).toBe(starts);
    expect(fs.existsSync(path.join(runDir, "crash.pid"))).toBe(false);
  });

  it("stops a running child with SIGTERM", async () => {
    const child = supervise({
      name: "sleeper",
      command: process.execPath,
      args: ["-e", "process.on('SIGTERM', () => process.exit(0)); setInterval(() => {}, 1000)"],
      cwd: runDir,
      env: process.env,
      restart: true,
      output: path.join(runDir, "sleeper.log"),
      runDir,
      notify: () => {},
    });
    const pid = child.pid()!;
    await child.stop(5_000);
    expect(() => process.kill(pid, 0)).toThrow();
  });
});
