"use client";

import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Panel } from "@/components/ui/panel";
import { PageHeading } from "@/components/studio/page-heading";
import type { Project } from "@/lib/client/api-types";
import { CreateProjectForm } from "./create-project-form";
import { ProjectsTable } from "./projects-table";

/** The projects screen body: heading, the "New project" action for roles that may create, and the list. */
export function ProjectsBoard({ shopName, canCreate, initial }: { shopName: string; canCreate: boolean; initial?: Project[] }) {
  const [creating, setCreating] = useState(false);
  const newButton = useRef<HTMLButtonElement>(null);

  return (
    <>
      <PageHeading
        eyebrow={shopName}
        title="Projects"
        lead="Every build the shop is working on."
        actions={
          canCreate && !creating ? (
            <Button ref={newButton} onClick={() => setCreating(true)}>
              <span aria-hidden="true">+</span> New project
            </Button>
          ) : null
        }
      />
      {canCreate && creating ? (
        <div id="new-project-panel" className="mb-6">
          <Panel title="New project">
            <CreateProjectForm
              onDone={() => {
                setCreating(false);
                requestAnimationFrame(() => newButton.current?.focus());
              }}
            />
          </Panel>
        </div>
      ) : null}
      <Panel title="All projects">
        <ProjectsTable initial={initial} />
      </Panel>
    </>
  );
}
