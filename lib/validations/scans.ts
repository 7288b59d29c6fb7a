import { z } from "zod";
import { LENGTH_UNITS, type LengthUnit } from "@/lib/geometry/mesh";
import { seamsFileSchema } from "@/lib/geometry/seams/seams-schema";
import { uuidField } from "@/lib/validations/fields";

/** Units of an uploaded scan (files carry none, so the designer declares them). */
export const scanUnitsField = z.enum(LENGTH_UNITS as unknown as [LengthUnit, ...LengthUnit[]], {
  error: `Units must be one of: ${LENGTH_UNITS.join(", ")}.`,
});

/** The text fields of the multipart upload POST /api/projects/[id]/scans (the file part is checked by content). */
export const scanUploadFieldsSchema = z.object({ units: scanUnitsField });
export type ScanUploadFields = z.infer<typeof scanUploadFieldsSchema>;

/** Route params of /api/scans/[id]/… */
export const scanParamsSchema = z.object({ id: uuidField("Scan") });

/** PUT /api/scans/[id]/seams: `{ "seams": [[i, j], …] }`, input-file vertex indices (see lib/geometry/seams). */
export const seamsBodySchema = seamsFileSchema.strict();
export type SeamsBody = z.infer<typeof seamsBodySchema>;

/** Seam maps can be large (one pair per edge of a long seam); 4 MiB is ~200 000 pairs. */
export const SEAMS_MAX_BODY_BYTES = 4 * 1024 * 1024;
