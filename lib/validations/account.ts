import { z } from "zod";
import { currentPasswordField, emailField, linkTokenField, newPasswordField, requiredText } from "@/lib/validations/fields";

/** POST /api/account/signup: a new shop with its first owner. */
export const signUpSchema = z.strictObject({
  name: requiredText("Name", 120),
  email: emailField,
  password: newPasswordField,
  shopName: requiredText("Shop name", 120),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

/** next-auth credentials (the sign-in form). */
export const signInSchema = z.strictObject({
  email: emailField,
  password: currentPasswordField,
});
export type SignInInput = z.infer<typeof signInSchema>;

/** POST /api/account/password-reset */
export const passwordResetRequestSchema = z.strictObject({ email: emailField });
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestSchema>;

/** POST /api/account/password-reset/confirm */
export const passwordResetConfirmSchema = z.strictObject({ token: linkTokenField, password: newPasswordField });
export type PasswordResetConfirmInput = z.infer<typeof passwordResetConfirmSchema>;
