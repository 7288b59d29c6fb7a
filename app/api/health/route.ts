import type { Redis } from "ioredis";
import { getSequelize } from "@/lib/db/sequelize";
import { createRedis } from "@/lib/queue/connection";
import { checkStorage } from "@/lib/storage/s3";

/**
 * GET /api/health — liveness of the three shared services this web process depends on. Public (load balancers
 * and `npm start` call it) and tells nothing but up/down and the time each check took; the reason goes to the log.
 *   200 { ok: true,  checks: { db: { ok, ms }, redis: { ok, ms }, storage: { ok, ms } } }
 *   503 { ok: false, checks: … } when any check failed or took longer than 3 s
 */
export const dynamic = "force-dynamic";

const TIMEOUT_MS = 3_000;

interface CheckResult {
  ok: boolean;
  ms: number;
}

let redis: Redis | undefined;

function withTimeout<T>(promise: Promise<T>, what: string): Promise<T> {
  return Promise.race([
    promise,
    new Promise<never>((_, reject) => setTimeout(() => reject(new Error(`${what} did not answer within ${TIMEOUT_MS} ms`)), TIMEOUT_MS)),
  ]);
}

async function timed(name: string, check: () => Promise<unknown>): Promise<CheckResult> {
  const t0 = performance.now();
  try {
    await withTimeout(check(), name);
    return { ok: true, ms: Math.round(performance.now() - t0) };
  } catch (error) {
    console.error(`health: ${name} check failed: ${error instanceof Error ? error.message : String(error)}`);
    return { ok: false, ms: Math.round(performance.now() - t0) };
  }
}

export async function GET(): Promise<Response> {
  const [db, redisCheck, storage] = await Promise.all([
    timed("db", () => getSequelize().query("SELECT 1")),
    timed("redis", async () => {
      // One connection per web process, reused across checks; fail fast instead of queueing while it is down.
      const connection = (redis ??= createRedis({ enableOfflineQueue: false, maxRetriesPerRequest: 1 }));
      if (connection.status !== "ready") {
        await new Promise<void>((resolve, reject) => {
          connection.once("ready", () => resolve());
          connection.once("error", reject);
        });
      }
      await connection.ping();
    }),
    timed("storage", () => checkStorage(TIMEOUT_MS)),
  ]);
  const ok = db.ok && redisCheck.ok && storage.ok;
  return Response.json(
    { ok, checks: { db, redis: redisCheck, storage } },
    { status: ok ? 200 : 503, headers: { "Cache-Control": "no-store" } },
  );
}
