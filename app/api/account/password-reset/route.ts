import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { requestPasswordReset } from "@/lib/accounts/password-reset";
import { clientIp } from "@/lib/rate-limit/limits";
import { passwordResetRequestSchema } from "@/lib/validations/account";

/** 202 whether or not the account exists, so the form does not reveal who has one. */
export const POST = route({ auth: "none", body: passwordResetRequestSchema }, async ({ req, body }) => {
  await requestPasswordReset(body.email, clientIp(req.headers));
  return json({ message: "If an account uses this e-mail, a reset link is on its way." }, { status: 202 });
});
