"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/toast/toast-provider";
import { errorMessage } from "@/lib/client/api-fetch";
import type { Project } from "@/lib/client/api-types";
import { useUpdateProject } from "@/lib/client/use-projects";
import { projectCreateSchema } from "@/lib/validations/projects";
import { ProjectFields } from "./project-fields";

/** Edits every field of a project (PATCH /api/projects/[id]). */
export function EditProjectForm({ project, onDone }: { project: Project; onDone: () => void }) {
  const toast = useToast();
  const update = useUpdateProject(project.id);
  const form = useForm<z.input<typeof projectCreateSchema>, unknown, z.output<typeof projectCreateSchema>>({
    resolver: zodResolver(projectCreateSchema),
    defaultValues: {
      name: project.name,
      client: project.client ?? "",
      dueDate: project.dueDate ?? "",
      notes: project.notes ?? "",
      status: project.status,
    },
  });
  const { errors, isSubmitting } = form.formState;
  const { setFocus } = form;
  // The form opens on a button press: move focus into it for keyboard and screen-reader users.
  useEffect(() => setFocus("name"), [setFocus]);

  const onSubmit = form.handleSubmit(async (values) => {
    try {
      await update.mutateAsync({
        name: values.name,
        client: values.client ?? null,
        dueDate: values.dueDate ?? null,
        notes: values.notes ?? null,
        status: values.status,
      });
      toast.success("Project saved.");
      onDone();
    } catch (err) {
      toast.error(`Could not save: ${errorMessage(err)}`);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Edit project">
      <ProjectFields idPrefix="edit-project" register={form.register} errors={errors} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          Save changes
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
