"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Panel } from "@/components/ui/panel";
import { ProjectScansSection } from "@/components/scans/project-scans-section";
import { PageHeading } from "@/components/studio/page-heading";
import { TextLink } from "@/components/ui/text-link";
import { errorMessage } from "@/lib/client/api-fetch";
import { PROJECT_STATUSES, STATUS_LABELS, type Project } from "@/lib/client/api-types";
import { formatDay, formatTimestamp } from "@/lib/client/format";
import { useProject } from "@/lib/client/use-projects";
import { DeleteProjectButton } from "./delete-project-button";
import { EditProjectForm } from "./edit-project-form";
import { StatusBadge } from "./status-badge";

/**
 * The project page: what exists for the build now (details, notes, where it stands, its scans and patterns), with
 * edit and delete for roles that may.
 */
export function ProjectDetail({
  initial,
  canEdit,
  canDelete,
  canUpload,
  canFlatten,
}: {
  initial: Project;
  canEdit: boolean;
  canDelete: boolean;
  canUpload: boolean;
  canFlatten: boolean;
}) {
  const query = useProject(initial.id, initial);
  const [editing, setEditing] = useState(false);
  const project = query.data ?? initial;

  return (
    <>
      <p className="mb-4 text-sm">
        <TextLink href="/projects">← All projects</TextLink>
      </p>
      <PageHeading
        eyebrow="Project"
        title={project.name}
        lead={project.client ? `for ${project.client}` : undefined}
        actions={
          <>
            {canEdit && !editing ? (
              <Button variant="primary" onClick={() => setEditing(true)}>
                Edit project
              </Button>
            ) : null}
            {canDelete && !editing ? <DeleteProjectButton projectId={project.id} projectName={project.name} /> : null}
          </>
        }
      />
      {query.isError ? (
        <p role="alert" className="mb-4 text-sm text-ember-700">
          Could not refresh this project: {errorMessage(query.error)}
        </p>
      ) : null}

      {editing && canEdit ? (
        <Panel title="Edit project">
          <EditProjectForm project={project} onDone={() => setEditing(false)} />
        </Panel>
      ) : (
        <div className="grid items-start gap-6 lg:grid-cols-[2fr_1fr]">
          <Panel title="Notes">
            {project.notes ? (
              <p className="whitespace-pre-wrap break-words text-sm leading-relaxed">{project.notes}</p>
            ) : (
              <p className="text-sm text-kraft-700">No notes yet.{canEdit ? " Use “Edit project” to add materials, foam and references." : ""}</p>
            )}
          </Panel>
          <div className="flex flex-col gap-6">
            <Panel title="Details">
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
                <dt className="text-kraft-700">Status</dt>
                <dd>
                  <StatusBadge status={project.status} />
                </dd>
                <dt className="text-kraft-700">Client</dt>
                <dd className="break-words">{project.client || "—"}</dd>
                <dt className="text-kraft-700">Due</dt>
                <dd>{formatDay(project.dueDate)}</dd>
                <dt className="text-kraft-700">Created</dt>
                <dd>{formatTimestamp(project.createdAt)}</dd>
                <dt className="text-kraft-700">Updated</dt>
                <dd>{formatTimestamp(project.updatedAt)}</dd>
              </dl>
            </Panel>
            <Panel title="Progress">
              <StatusTrack status={project.status} />
            </Panel>
          </div>
        </div>
      )}
      {editing ? null : <ProjectScansSection projectId={project.id} canUpload={canUpload} canFlatten={canFlatten} />}
    </>
  );
}

/** The status steps in order, the current one marked; read as an ordered list. */
function StatusTrack({ status }: { status: Project["status"] }) {
  const current = PROJECT_STATUSES.indexOf(status);
  return (
    <ol className="flex flex-col gap-1 text-sm" aria-label="Status steps">
      {PROJECT_STATUSES.map((s, i) => (
        <li
          key={s}
          aria-current={i === current ? "step" : undefined}
          className={`flex items-center gap-2 ${i === current ? "font-bold text-foam-800" : i < current ? "text-kraft-700" : "text-kraft-500"}`}
        >
          <span
            aria-hidden="true"
            className={`inline-block h-3 w-3 border ${i <= current ? "border-foam-800 bg-foam-800" : "border-kraft-500 bg-white"} ${i === current ? "outline-2 outline-offset-1 outline-ember-500" : ""}`}
          />
          {STATUS_LABELS[s]}
          {i < current ? <span className="sr-only">(done)</span> : null}
          {i === current ? <span className="sr-only">(current)</span> : null}
        </li>
      ))}
    </ol>
  );
}
