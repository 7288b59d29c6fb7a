/**
 * The one error type of the platform layer. Route handlers and lib/ code throw it; the route wrapper turns it into
 * `{ "error": { "code", "message" } }` with the status below. `message` is shown to people as is: one clear sentence.
 */
export const ERROR_STATUS = {
  BAD_JSON: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  PAYLOAD_TOO_LARGE: 413,
  VALIDATION: 422,
  RATE_LIMITED: 429,
  INTERNAL: 500,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface ErrorBody {
  error: { code: ErrorCode; message: string };
}

export class AppError extends Error {
  readonly code: ErrorCode;
  /** Seconds a client should wait (RATE_LIMITED only); sent as Retry-After. */
  readonly retryAfterSeconds?: number;

  constructor(code: ErrorCode, message: string, opts: { retryAfterSeconds?: number; cause?: unknown } = {}) {
    super(message, opts.cause === undefined ? undefined : { cause: opts.cause });
    this.name = "AppError";
    this.code = code;
    this.retryAfterSeconds = opts.retryAfterSeconds;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }

  toBody(): ErrorBody {
    return { error: { code: this.code, message: this.message } };
  }
}

export function isAppError(value: unknown): value is AppError {
  return value instanceof AppError;
}
