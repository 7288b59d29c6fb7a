import type { ErrorBody } from "@/lib/errors/app-error";
import { AppError } from "@/lib/errors/app-error";

const NO_STORE = { "cache-control": "no-store" };

export function json(data: unknown, init: { status?: number; headers?: Record<string, string> } = {}): Response {
  return Response.json(data, { status: init.status ?? 200, headers: { ...NO_STORE, ...init.headers } });
}

export function noContent(): Response {
  return new Response(null, { status: 204, headers: NO_STORE });
}

export function errorResponse(error: AppError): Response {
  const headers: Record<string, string> = {};
  if (error.retryAfterSeconds) headers["retry-after"] = String(error.retryAfterSeconds);
  const body: ErrorBody = error.toBody();
  return json(body, { status: error.status, headers });
}
