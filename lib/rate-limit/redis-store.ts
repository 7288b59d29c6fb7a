import { randomUUID } from "node:crypto";
import type { Redis } from "ioredis";
import type { RateLimitStore } from "@/lib/rate-limit/store";

/**
 * Redis store shared by every web process: one sorted set per key, scored by event time (ms). Pruning, counting and
 * adding are each one MULTI round trip.
 */
export class RedisRateLimitStore implements RateLimitStore {
  constructor(private readonly redis: Redis, private readonly prefix = "peelform:rl:") {}

  async count(key: string, windowMs: number, now: number) {
    const k = this.prefix + key;
    const res = await this.redis
      .multi()
      .zremrangebyscore(k, 0, now - windowMs)
      .zcard(k)
      .zrange(k, "0", "0", "WITHSCORES")
      .exec();
    if (!res) throw new Error("Redis transaction was aborted.");
    for (const [err] of res) if (err) throw err;
    const count = Number(res[1][1]);
    const first = res[2][1] as string[];
    return { count, oldest: first.length >= 2 ? Number(first[1]) : null };
  }

  async add(key: string, windowMs: number, now: number) {
    const k = this.prefix + key;
    const res = await this.redis.multi().zadd(k, now, `${now}:${randomUUID()}`).pexpire(k, windowMs).exec();
    if (!res) throw new Error("Redis transaction was aborted.");
    for (const [err] of res) if (err) throw err;
  }

  async clear(key: string) {
    await this.redis.del(this.prefix + key);
  }
}
