"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useEffect } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/toast/toast-provider";
import { errorMessage } from "@/lib/client/api-fetch";
import { useCreateProject } from "@/lib/client/use-projects";
import { projectCreateSchema } from "@/lib/validations/projects";
import { ProjectFields } from "./project-fields";

/** New project form (POST /api/projects); on success opens the project page. */
export function CreateProjectForm({ onDone }: { onDone: () => void }) {
  const router = useRouter();
  const toast = useToast();
  const create = useCreateProject();
  const form = useForm<z.input<typeof projectCreateSchema>, unknown, z.output<typeof projectCreateSchema>>({
    resolver: zodResolver(projectCreateSchema),
    defaultValues: { name: "", client: "", dueDate: "", notes: "", status: "planning" },
  });
  const { errors, isSubmitting } = form.formState;
  const { setFocus } = form;
  // The form opens on a button press: move focus into it for keyboard and screen-reader users.
  useEffect(() => setFocus("name"), [setFocus]);

  const onSubmit = form.handleSubmit(async (values) => {
    try {
      const project = await create.mutateAsync(values);
      toast.success(`Project “${project.name}” created.`);
      form.reset();
      onDone();
      router.push(`/projects/${project.id}`);
    } catch (err) {
      toast.error(`Could not create the project: ${errorMessage(err)}`);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="New project">
      <ProjectFields
        idPrefix="new-project"
        register={form.register}
        errors={errors}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          Create project
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
