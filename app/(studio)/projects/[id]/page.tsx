import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { cache } from "react";
import { ProjectDetail } from "@/components/projects/project-detail";
import { getStudioSession } from "@/components/studio/studio-session";
import { isAppError } from "@/lib/errors/app-error";
import { can } from "@/lib/permissions/permissions";
import { findProject, toProjectDto } from "@/lib/projects/projects";
import { projectParamsSchema } from "@/lib/validations/projects";

type Params = Promise<{ id: string }>;

/** The project of the active shop at this address, or null (unknown, malformed or another shop's id). */
const loadProject = cache(async (rawId: string) => {
  const parsed = projectParamsSchema.safeParse({ id: rawId });
  if (!parsed.success) return null;
  const session = await getStudioSession();
  if (!session) return null;
  try {
    return { session, project: toProjectDto(await findProject(session.shop.id, parsed.data.id)) };
  } catch (err) {
    if (isAppError(err) && err.code === "NOT_FOUND") return null;
    throw err;
  }
});

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const found = await loadProject((await params).id);
  return { title: found ? found.project.name : "Project not found" };
}

export default async function ProjectPage({ params }: { params: Params }) {
  const found = await loadProject((await params).id);
  if (!found) {
    if (!(await getStudioSession())) return null;
    notFound();
  }
  const { session, project } = found;

  return (
    <ProjectDetail
      initial={project}
      canEdit={can(session.role, "project:update")}
      canDelete={can(session.role, "project:delete")}
      canUpload={can(session.role, "scan:upload")}
      canFlatten={can(session.role, "flatten:run")}
    />
  );
}
