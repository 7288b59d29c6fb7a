/** Response shapes of the JSON API as the screens consume them (see the API contract in the team notes). */

import { PROJECT_STATUSES, type ProjectStatus } from "@/lib/projects/project-status";
import { ROLES, type Role } from "@/lib/permissions/roles";

export { PROJECT_STATUSES, ROLES };
export type { ProjectStatus };
export type ShopRole = Role;

export const STATUS_LABELS: Record<ProjectStatus, string> = {
  planning: "Planning",
  patterning: "Patterning",
  in_review: "In review",
  approved: "Approved",
  building: "Building",
  delivered: "Delivered",
};

export const ROLE_LABELS: Record<ShopRole, string> = {
  owner: "Owner",
  designer: "Designer",
  reviewer: "Reviewer",
  fabricator: "Fabricator",
};

export interface Project {
  id: string;
  name: string;
  client: string | null;
  dueDate: string | null;
  notes: string | null;
  status: ProjectStatus;
  createdAt: string;
  updatedAt: string;
}

export interface MeResponse {
  user: { id: string; name: string; email: string };
  shop: { id: string; name: string };
  role: ShopRole;
  permissions: string[];
  shops: { id: string; name: string; role: ShopRole }[];
}

export interface Member {
  id: string;
  userId: string;
  name: string;
  email: string;
  role: ShopRole;
  joinedAt: string;
}

export interface Invitation {
  id: string;
  email: string;
  role: ShopRole;
  createdAt: string;
  expiresAt: string;
}

export interface MembersResponse {
  members: Member[];
  invitations: Invitation[];
}

export interface InvitationInfo {
  shopName: string;
  email: string;
  role: ShopRole;
  accountExists: boolean;
}
