/**
 * Only same-site targets may follow a sign-in: a path ("/projects/…"), or an absolute URL on `origin` (the proxy
 * passes the full address it interrupted), which is reduced to its path. Never "//host" or another site.
 */
export function safeCallbackUrl(value: string | string[] | undefined, origin?: string, fallback = "/projects"): string {
  const v = Array.isArray(value) ? value[0] : value;
  if (!v) return fallback;
  if (v.startsWith("/")) return v.startsWith("//") || v.startsWith("/\\") ? fallback : v;
  if (!origin) return fallback;
  try {
    const url = new URL(v);
    if (url.origin !== new URL(origin).origin) return fallback;
    const path = `${url.pathname}${url.search}${url.hash}`;
    return path.startsWith("/sign-in") ? fallback : path;
  } catch {
    return fallback;
  }
}
