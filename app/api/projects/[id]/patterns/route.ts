import { route } from "@/lib/api/route-handler";
import { listPatterns } from "@/lib/patterns-store/patterns";
import { projectParamsSchema } from "@/lib/validations/projects";

/** Patterns of the project the caller may see (fabricators: approved ones only). */
export const GET = route({ action: "pattern:read-approved", params: projectParamsSchema }, async ({ session, params }) => ({
  patterns: await listPatterns({ shopId: session.shop.id, role: session.role }, params.id),
}));
