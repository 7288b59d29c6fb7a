/** Only same-site paths may be a post-sign-in target ("/projects/…"), never "//host" or "https://…". */
export function safeCallbackUrl(value: string | string[] | undefined, fallback = "/projects"): string {
  const v = Array.isArray(value) ? value[0] : value;
  if (!v || !v.startsWith("/") || v.startsWith("//") || v.startsWith("/\\")) return fallback;
  return v;
}
