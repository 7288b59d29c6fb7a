import { z } from "zod";
import { ROLES } from "@/lib/permissions/roles";

/**
 * Field schemas shared by the API and the client forms (react-hook-form zodResolver). Messages are written to be
 * shown next to the field as they are.
 */

/** Required text with a friendly message when it is missing or not text. */
export function requiredText(label: string, max: number) {
  return z
    .string({ error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be text.`) })
    .trim()
    .min(1, { error: `${label} is required.` })
    .max(max, { error: `${label} must be at most ${max} characters.` });
}

/**
 * Optional text: absent = leave unchanged (PATCH) or empty (POST); "" or null = clear. Output is string | null |
 * undefined.
 */
export function optionalText(label: string, max: number) {
  return z
    .string({ error: `${label} must be text.` })
    .trim()
    .max(max, { error: `${label} must be at most ${max} characters.` })
    .nullable()
    .optional()
    .transform((v) => (v === "" ? null : v));
}

export const emailField = z
  .string({ error: (issue) => (issue.input === undefined ? "E-mail is required." : "E-mail must be text.") })
  .trim()
  .toLowerCase()
  .max(254, { error: "E-mail must be at most 254 characters." })
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.com." }));

/** bcrypt reads at most 72 bytes of a password: longer ones would be silently cut, so they are refused. */
export const newPasswordField = z
  .string({ error: (issue) => (issue.input === undefined ? "Password is required." : "Password must be text.") })
  .min(8, { error: "Password must be at least 8 characters." })
  .refine((v) => new TextEncoder().encode(v).length <= 72, { error: "Password must be at most 72 bytes (about 72 letters)." });

/** A password typed to prove who you are (sign-in, accepting an invitation into an existing account). */
export const currentPasswordField = z
  .string({ error: (issue) => (issue.input === undefined ? "Password is required." : "Password must be text.") })
  .min(1, { error: "Password is required." })
  .max(200, { error: "Password must be at most 200 characters." });

export const roleField = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(", ")}.` });

export const uuidField = (label: string) => z.uuid({ error: `${label} must be a valid id.` });

/** Link tokens are 32 random bytes in base64url (43 characters). */
export const linkTokenField = z
  .string({ error: "Token is required." })
  .regex(/^[A-Za-z0-9_-]{43}$/, { error: "This link is not valid. Check that you copied all of it." });
