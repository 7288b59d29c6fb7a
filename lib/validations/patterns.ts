import { z } from "zod";
import { REVIEW_DECISIONS } from "@/lib/reviews/review-decisions";
import { optionalText, uuidField } from "@/lib/validations/fields";

/** Route params of /api/patterns/[id]/… */
export const patternParamsSchema = z.object({ id: uuidField("Pattern") });

/** Route params of /api/jobs/[id] (a flatten job id is its pattern's id). */
export const jobParamsSchema = z.object({ id: uuidField("Job") });

/** POST /api/patterns/[id]/reviews */
export const reviewBodySchema = z.strictObject({
  decision: z.enum(REVIEW_DECISIONS, { error: 'Decision must be "approve" or "request_changes".' }),
  comment: optionalText("Comment", 5000),
}).refine((v) => v.decision === "approve" || (v.comment ?? "").length > 0, {
  error: "Say what should change: a comment is required when you request changes.", path: ["comment"],
});
export type ReviewBody = z.infer<typeof reviewBodySchema>;
