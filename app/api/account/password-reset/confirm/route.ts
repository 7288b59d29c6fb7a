import { route } from "@/lib/api/route-handler";
import { confirmPasswordReset } from "@/lib/accounts/password-reset";
import { passwordResetConfirmSchema } from "@/lib/validations/account";

export const POST = route({ auth: "none", body: passwordResetConfirmSchema }, async ({ body }) => {
  await confirmPasswordReset(body.token, body.password);
  return { message: "Your password has been changed. Sign in with the new one." };
});
