/**
 * Shape of a seam file: `{"seams": [[i, j], …]}`, each pair two 0-based input-file vertex indices (OBJ: the n-th
 * `v` statement is n − 1; STL: vertices in order of first appearance, as the intake numbers them).
 * Kept beside the geometry code it serves; lib/validations can re-export it for the API and the viewer.
 */
import { z } from "zod";

const vertexIndex = z
  .number({ error: "must be a number" })
  .int({ error: "must be a whole number" })
  .nonnegative({ error: "must not be negative" })
  .max(0xfffffffe, { error: "is larger than any vertex index" });

export const seamsFileSchema = z.object({
  seams: z.array(z.tuple([vertexIndex, vertexIndex], { error: "must be a pair [i, j] of two vertex indices" }), {
    error: "must be an array of vertex index pairs",
  }),
});

export type SeamsFile = z.infer<typeof seamsFileSchema>;
