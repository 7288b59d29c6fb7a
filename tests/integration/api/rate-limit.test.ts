import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import type { Redis } from "ioredis";
import { createRedis } from "@/lib/queue/connection";
import { clientIp } from "@/lib/rate-limit/limits";
import { MemoryRateLimitStore } from "@/lib/rate-limit/memory-store";
import { RedisRateLimitStore } from "@/lib/rate-limit/redis-store";
import { SlidingWindowLimiter } from "@/lib/rate-limit/sliding-window";
import type { RateLimitStore } from "@/lib/rate-limit/store";

/** Sliding-window semantics on both stores (a fake clock), and Redis counts shared by two "web processes". */
const connections: Redis[] = [];
function redisStore(): RateLimitStore {
  const r = createRedis({ maxRetriesPerRequest: 1 });
  connections.push(r);
  return new RedisRateLimitStore(r, `peelform:test:${randomBytes(4).toString("hex")}:`);
}
afterAll(async () => {
  await Promise.all(connections.map((c) => c.quit()));
});

for (const [label, makeStore] of [["memory", () => new MemoryRateLimitStore()], ["redis", redisStore]] as const) {
  describe(`sliding window (${label})`, () => {
    it("allows `limit` events per window, then refuses until the oldest leaves the window", async () => {
      let now = 1_000_000;
      const store = makeStore();
      const limiter = new SlidingWindowLimiter("t", 3, 60_000, () => store, () => now);
      for (let i = 0; i < 3; i++) {
        expect((await limiter.consume("k")).allowed).toBe(true);
        now += 10_000; // events at 0 s, 10 s, 20 s
      }
      const refused = await limiter.check("k"); // at 30 s
      expect(refused).toEqual({ allowed: false, count: 3, retryAfterSeconds: 30 });
      now = 1_000_000 + 60_000; // the first event (0 s) leaves the window exactly now
      expect((await limiter.check("k")).allowed).toBe(true);
      expect((await limiter.check("other")).count).toBe(0);
      await limiter.reset("k");
      expect((await limiter.check("k")).count).toBe(0);
    });
  });
}

describe("redis store across processes", () => {
  it("two connections (two web processes) count together", async () => {
    const prefix = `peelform:test:${randomBytes(4).toString("hex")}:`;
    const a = createRedis({ maxRetriesPerRequest: 1 });
    const b = createRedis({ maxRetriesPerRequest: 1 });
    connections.push(a, b);
    const la = new SlidingWindowLimiter("shared", 4, 60_000, () => new RedisRateLimitStore(a, prefix));
    const lb = new SlidingWindowLimiter("shared", 4, 60_000, () => new RedisRateLimitStore(b, prefix));
    await la.record("x");
    await lb.record("x");
    await la.record("x");
    expect((await lb.check("x")).count).toBe(3);
    await lb.record("x");
    expect((await la.check("x")).allowed).toBe(false);
  });
});

describe("clientIp", () => {
  it("takes the address the nearest proxy appended, then x-real-ip, else unknown", () => {
    expect(clientIp(new Headers({ "x-forwarded-for": "203.0.113.9, 10.0.0.2" }))).toBe("10.0.0.2");
    expect(clientIp({ "x-forwarded-for": "198.51.100.7" })).toBe("198.51.100.7");
    expect(clientIp(new Headers({ "x-real-ip": "192.0.2.1" }))).toBe("192.0.2.1");
    expect(clientIp(new Headers())).toBe("unknown");
    expect(clientIp(undefined)).toBe("unknown");
  });
});
