/**
 * Typed errors of the geometry core. Every bad input ends in one of these, with one clear sentence that says what is
 * wrong and where (line number or byte offset). Callers (CLI, worker, API) show `message` as is.
 */
export type GeometryErrorCode =
  | "EMPTY_FILE"
  | "UNKNOWN_FORMAT"
  | "PARSE_ERROR"
  | "TRUNCATED"
  | "BAD_NUMBER"
  | "INDEX_OUT_OF_RANGE"
  | "NO_FACES"
  | "ONLY_DEGENERATE_FACES"
  | "BAD_SEAMS"
  | "SEAM_NOT_AN_EDGE"
  | "BAD_PARAMETER"
  | "SOLVER_FAILED";

export class GeometryError extends Error {
  readonly code: GeometryErrorCode;
  /** 1-based line number (text formats) where the problem was found, when known. */
  readonly line?: number;
  /** 0-based byte offset (binary formats) where the problem was found, when known. */
  readonly byteOffset?: number;

  constructor(code: GeometryErrorCode, message: string, where: { line?: number; byteOffset?: number } = {}) {
    super(message);
    this.name = "GeometryError";
    this.code = code;
    this.line = where.line;
    this.byteOffset = where.byteOffset;
  }
}

export function isGeometryError(e: unknown): e is GeometryError {
  return e instanceof GeometryError;
}
