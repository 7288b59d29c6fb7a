import { route } from "@/lib/api/route-handler";
import { can } from "@/lib/permissions/permissions";
import { listMembers } from "@/lib/shops/members";

/** Members of the active shop; pending invitations only for roles that may manage members (else an empty list). */
export const GET = route({ action: "member:read" }, async ({ session }) =>
  listMembers(session.shop.id, can(session.role, "member:manage")),
);
