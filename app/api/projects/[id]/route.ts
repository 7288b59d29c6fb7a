import { route } from "@/lib/api/route-handler";
import { noContent } from "@/lib/api/responses";
import { deleteProject, findProject, toProjectDto, updateProject } from "@/lib/projects/projects";
import { projectParamsSchema, projectUpdateSchema } from "@/lib/validations/projects";

export const GET = route({ action: "project:read", params: projectParamsSchema }, async ({ session, params }) => ({
  project: toProjectDto(await findProject(session.shop.id, params.id)),
}));

export const PATCH = route(
  { action: "project:update", params: projectParamsSchema, body: projectUpdateSchema },
  async ({ session, params, body }) => ({ project: await updateProject(session.shop.id, params.id, body) }),
);

export const DELETE = route({ action: "project:delete", params: projectParamsSchema }, async ({ session, params }) => {
  await deleteProject(session.shop.id, params.id);
  return noContent();
});
