import { z } from "zod";
import { LENGTH_UNITS, type LengthUnit } from "@/lib/geometry/mesh";
import { mirrorPlaneSchema } from "@/lib/geometry/pipeline/flatten-options";
import { FOAM_MATERIALS } from "@/lib/patterns/materials";
import { MAX_OVERLAP_MM, DEFAULT_OVERLAP_MM } from "@/lib/patterns/pattern-input";
import { PAPER_IDS, type PaperId } from "@/lib/patterns/paper-sizes";

const MATERIAL_IDS = FOAM_MATERIALS.map((m) => m.id) as [string, ...string[]];
const paperField = z.enum(PAPER_IDS as unknown as [PaperId, ...PaperId[]], { error: `Paper must be one of: ${PAPER_IDS.join(", ")}.` });

/** Length as a number in the pattern's units or a string with its own unit ("250mm", "10in"). */
const lengthField = (label: string) =>
  z.union([
    z.number({ error: `${label} must be a number or a length like "250mm".` }).finite().positive({ error: `${label} must be more than 0.` }),
    z.string().trim().min(1, { error: `${label} must not be empty.` }).max(40, { error: `${label} is too long.` }),
  ], { error: `${label} must be a number or a length like "250mm".` });

/**
 * POST /api/scans/[id]/flatten. Stored as the pattern's `params` and read again by the worker (re-validated there).
 * Either `scale` (final ÷ scan, e.g. 2.5 for 250 %) or `targetWidth` (final size along `targetAxis`), not both.
 */
export const flattenParamsSchema = z
  .strictObject({
    /** seam-map version; default the latest (no seams at all when the scan has none) */
    seamMapVersion: z.number({ error: "Seam-map version must be a whole number." }).int({ error: "Seam-map version must be a whole number." }).min(1, { error: "Seam-map version starts at 1." }).optional(),
    material: z.enum(MATERIAL_IDS, { error: `Material must be one of: ${MATERIAL_IDS.join(", ")}.` }).default("eva"),
    thicknessMm: z.number({ error: "Thickness must be a number of millimetres." }).finite().positive({ error: "Thickness must be more than 0 mm." }).max(200, { error: "Thickness must be at most 200 mm." }),
    scanFace: z.enum(["outer", "inner"], { error: 'Scan face must be "outer" or "inner".' }).default("outer"),
    units: z.enum(LENGTH_UNITS as unknown as [LengthUnit, ...LengthUnit[]], { error: `Units must be one of: ${LENGTH_UNITS.join(", ")}.` }).optional(),
    scale: z.number({ error: "Scale must be a number (2.5 = 250 %)." }).finite().positive({ error: "Scale must be more than 0." }).max(1000, { error: "Scale must be at most 1000." }).optional(),
    targetWidth: lengthField("Target width").optional(),
    targetAxis: z.enum(["x", "y", "z", "largest"], { error: "Target axis must be x, y, z or largest." }).default("x"),
    paper: paperField.default("letter"),
    overlapMm: z.number({ error: "Overlap must be a number of millimetres." }).min(0, { error: "Overlap must be at least 0 mm." }).max(MAX_OVERLAP_MM, { error: `Overlap must be at most ${MAX_OVERLAP_MM} mm.` }).default(DEFAULT_OVERLAP_MM),
    tickSpacingMm: z.number({ error: "Tick spacing must be a number of millimetres." }).finite().min(5, { error: "Tick spacing must be at least 5 mm." }).max(1000, { error: "Tick spacing must be at most 1000 mm." }).default(50),
    mirror: mirrorPlaneSchema.nullable().default(null),
  })
  .refine((v) => !(v.scale !== undefined && v.targetWidth !== undefined), { error: "Give either scale or targetWidth, not both.", path: ["targetWidth"] });

export type FlattenParamsInput = z.input<typeof flattenParamsSchema>;
export type FlattenParams = z.output<typeof flattenParamsSchema>;

/** GET /api/patterns/[id]/pdf?paper=… */
export const pdfQuerySchema = z.strictObject({ paper: paperField.optional() });
