import { route } from "@/lib/api/route-handler";
import { noContent } from "@/lib/api/responses";
import { changeMemberRole, removeMember } from "@/lib/shops/members";
import { memberParamsSchema, memberUpdateSchema } from "@/lib/validations/members";

export const PATCH = route(
  { action: "member:manage", params: memberParamsSchema, body: memberUpdateSchema },
  async ({ session, params, body }) => ({ member: await changeMemberRole(session.shop.id, params.id, body.role) }),
);

export const DELETE = route({ action: "member:manage", params: memberParamsSchema }, async ({ session, params }) => {
  await removeMember(session.shop.id, params.id);
  return noContent();
});
