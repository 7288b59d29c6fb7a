import type { Redis } from "ioredis";
import { createRedis } from "@/lib/queue/connection";
import { MemoryRateLimitStore } from "@/lib/rate-limit/memory-store";
import { RedisRateLimitStore } from "@/lib/rate-limit/redis-store";
import type { RateLimitStore } from "@/lib/rate-limit/store";

/**
 * The store the app's limiters share: Redis (REDIS_URL, through lib/queue/connection.ts) so every web process counts
 * together; without REDIS_URL (a single dev process, unit tests) an in-process MemoryRateLimitStore. If Redis fails
 * mid-request the call falls back to an in-process store for that call and logs one line, so a Redis outage weakens
 * the limit (per process) instead of locking everyone out of signing in.
 */
class FallbackStore implements RateLimitStore {
  private warned = false;
  constructor(private readonly primary: RateLimitStore, private readonly fallback: RateLimitStore) {}

  private async run<T>(op: (s: RateLimitStore) => Promise<T>): Promise<T> {
    try {
      return await op(this.primary);
    } catch (err) {
      if (!this.warned) {
        this.warned = true;
        console.error(`[rate-limit] Redis unavailable, counting in this process only: ${(err as Error).message}`);
      }
      return op(this.fallback);
    }
  }

  count(key: string, windowMs: number, now: number) {
    return this.run((s) => s.count(key, windowMs, now));
  }
  add(key: string, windowMs: number, now: number) {
    return this.run((s) => s.add(key, windowMs, now));
  }
  clear(key: string) {
    return this.run((s) => s.clear(key));
  }
}

let store: RateLimitStore | null = null;
let redis: Redis | null = null;

export function defaultRateLimitStore(): RateLimitStore {
  if (!store) {
    const memory = new MemoryRateLimitStore();
    if (process.env.REDIS_URL) {
      // Fail fast instead of queueing: a rate-limit check must not hang a sign-in while Redis is down.
      redis = createRedis({ maxRetriesPerRequest: 1, connectTimeout: 2000, connectionName: `peelform:rate-limit:${process.pid}` });
      redis.on("error", () => {});
      store = new FallbackStore(new RedisRateLimitStore(redis), memory);
    } else {
      store = memory;
    }
  }
  return store;
}

/** Closes the Redis connection (tests, scripts). */
export async function closeRateLimitStore(): Promise<void> {
  const r = redis;
  redis = null;
  store = null;
  if (r) await r.quit().catch(() => r.disconnect());
}
