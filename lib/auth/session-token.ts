import { encode, getToken, type JWT } from "next-auth/jwt";
import { authSecret, SESSION_MAX_AGE_SECONDS, sessionCookieName, useSecureCookies } from "@/lib/auth/auth-config";

/** The claims of our next-auth JWT. */
export interface SessionClaims {
  userId: string;
  shopId: string | null;
  sessionVersion: number;
  name: string;
  email: string;
}

/** Encrypts claims into a next-auth JWT, exactly as next-auth does after sign-in (same secret, same format). */
export async function encodeSessionToken(claims: SessionClaims): Promise<string> {
  const token: JWT = {
    sub: claims.userId,
    name: claims.name,
    email: claims.email,
    userId: claims.userId,
    shopId: claims.shopId,
    sv: claims.sessionVersion,
  };
  return encode({ token, secret: authSecret(), maxAge: SESSION_MAX_AGE_SECONDS });
}

/** A Set-Cookie value carrying the session token, with next-auth's cookie attributes. */
export function sessionSetCookie(jwt: string): string {
  const parts = [
    `${sessionCookieName()}=${jwt}`,
    "Path=/",
    "HttpOnly",
    "SameSite=Lax",
    `Max-Age=${SESSION_MAX_AGE_SECONDS}`,
  ];
  if (useSecureCookies()) parts.push("Secure");
  return parts.join("; ");
}

function parseCookies(header: string | null): Map<string, string> {
  const out = new Map<string, string>();
  if (!header) return out;
  for (const part of header.split(";")) {
    const eq = part.indexOf("=");
    if (eq <= 0) continue;
    const name = part.slice(0, eq).trim();
    const raw = part.slice(eq + 1).trim();
    try {
      out.set(name, decodeURIComponent(raw));
    } catch {
      out.set(name, raw);
    }
  }
  return out;
}

/**
 * Reads and decrypts the next-auth session cookie of a request (chunked cookies included). Returns null when there
 * is none or it does not decrypt with our secret (tampered, expired, other secret).
 */
export async function readSessionToken(req: Request): Promise<JWT | null> {
  const cookies = parseCookies(req.headers.get("cookie"));
  return getToken({
    // headers left empty on purpose: sessions come from the cookie only, not from an Authorization header.
    req: { headers: {}, cookies: Object.fromEntries(cookies) } as never,
    secret: authSecret(),
    secureCookie: useSecureCookies(),
    cookieName: sessionCookieName(),
  });
}
