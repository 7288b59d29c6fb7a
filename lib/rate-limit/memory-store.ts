import type { RateLimitStore } from "@/lib/rate-limit/store";

/**
 * In-process store. Counts are per Node process: with several web processes each keeps its own, so the effective
 * limit multiplies by the process count. Used when REDIS_URL is not set (single dev process, unit tests) and as the
 * fallback while Redis is unreachable.
 */
export class MemoryRateLimitStore implements RateLimitStore {
  private readonly events = new Map<string, number[]>();

  async count(key: string, windowMs: number, now: number) {
    const list = this.prune(key, windowMs, now);
    return { count: list.length, oldest: list.length ? list[0] : null };
  }

  async add(key: string, windowMs: number, now: number) {
    const list = this.prune(key, windowMs, now);
    list.push(now);
    this.events.set(key, list);
  }

  async clear(key: string) {
    this.events.delete(key);
  }

  private prune(key: string, windowMs: number, now: number): number[] {
    const list = this.events.get(key) ?? [];
    let drop = 0;
    while (drop < list.length && list[drop] <= now - windowMs) drop++;
    const kept = drop ? list.slice(drop) : list;
    if (kept.length) this.events.set(key, kept);
    else this.events.delete(key);
    return kept;
  }
}
