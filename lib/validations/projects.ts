import { z } from "zod";
import { PROJECT_STATUSES } from "@/lib/projects/project-status";
import { optionalText, requiredText, uuidField } from "@/lib/validations/fields";

const statusField = z.enum(PROJECT_STATUSES, { error: `Status must be one of: ${PROJECT_STATUSES.join(", ")}.` });

/** Calendar date "YYYY-MM-DD" (a real date: 2026-02-30 is refused), or null/"" for none. */
const dueDateField = z
  .union([z.iso.date({ error: "Due date must be a date written YYYY-MM-DD." }), z.literal(""), z.null()], {
    error: "Due date must be a date written YYYY-MM-DD.",
  })
  .optional()
  .transform((v) => (v === "" ? null : v));

const projectFields = {
  name: requiredText("Project name", 160),
  client: optionalText("Client", 160),
  dueDate: dueDateField,
  notes: optionalText("Notes", 5000),
  status: statusField.optional(),
};

/** POST /api/projects */
export const projectCreateSchema = z.strictObject(projectFields);
export type ProjectCreateInput = z.infer<typeof projectCreateSchema>;

/** PATCH /api/projects/[id]: any subset of the fields, at least one. */
export const projectUpdateSchema = z
  .strictObject({ ...projectFields, name: projectFields.name.optional() })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: "Send at least one field to change." });
export type ProjectUpdateInput = z.infer<typeof projectUpdateSchema>;

/** Route params of /api/projects/[id] */
export const projectParamsSchema = z.object({ id: uuidField("Project") });
