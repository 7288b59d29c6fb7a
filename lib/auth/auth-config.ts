import { getEnv } from "@/lib/env";

/**
 * Settings shared by next-auth (auth-options.ts), the proxy (proxy.ts) and the API session lookup, so all three agree
 * on the cookie name and secret. No database imports here: proxy.ts pulls this in. Everything is read on use.
 */

/** Sessions last 30 days (next-auth's default), refreshed while used. */
export const SESSION_MAX_AGE_SECONDS = 30 * 24 * 60 * 60;

/** Secure cookies (and the `__Secure-` name prefix) when the app is served over https. */
export function useSecureCookies(): boolean {
  return getEnv().APP_URL.startsWith("https://");
}

export function sessionCookieName(): string {
  return useSecureCookies() ? "__Secure-next-auth.session-token" : "next-auth.session-token";
}

export function authSecret(): string {
  return getEnv().NEXTAUTH_SECRET;
}

/** Base URL for links in e-mails, without a trailing slash. */
export function appUrl(): string {
  return getEnv().APP_URL.replace(/\/+$/, "");
}
