import { UniqueConstraintError } from "sequelize";
import type { z } from "zod";
import { loadSession, type SessionContext } from "@/lib/api/session-context";
import { DEFAULT_MAX_BODY_BYTES, readJsonBody } from "@/lib/api/read-json-body";
import { errorResponse, json } from "@/lib/api/responses";
import { appUrl } from "@/lib/auth/auth-config";
import { AppError, isAppError } from "@/lib/errors/app-error";
import { can, type Action } from "@/lib/permissions/permissions";
import { formatIssues } from "@/lib/validations/format-issues";

type AuthMode = "required" | "none";
type Schema = z.ZodType;
type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteOptions<P, Q, B, A extends AuthMode> {
  /** Permission the caller's role needs in the active shop (lib/permissions/permissions.ts). Implies auth. */
  action?: Action;
  /** "required" (default): a signed-in member of a shop; "none": public route, `session` is null. */
  auth?: A;
  /** Route params (`[id]` segments). A value that does not parse answers 404: such a resource cannot exist. */
  params?: P;
  /** Query string, as an object of strings. Failures answer 422. */
  query?: Q;
  /** JSON body. Malformed JSON answers 400, failures 422 naming the field. */
  body?: B;
  /** Body size limit in bytes (default 64 KiB); larger bodies answer 413. */
  maxBodyBytes?: number;
}

export interface RouteContext<P, Q, B, A extends AuthMode> {
  req: Request;
  params: Out<P>;
  query: Out<Q>;
  body: Out<B>;
  session: A extends "none" ? null : SessionContext;
}

/** What Next passes as the second argument of a route handler. */
export interface NextRouteContext {
  params: Promise<unknown>;
}

/**
 * A wrapped handler. `routeOptions` exposes what the wrapper enforces, so tests derive the expected status of every
 * route and role from the permission table instead of restating it.
 */
export type RouteHandler = ((req: Request, context: NextRouteContext) => Promise<Response>) & {
  routeOptions: { action: Action | undefined; auth: AuthMode; hasBody: boolean; hasParams: boolean };
};

const UNSAFE_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * The one wrapper of every API route handler. In order: cross-site check (unsafe methods), session (401), route
 * params (404), role check against the permission table (403), body read with a size limit (413/400), zod
 * validation of query and body (422), then the handler. This is the only try/catch: AppError becomes its status and
 * `{ error: { code, message } }`; a unique-constraint race becomes 409; anything else a generic 500 and one log line.
 *
 * The handler returns a Response (for 201/202/204 or headers) or plain data (sent as JSON 200).
 *
 * Sessions come from the real next-auth JWT cookie of the request, so tests call handlers with a Request that carries
 * a cookie made by encodeSessionToken() (lib/auth/session-token.ts); nothing is mocked.
 */
export function route<
  P extends Schema | undefined = undefined,
  Q extends Schema | undefined = undefined,
  B extends Schema | undefined = undefined,
  A extends AuthMode = "required",
>(
  options: RouteOptions<P, Q, B, A>,
  handler: (ctx: RouteContext<P, Q, B, A>) => Promise<Response | object> | Response | object,
): RouteHandler {
  const authRequired = options.auth !== "none" || options.action !== undefined;

  const handle = async (req: Request, context: NextRouteContext): Promise<Response> => {
    try {
      if (UNSAFE_METHODS.has(req.method)) refuseCrossSite(req);

      const session = authRequired ? await loadSession(req) : null;

      let params: unknown = undefined;
      if (options.params) {
        const raw = (await context?.params) ?? {};
        const parsed = options.params.safeParse(raw);
        if (!parsed.success) throw new AppError("NOT_FOUND", "Nothing was found at this address.");
        params = parsed.data;
      }

      if (options.action && session && !can(session.role, options.action)) {
        throw new AppError("FORBIDDEN", `Your role (${session.role}) does not allow this (${options.action}).`);
      }

      let query: unknown = undefined;
      if (options.query) {
        const raw = Object.fromEntries(new URL(req.url).searchParams);
        const parsed = options.query.safeParse(raw);
        if (!parsed.success) throw new AppError("VALIDATION", formatIssues(parsed.error, "query"));
        query = parsed.data;
      }

      let body: unknown = undefined;
      if (options.body) {
        const raw = await readJsonBody(req, options.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES);
        const parsed = options.body.safeParse(raw);
        if (!parsed.success) throw new AppError("VALIDATION", formatIssues(parsed.error));
        body = parsed.data;
      }

      const result = await handler({ req, params, query, body, session } as RouteContext<P, Q, B, A>);
      return result instanceof Response ? result : json(result);
    } catch (err) {
      if (isAppError(err)) return errorResponse(err);
      if (err instanceof UniqueConstraintError) {
        return errorResponse(new AppError("CONFLICT", "This conflicts with an existing record. Reload and try again."));
      }
      const path = safePath(req.url);
      const what = err instanceof Error ? `${err.name}: ${err.message}` : String(err);
      console.error(`[api] 500 ${req.method} ${path}: ${what.replace(/\s*\n\s*/g, " | ")}`);
      return errorResponse(new AppError("INTERNAL", "Something went wrong on our side. Please try again."));
    }
  };
  return Object.assign(handle, {
    routeOptions: { action: options.action, auth: authRequired ? "required" : "none", hasBody: !!options.body, hasParams: !!options.params },
  } as const);
}

/**
 * Refuses state-changing requests that a browser marks as cross-site (Sec-Fetch-Site) or that come from another
 * origin. Requests without these headers (scripts, tests) pass: they carry no ambient browser cookies.
 */
function refuseCrossSite(req: Request): void {
  const site = req.headers.get("sec-fetch-site");
  if (site === "cross-site") throw new AppError("FORBIDDEN", "Cross-site requests are refused.");
  const origin = req.headers.get("origin");
  if (origin && origin !== "null" && origin !== new URL(appUrl()).origin && origin !== new URL(req.url).origin) {
    throw new AppError("FORBIDDEN", "Requests from other sites are refused.");
  }
}

function safePath(url: string): string {
  try {
    return new URL(url).pathname;
  } catch {
    return "?";
  }
}
