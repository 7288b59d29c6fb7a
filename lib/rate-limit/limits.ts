import { defaultRateLimitStore } from "@/lib/rate-limit/default-store";
import { SlidingWindowLimiter } from "@/lib/rate-limit/sliding-window";

const MINUTE = 60_000;

/**
 * The app's limits. Sign-in counts failed attempts only (a person who signs in often is never locked out):
 * 5 per e-mail and 30 per client IP in any 15 minutes. // Common practice (OWASP authentication guidance: throttle
 * per account and per source).
 */
export const signInFailuresByEmail = new SlidingWindowLimiter("signin-email", 5, 15 * MINUTE, defaultRateLimitStore);
export const signInFailuresByIp = new SlidingWindowLimiter("signin-ip", 30, 15 * MINUTE, defaultRateLimitStore);

/** Password reset e-mails: 3 per address and 20 per IP per hour, so the form cannot be used to flood a mailbox. */
export const resetRequestsByEmail = new SlidingWindowLimiter("reset-email", 3, 60 * MINUTE, defaultRateLimitStore);
export const resetRequestsByIp = new SlidingWindowLimiter("reset-ip", 20, 60 * MINUTE, defaultRateLimitStore);

/** New shops: 10 per IP per hour. */
export const signUpsByIp = new SlidingWindowLimiter("signup-ip", 10, 60 * MINUTE, defaultRateLimitStore);

/**
 * Client IP for per-IP limits: the LAST x-forwarded-for entry, i.e. the address the nearest proxy saw (a reverse
 * proxy appends the peer address; entries before it are whatever the client claimed). Next itself fills the header
 * with the socket address when it is absent. Without a proxy in front a client can still send its own header, so
 * per-IP limits are a second line; the per-e-mail limits do not depend on it.
 */
export function clientIp(headers: Headers | Record<string, string | string[] | undefined> | undefined): string {
  const get = (name: string): string | undefined => {
    if (!headers) return undefined;
    if (headers instanceof Headers) return headers.get(name) ?? undefined;
    const v = headers[name];
    return Array.isArray(v) ? v[v.length - 1] : v;
  };
  const forwarded = get("x-forwarded-for")?.split(",").pop()?.trim();
  return forwarded || get("x-real-ip")?.trim() || "unknown";
}
