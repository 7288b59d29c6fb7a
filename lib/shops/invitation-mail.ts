import type { Role } from "@/lib/permissions/roles";

const ROLE_WORDS: Record<Role, string> = {
  owner: "an owner (everything, including members)",
  designer: "a designer (projects, scans, seams and flattening)",
  reviewer: "a reviewer (checks patterns and signs them off)",
  fabricator: "a fabricator (approved patterns, cut lists and assembly sheets)",
};

/** The invitation e-mail: who invites, into which shop, as what, the link and when it expires. */
export function invitationMail(p: { shopName: string; inviterName: string; role: Role; link: string; expiresAt: Date }) {
  const subject = `${p.inviterName} invited you to ${p.shopName} on Peelform`;
  const text = [
    `${p.inviterName} invited you to join ${p.shopName} on Peelform as ${ROLE_WORDS[p.role]}.`,
    "",
    "Open this link to accept (you can create your account there):",
    p.link,
    "",
    `The link works once and expires on ${p.expiresAt.toUTCString()}.`,
    "If you were not expecting this, you can ignore this e-mail.",
  ].join("\n");
  return { subject, text };
}
