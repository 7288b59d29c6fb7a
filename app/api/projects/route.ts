import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { createProject, listProjects } from "@/lib/projects/projects";
import { projectCreateSchema } from "@/lib/validations/projects";

export const GET = route({ action: "project:read" }, async ({ session }) => ({
  projects: await listProjects(session.shop.id),
}));

export const POST = route({ action: "project:create", body: projectCreateSchema }, async ({ session, body }) =>
  json({ project: await createProject(session.shop.id, session.user.id, body) }, { status: 201 }),
);
