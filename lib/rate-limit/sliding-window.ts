import type { RateLimitStore } from "@/lib/rate-limit/store";

export interface LimitState {
  allowed: boolean;
  /** Events counted in the window. */
  count: number;
  /** Seconds until the oldest counted event leaves the window (0 when allowed). */
  retryAfterSeconds: number;
}

/**
 * Sliding-window log limiter: at most `limit` events per key in any `windowMs` span. Callers `check` before the
 * guarded work and `record` the events that count (e.g. failed sign-ins only, so people who sign in often are never
 * locked out).
 */
export class SlidingWindowLimiter {
  constructor(
    readonly name: string,
    readonly limit: number,
    readonly windowMs: number,
    private readonly store: () => RateLimitStore,
    private readonly now: () => number = Date.now,
  ) {}

  async check(key: string): Promise<LimitState> {
    const t = this.now();
    const { count, oldest } = await this.store().count(this.key(key), this.windowMs, t);
    if (count < this.limit) return { allowed: true, count, retryAfterSeconds: 0 };
    const retryMs = oldest === null ? this.windowMs : oldest + this.windowMs - t;
    return { allowed: false, count, retryAfterSeconds: Math.max(1, Math.ceil(retryMs / 1000)) };
  }

  async record(key: string): Promise<void> {
    await this.store().add(this.key(key), this.windowMs, this.now());
  }

  /** check + record in one call, for limits where every attempt counts. */
  async consume(key: string): Promise<LimitState> {
    const state = await this.check(key);
    if (state.allowed) await this.record(key);
    return state;
  }

  async reset(key: string): Promise<void> {
    await this.store().clear(this.key(key));
  }

  private key(key: string): string {
    return `${this.name}:${key}`;
  }
}
