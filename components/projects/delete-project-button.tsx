"use client";

import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/toast/toast-provider";
import { errorMessage } from "@/lib/client/api-fetch";
import { useDeleteProject } from "@/lib/client/use-projects";

/** Delete with an inline confirmation step that names the project. */
export function DeleteProjectButton({ projectId, projectName }: { projectId: string; projectName: string }) {
  const router = useRouter();
  const toast = useToast();
  const remove = useDeleteProject(projectId);
  const [confirming, setConfirming] = useState(false);
  const warningId = useId();

  if (!confirming) {
    return (
      <Button variant="secondary" onClick={() => setConfirming(true)}>
        Delete project
      </Button>
    );
  }
  return (
    <div role="group" aria-describedby={warningId} className="flex flex-wrap items-center gap-2 border border-ember-700 bg-ember-500/10 px-3 py-2">
      <p id={warningId} className="text-sm text-ember-700">
        Delete “{projectName}” for everyone in the shop?
      </p>
      <Button
        variant="danger"
        busy={remove.isPending}
        autoFocus
        onClick={() =>
          remove.mutate(undefined, {
            onSuccess: () => {
              toast.success(`Project “${projectName}” deleted.`);
              router.push("/projects");
              router.refresh();
            },
            onError: (err) => toast.error(`Could not delete: ${errorMessage(err)}`),
          })
        }
      >
        Yes, delete
      </Button>
      <Button variant="ghost" onClick={() => setConfirming(false)}>
        Keep it
      </Button>
    </div>
  );
}
