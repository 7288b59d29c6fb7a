import type { z } from "zod";

/**
 * One sentence naming the field and the reason, for the VALIDATION error message, e.g.
 * "dueDate: Due date must be a date written YYYY-MM-DD." Only the first problem is reported (forms show the rest).
 */
export function formatIssues(error: z.ZodError, root = "body"): string {
  const issue = error.issues[0];
  if (!issue) return `${root}: invalid.`;
  if (issue.code === "unrecognized_keys") {
    const keys = issue.keys.join(", ");
    return `${keys}: unknown field${issue.keys.length > 1 ? "s" : ""} (not accepted here).`;
  }
  const path = issue.path.length ? issue.path.map(String).join(".") : root;
  return `${path}: ${issue.message}`;
}

/** The field path of the first problem ("body" when it is the whole value). */
export function firstIssuePath(error: z.ZodError, root = "body"): string {
  const issue = error.issues[0];
  if (!issue) return root;
  if (issue.code === "unrecognized_keys") return issue.keys.join(",");
  return issue.path.length ? issue.path.map(String).join(".") : root;
}
