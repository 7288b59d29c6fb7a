import { z } from "zod";
import { currentPasswordField, emailField, linkTokenField, optionalText, roleField, uuidField } from "@/lib/validations/fields";

/** POST /api/shop/invitations */
export const invitationCreateSchema = z.strictObject({ email: emailField, role: roleField });
export type InvitationCreateInput = z.infer<typeof invitationCreateSchema>;

/** PATCH /api/shop/members/[id] */
export const memberUpdateSchema = z.strictObject({ role: roleField });
export type MemberUpdateInput = z.infer<typeof memberUpdateSchema>;

/** Route params of /api/shop/members/[id] (a membership id). */
export const memberParamsSchema = z.object({ id: uuidField("Member") });

/** Route params of /api/invitations/[token] */
export const invitationTokenParamsSchema = z.object({ token: linkTokenField });

/**
 * POST /api/invitations/[token]/accept. For a new account `name` is required and `password` becomes the password
 * (checked against the new-password rules in lib/accounts); for an existing account `password` proves it is yours.
 */
export const invitationAcceptSchema = z.strictObject({
  name: optionalText("Name", 120),
  password: currentPasswordField,
});
export type InvitationAcceptInput = z.infer<typeof invitationAcceptSchema>;

/** Route params of /api/shop/invitations/[id] */
export const invitationParamsSchema = z.object({ id: uuidField("Invitation") });
