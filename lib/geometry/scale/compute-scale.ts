/**
 * Enlargement from the scan (or sculpt) to the build: by a factor, or by a target size along one axis of the
 * bounding box. Shops compute target ÷ original: a sculpt 3 wide built 7 wide is ×2.333, i.e. 233 %.
 * // Common practice (scaling a maquette up by a ratio of target to original size)
 */
import { GeometryError } from "../errors";
import { MM_PER_UNIT, type LengthUnit } from "../mesh";

/** Which bounding-box extent a target size refers to; `largest` = the longest of the three. */
export type ScaleAxis = "x" | "y" | "z" | "largest";

export interface ScaleRequest {
  /** plain enlargement factor (1 = as scanned); exclusive with `target` */
  factor?: number;
  /** target size in output units along `axis` (default x = width); exclusive with `factor` */
  target?: { length: number; axis?: ScaleAxis };
}

export interface ScaleResult {
  /** dimensionless enlargement, final size ÷ scan size */
  factor: number;
  /** factor as a percentage, rounded to 0.1 % (233.3 for 3 → 7) */
  percent: number;
  /** the requested target length (output units), null when scaled by factor */
  targetWidth: number | null;
  /** multiplier from scan coordinates to output coordinates: factor × (mm per scan unit ÷ mm per output unit) */
  coordinateFactor: number;
}

/**
 * Extent of a vertex set along an axis; only vertices referenced by `triangles` count (welded duplicates and
 * decimated vertices stay in the array unreferenced).
 *
 * @param positions  #V×3, scan units
 * @param triangles  #F×3
 * @returns          [sx, sy, sz] bounding-box size, scan units
 */
export function referencedBoxSize(positions: Float64Array, triangles: Uint32Array): [number, number, number] {
  let minX = Infinity, minY = Infinity, minZ = Infinity, maxX = -Infinity, maxY = -Infinity, maxZ = -Infinity;
  for (let i = 0; i < triangles.length; i++) {
    const v = triangles[i] * 3;
    const x = positions[v], y = positions[v + 1], z = positions[v + 2];
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
    if (z < minZ) minZ = z;
    if (z > maxZ) maxZ = z;
  }
  if (triangles.length === 0) return [0, 0, 0];
  return [maxX - minX, maxY - minY, maxZ - minZ];
}

/** The bounding-box extent a target refers to. */
export function extentAlong(size: [number, number, number], axis: ScaleAxis): number {
  if (axis === "x") return size[0];
  if (axis === "y") return size[1];
  if (axis === "z") return size[2];
  return Math.max(size[0], size[1], size[2]);
}

/**
 * Works out the enlargement.
 *
 * @param boxSize   bounding-box size of the scan, scan units
 * @param scanUnits units of the scan coordinates
 * @param outUnits  units of the pattern
 * @throws GeometryError BAD_PARAMETER for both or a non-positive factor/target, or a zero extent along the axis
 */
export function computeScale(
  boxSize: [number, number, number],
  scanUnits: LengthUnit,
  outUnits: LengthUnit,
  req: ScaleRequest,
): ScaleResult {
  const unitFactor = MM_PER_UNIT[scanUnits] / MM_PER_UNIT[outUnits];
  if (req.factor !== undefined && req.target !== undefined) {
    throw new GeometryError("BAD_PARAMETER", "Give either a scale factor or a target size, not both.");
  }
  let factor = 1;
  let targetWidth: number | null = null;
  if (req.factor !== undefined) {
    if (!(req.factor > 0) || !Number.isFinite(req.factor)) {
      throw new GeometryError("BAD_PARAMETER", `The scale factor must be a positive number (got ${req.factor}).`);
    }
    factor = req.factor;
  } else if (req.target !== undefined) {
    const axis = req.target.axis ?? "x";
    if (!(req.target.length > 0) || !Number.isFinite(req.target.length)) {
      throw new GeometryError("BAD_PARAMETER", `The target size must be a positive length (got ${req.target.length}).`);
    }
    const original = extentAlong(boxSize, axis) * unitFactor;
    if (!(original > 0)) {
      throw new GeometryError("BAD_PARAMETER", `The mesh has no extent along ${axis}, so it cannot be scaled to a target size along it.`);
    }
    // Common practice: target ÷ original.
    factor = req.target.length / original;
    targetWidth = req.target.length;
  }
  return { factor, percent: Math.round(factor * 1000) / 10, targetWidth, coordinateFactor: factor * unitFactor };
}
