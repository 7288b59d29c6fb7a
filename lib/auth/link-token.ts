import { createHash, randomBytes } from "node:crypto";

/**
 * Tokens for e-mailed links (invitations, password reset): 32 random bytes in base64url (43 characters). The link
 * carries the token; the database keeps only its SHA-256 (hex), so stolen rows do not open anything.
 */
export function createLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
