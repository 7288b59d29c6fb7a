import { GeometryError } from "../errors";

/** Throws BAD_PARAMETER unless `value` is a finite number > 0. */
export function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new GeometryError("BAD_PARAMETER", `${name} must be a finite number greater than 0 (got ${value}).`);
  }
}

/** Throws BAD_PARAMETER unless `value` is an integer ≥ `min`. */
export function requireInteger(name: string, value: number, min: number): void {
  if (!Number.isInteger(value) || value < min) {
    throw new GeometryError("BAD_PARAMETER", `${name} must be a whole number of at least ${min} (got ${value}).`);
  }
}
