import type { Metadata } from "next";
import { ProjectsBoard } from "@/components/projects/projects-board";
import { getStudioSession } from "@/components/studio/studio-session";
import { can } from "@/lib/permissions/permissions";
import { listProjects } from "@/lib/projects/projects";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const session = await getStudioSession();
  if (!session) return null;
  const projects = await listProjects(session.shop.id);

  return <ProjectsBoard shopName={session.shop.name} canCreate={can(session.role, "project:create")} initial={projects} />;
}
