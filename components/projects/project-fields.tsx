"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import type { z } from "zod";
import { PROJECT_STATUSES, STATUS_LABELS } from "@/lib/client/api-types";
import type { projectCreateSchema } from "@/lib/validations/projects";

/**
 * The editable project fields, shared by the create and the edit form. Both submit every field, so both validate
 * with projectCreateSchema (a full object that passes it also passes projectUpdateSchema on the server).
 */
export type ProjectFormValues = z.input<typeof projectCreateSchema>;

const statusOptions = PROJECT_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }));

export function ProjectFields({
  idPrefix,
  register,
  errors,
}: {
  idPrefix: string;
  register: UseFormRegister<ProjectFormValues>;
  errors: FieldErrors<ProjectFormValues>;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <TextField id={`${idPrefix}-name`} label="Project name" error={errors.name?.message} {...register("name")} />
      </div>
      <TextField id={`${idPrefix}-client`} label="Client" hint="Show, production or customer." error={errors.client?.message} {...register("client")} />
      <TextField id={`${idPrefix}-due`} label="Due date" type="date" error={errors.dueDate?.message} {...register("dueDate")} />
      <SelectField id={`${idPrefix}-status`} label="Status" options={statusOptions} error={errors.status?.message} {...register("status")} />
      <div className="sm:col-span-2">
        <TextAreaField
          id={`${idPrefix}-notes`}
          label="Notes"
          hint="Materials, foam thickness, reference links, anything the team should know."
          error={errors.notes?.message}
          rows={5}
          {...register("notes")}
        />
      </div>
    </div>
  );
}
