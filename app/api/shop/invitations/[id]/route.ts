import { route } from "@/lib/api/route-handler";
import { noContent } from "@/lib/api/responses";
import { revokeInvitation } from "@/lib/shops/invitations";
import { invitationParamsSchema } from "@/lib/validations/members";

/** Withdraws a pending invitation (its link stops working). */
export const DELETE = route({ action: "invitation:create", params: invitationParamsSchema }, async ({ session, params }) => {
  await revokeInvitation(session.shop.id, params.id);
  return noContent();
});
