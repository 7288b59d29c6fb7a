import { ROLES, type Role } from "@/lib/permissions/roles";

/**
 * What each role may do in its shop: the single source of truth. The API wrapper checks it on every request, the
 * screens use it to show or hide controls (via `permissions` in GET /api/me), and the tests iterate it.
 *
 * owner: everything, members included. designer: create and edit projects, upload scans, edit seams, run
 * flattening. reviewer: read everything, decide reviews, comment. fabricator: read projects and approved patterns,
 * download them, comment.
 */
export const ACTIONS = [
  "project:create",
  "project:read",
  "project:update",
  "project:delete",
  "scan:upload",
  "seams:edit",
  "flatten:run",
  "pattern:read",
  "pattern:read-approved",
  "pattern:download",
  "review:decide",
  "comment:create",
  "member:read",
  "member:manage",
  "invitation:create",
] as const;

export type Action = (typeof ACTIONS)[number];

export const PERMISSIONS: Readonly<Record<Role, readonly Action[]>> = {
  owner: ACTIONS,
  designer: [
    "project:create", "project:read", "project:update",
    "scan:upload", "seams:edit", "flatten:run",
    "pattern:read", "pattern:read-approved", "pattern:download",
    "comment:create", "member:read",
  ],
  reviewer: [
    "project:read",
    "pattern:read", "pattern:read-approved", "pattern:download",
    "review:decide", "comment:create", "member:read",
  ],
  fabricator: [
    "project:read",
    "pattern:read-approved", "pattern:download",
    "comment:create", "member:read",
  ],
};

const GRANTS: ReadonlyMap<Role, ReadonlySet<Action>> = new Map(ROLES.map((r) => [r, new Set(PERMISSIONS[r])]));

/** True when `role` may perform `action`. Unknown roles may do nothing. */
export function can(role: Role | null | undefined, action: Action): boolean {
  if (!role) return false;
  return GRANTS.get(role)?.has(action) ?? false;
}

/** Every action a role may perform, in table order. */
export function permissionsOf(role: Role): Action[] {
  return ACTIONS.filter((a) => can(role, a));
}
