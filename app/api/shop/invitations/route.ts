import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { createInvitation } from "@/lib/shops/invitations";
import { invitationCreateSchema } from "@/lib/validations/members";

export const POST = route({ action: "invitation:create", body: invitationCreateSchema }, async ({ session, body }) => {
  const { invitation } = await createInvitation(session.shop, session.user, body);
  return json({ invitation }, { status: 201 });
});
