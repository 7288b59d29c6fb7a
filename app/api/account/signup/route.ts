import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { signUp } from "@/lib/accounts/sign-up";
import { AppError } from "@/lib/errors/app-error";
import { clientIp, signUpsByIp } from "@/lib/rate-limit/limits";
import { signUpSchema } from "@/lib/validations/account";

/** Creates a shop and its owner. The client signs in afterwards with the same e-mail and password. */
export const POST = route({ auth: "none", body: signUpSchema }, async ({ req, body }) => {
  const limit = await signUpsByIp.consume(clientIp(req.headers));
  if (!limit.allowed) {
    throw new AppError("RATE_LIMITED", "Too many new accounts from this address. Try again later.", { retryAfterSeconds: limit.retryAfterSeconds });
  }
  return json(await signUp(body), { status: 201 });
});
