import { route } from "@/lib/api/route-handler";
import { acceptInvitation } from "@/lib/accounts/accept-invitation";
import { clientIp } from "@/lib/rate-limit/limits";
import { invitationAcceptSchema, invitationTokenParamsSchema } from "@/lib/validations/members";

/** Creates the account or adds the membership; the client then signs in with the invited e-mail and password. */
export const POST = route(
  { auth: "none", params: invitationTokenParamsSchema, body: invitationAcceptSchema },
  async ({ req, params, body }) => acceptInvitation(params.token, body, clientIp(req.headers)),
);
