type Handler = (req: Request, ctx: { params: Promise<unknown> }) => Promise<Response>;

export interface CallOptions {
  cookie?: string;
  params?: Record<string, string>;
  /** Sent as JSON. */
  json?: unknown;
  /** Sent as is (for malformed JSON and size tests). */
  raw?: BodyInit;
  headers?: Record<string, string>;
}

export const TEST_ORIGIN = "http://127.0.0.1:54359";

/**
 * Calls a route handler the way Next does: a standard Request (cookie header included) and a params Promise.
 * Handlers are imported from app/api/…/route.ts; the session comes from the real next-auth cookie, nothing mocked.
 */
export async function call(handler: Handler, method: string, path: string, opts: CallOptions = {}): Promise<Response> {
  const headers = new Headers(opts.headers);
  if (opts.cookie) headers.set("cookie", opts.cookie);
  // A random documentation-range client address per call, so per-IP limits never carry over between runs.
  if (!headers.has("x-forwarded-for")) headers.set("x-forwarded-for", `203.0.113.${1 + Math.floor(Math.random() * 254)}`);
  let body: BodyInit | undefined;
  if (opts.json !== undefined) {
    headers.set("content-type", "application/json");
    body = JSON.stringify(opts.json);
  } else if (opts.raw !== undefined) {
    if (!headers.has("content-type")) headers.set("content-type", "application/json");
    body = opts.raw;
  }
  const init: RequestInit & { duplex?: "half" } = { method, headers, body };
  if (body instanceof ReadableStream) init.duplex = "half";
  const req = new Request(new URL(path, TEST_ORIGIN), init);
  return handler(req, { params: Promise.resolve(opts.params ?? {}) });
}

export async function errorOf(res: Response): Promise<{ code: string; message: string }> {
  const body = (await res.json()) as { error?: { code: string; message: string } };
  if (!body.error) throw new Error(`expected an error body, got ${JSON.stringify(body)}`);
  return body.error;
}
