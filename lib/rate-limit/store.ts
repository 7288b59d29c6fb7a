/**
 * Storage behind a sliding-window log limiter: per key, the timestamps (ms) of the events still inside the window.
 */
export interface RateLimitStore {
  /** Drops events older than `now - windowMs`; returns how many remain and the oldest remaining timestamp. */
  count(key: string, windowMs: number, now: number): Promise<{ count: number; oldest: number | null }>;
  /** Records one event at `now` and keeps the key alive for `windowMs`. */
  add(key: string, windowMs: number, now: number): Promise<void>;
  /** Forgets every event of the key (e.g. after a successful sign-in). */
  clear(key: string): Promise<void>;
}
