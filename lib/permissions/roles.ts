/** The four roles a person can hold in a shop, from most to least privileged. */
export const ROLES = ["owner", "designer", "reviewer", "fabricator"] as const;
export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
