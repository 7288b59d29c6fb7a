import { route } from "@/lib/api/route-handler";
import { describeInvitation } from "@/lib/accounts/accept-invitation";
import { invitationTokenParamsSchema } from "@/lib/validations/members";

export const GET = route({ auth: "none", params: invitationTokenParamsSchema }, async ({ params }) =>
  describeInvitation(params.token),
);
