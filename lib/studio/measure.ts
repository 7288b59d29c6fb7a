/**
 * The ruler and the dimensions panel: lengths in scan units converted to the unit the designer reads.
 * Source: MM_PER_UNIT in lib/geometry/mesh.ts (1 in = 25.4 mm exactly).
 */
import { MM_PER_UNIT, type LengthUnit } from "@/lib/geometry/mesh";
import type { StudioMesh } from "./studio-mesh";

/** Converts a length between units. */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return (value * MM_PER_UNIT[from]) / MM_PER_UNIT[to];
}

/** Decimals shown per unit. Our choice: about a tenth of a millimetre or better (0.1 mm, 0.01 cm, 0.001 m, 0.01 in). */
const DECIMALS: Record<LengthUnit, number> = { mm: 1, cm: 2, m: 3, in: 2 };

/** "123.4 mm", "4.86 in". */
export function formatLength(value: number, unit: LengthUnit): string {
  return `${value.toFixed(DECIMALS[unit])} ${unit}`;
}

export interface Measurement {
  /** straight-line distance, scan units */
  scanUnits: number;
  /** the same in `unit` */
  value: number;
  unit: LengthUnit;
  text: string;
}

/**
 * Straight-line distance between two picked surface points (ray hits, scan coordinates).
 * @param a, b  [x, y, z] in scan units
 */
export function measureDistance(a: ArrayLike<number>, b: ArrayLike<number>, scanUnit: LengthUnit, unit: LengthUnit): Measurement {
  const d = Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
  if (!Number.isFinite(d)) throw new RangeError("Both measuring points need three finite coordinates.");
  const value = convertLength(d, scanUnit, unit);
  return { scanUnits: d, value, unit, text: formatLength(value, unit) };
}

/** Distance between two vertices (e.g. snapped picks). */
export function measureVertices(sm: StudioMesh, a: number, b: number, scanUnit: LengthUnit, unit: LengthUnit): Measurement {
  const p = sm.mesh.positions;
  return measureDistance(p.subarray(3 * a, 3 * a + 3), p.subarray(3 * b, 3 * b + 3), scanUnit, unit);
}

export interface Dimensions {
  /** bounding-box extent along x, y, z in `unit` */
  x: number;
  y: number;
  z: number;
  diagonal: number;
  unit: LengthUnit;
  /** "120.0 × 80.5 × 45.2 mm" */
  text: string;
}

/** Bounding-box dimensions of the scan (used vertices only) in `unit`. */
export function meshDimensions(sm: StudioMesh, scanUnit: LengthUnit, unit: LengthUnit): Dimensions {
  const b = sm.bbox;
  const c = (v: number) => convertLength(v, scanUnit, unit);
  const x = c(b[3] - b[0]), y = c(b[4] - b[1]), z = c(b[5] - b[2]);
  const n = DECIMALS[unit];
  return { x, y, z, diagonal: c(sm.diagonal), unit, text: `${x.toFixed(n)} × ${y.toFixed(n)} × ${z.toFixed(n)} ${unit}` };
}
