import fs from "node:fs";
import path from "node:path";
import { run } from "./sh";
import { assertPortFree, waitForPort } from "./ports";

/**
 * Our own redis-server per stack on 127.0.0.1, with its config (incl. the password) in a mode-600 file in the
 * project's data folder, so the password never shows in `ps`.
 */
export interface RedisOptions {
  /** Folder for redis.conf, the pid file, the log and the append-only file. */
  dir: string;
  port: number;
  password: string;
  /** appendonly yes: every write is logged and survives a restart (the user's stack). */
  persistent: boolean;
}

function cliEnv(password: string): NodeJS.ProcessEnv {
  return { ...process.env, REDISCLI_AUTH: password };
}

export async function pingRedis(port: number, password: string): Promise<boolean> {
  const result = await run("redis-cli", ["-h", "127.0.0.1", "-p", String(port), "ping"], {
    env: cliEnv(password),
    allowFailure: true,
    timeoutMs: 5_000,
  }).catch(() => null);
  return result?.code === 0 && result.stdout.trim() === "PONG";
}

export async function startRedis(opts: RedisOptions): Promise<{ alreadyRunning: boolean }> {
  if (await pingRedis(opts.port, opts.password)) return { alreadyRunning: true };
  await assertPortFree(opts.port, "Redis", "REDIS_PORT / TEST_REDIS_PORT");
  fs.mkdirSync(opts.dir, { recursive: true, mode: 0o700 });
  const conf = [
    "bind 127.0.0.1",
    "protected-mode yes",
    `port ${opts.port}`,
    "daemonize yes",
    `pidfile "${path.join(opts.dir, "redis.pid")}"`,
    `logfile "${path.join(opts.dir, "redis.log")}"`,
    `dir "${opts.dir}"`,
    `requirepass "${opts.password}"`,
    `appendonly ${opts.persistent ? "yes" : "no"}`,
    opts.persistent ? "appendfsync everysec" : 'save ""',
    // BullMQ wants its keys kept, never evicted.
    "maxmemory-policy noeviction",
  ];
  const confFile = path.join(opts.dir, "redis.conf");
  fs.writeFileSync(confFile, conf.join("\n") + "\n", { mode: 0o600 });
  // redis-server daemonizes itself (setsid), so a terminal Ctrl-C does not reach it; we shut it down in order.
  await run("redis-server", [confFile], { timeoutMs: 30_000 });
  await waitForPort(opts.port, 15_000);
  const deadline = Date.now() + 15_000;
  while (!(await pingRedis(opts.port, opts.password))) {
    if (Date.now() > deadline) throw new Error(`redis-server on port ${opts.port} did not answer PING; see ${path.join(opts.dir, "redis.log")}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return { alreadyRunning: false };
}

/** `redis-cli shutdown`: with appendonly the log is flushed first; returns false when nothing was running. */
export async function stopRedis(opts: Pick<RedisOptions, "port" | "password" | "persistent">): Promise<boolean> {
  if (!(await pingRedis(opts.port, opts.password))) return false;
  await run("redis-cli", ["-h", "127.0.0.1", "-p", String(opts.port), "shutdown", ...(opts.persistent ? [] : ["nosave"])], {
    env: cliEnv(opts.password),
    allowFailure: true,
    timeoutMs: 30_000,
  });
  const deadline = Date.now() + 15_000;
  while (await pingRedis(opts.port, opts.password)) {
    if (Date.now() > deadline) throw new Error(`redis on port ${opts.port} did not shut down`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return true;
}

export function redisUrl(port: number, password: string): string {
  return `redis://:${encodeURIComponent(password)}@127.0.0.1:${port}`;
}
