import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ProjectDetail } from "@/components/projects/project-detail";
import { getStudioSession } from "@/components/studio/studio-session";
import { isAppError } from "@/lib/errors/app-error";
import { can } from "@/lib/permissions/permissions";
import { findProject, toProjectDto } from "@/lib/projects/projects";
import { projectParamsSchema } from "@/lib/validations/projects";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ id: string }> }) {
  const parsed = projectParamsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  const session = await getStudioSession();
  if (!session) return null;

  let project;
  try {
    project = toProjectDto(await findProject(session.shop.id, parsed.data.id));
  } catch (err) {
    if (isAppError(err) && err.code === "NOT_FOUND") notFound();
    throw err;
  }

  return (
    <ProjectDetail
      initial={project}
      canEdit={can(session.role, "project:update")}
      canDelete={can(session.role, "project:delete")}
    />
  );
}
