/**
 * Options of a flatten run, validated at every boundary (CLI, worker job, API) with one zod schema.
 *
 * Lengths are numbers in the output `units`, or length strings with their own unit ("6mm", "0.25in").
 */
import { z } from "zod";
import { GeometryError } from "../errors";
import { LENGTH_UNITS, MM_PER_UNIT, type LengthUnit } from "../mesh";
import { parseLengthIn } from "../units/parse-length";
import { STRAIGHT_BEVEL_DEG } from "../marks/bevel-kind";

const lengthInput = z.union([z.number().finite().nonnegative(), z.string().min(1)]);

export const mirrorPlaneSchema = z
  .object({
    axis: z.enum(["x", "y", "z"]),
    /** plane position along the axis, scan units */
    offset: z.number().finite().default(0),
    /** the mesh is one half of a symmetric build: cut every piece twice, one mirrored */
    half: z.boolean().optional(),
    /** twin match tolerance, fraction of the mesh's bounding-box diagonal */
    tolerance: z.number().positive().max(0.5).optional(),
  })
  .strict();

export const flattenOptionsSchema = z
  .object({
    /** units of the pattern; default: the scan's units */
    units: z.enum(LENGTH_UNITS as unknown as [LengthUnit, ...LengthUnit[]]).optional(),
    /** enlargement factor (final ÷ scan); exclusive with targetWidth */
    scale: z.number().finite().positive().optional(),
    /** final size along targetAxis (default x, the width); exclusive with scale */
    targetWidth: lengthInput.optional(),
    targetAxis: z.enum(["x", "y", "z", "largest"]).default("x"),
    /** foam thickness at final size; 0 = flatten the scanned surface as is */
    thickness: lengthInput.default(0),
    /** which face of the foam the mesh is */
    scanFace: z.enum(["outer", "inner"]).default("outer"),
    /** K-factor: neutral surface at K·thickness from the scanned face */
    k: z.number().min(0).max(1).default(0.5),
    /** registration tick spacing at final size; default 50 mm */
    tickSpacing: lengthInput.optional(),
    /** clearance between pieces on the layout sheet; default 10 mm */
    gap: lengthInput.optional(),
    /** width of the layout rows; default about square */
    sheetWidth: lengthInput.optional(),
    mirror: mirrorPlaneSchema.nullable().default(null),
    /** run the length-preserving refinement after the conformal map (false: a quicker conformal-only preview) */
    refine: z.boolean().default(true),
    /** seams whose bevel per side is under this many degrees are cut square (default STRAIGHT_BEVEL_DEG = 5) */
    straightBevelDeg: z.number().min(0).max(45).default(STRAIGHT_BEVEL_DEG),
    /** warn when a piece stretches or compresses more than this (fraction, 0.05 = 5 %).
     * // Common practice: EVA foam takes a few percent of stretch when warmed and glued; more needs a dart. */
    stretchLimit: z.number().positive().max(10).default(0.05),
  })
  .strict()
  .refine((o) => !(o.scale !== undefined && o.targetWidth !== undefined), {
    message: "give either scale or targetWidth, not both",
    path: ["targetWidth"],
  });

export type FlattenOptionsInput = z.input<typeof flattenOptionsSchema>;
export type FlattenOptions = z.output<typeof flattenOptionsSchema>;

/** Default tick spacing. // Common practice: registration marks every 2 in (about 50 mm) along a seam. */
export const DEFAULT_TICK_SPACING_MM = 50;
/** Default clearance between pieces. // Common practice: a knife's width plus margin, 10 mm. */
export const DEFAULT_GAP_MM = 10;

/**
 * Parses options; a zod problem becomes one GeometryError BAD_PARAMETER sentence naming the field.
 */
export function parseFlattenOptions(input: unknown): FlattenOptions {
  const r = flattenOptionsSchema.safeParse(input ?? {});
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  const field = issue.path.length ? issue.path.join(".") : "options";
  throw new GeometryError("BAD_PARAMETER", `Flatten option ${field}: ${issue.message}.`);
}

/** A length option (number in `units`, or a string with its own unit) in `units`. */
export function resolveLength(value: number | string | undefined, units: LengthUnit, what: string, fallbackMm?: number): number | undefined {
  if (value === undefined) return fallbackMm === undefined ? undefined : fallbackMm / MM_PER_UNIT[units];
  const v = typeof value === "number" ? value : parseLengthIn(value, units, what);
  if (!(v >= 0) || !Number.isFinite(v)) throw new GeometryError("BAD_PARAMETER", `The ${what} must be a length of zero or more (got ${String(value)}).`);
  return v;
}
