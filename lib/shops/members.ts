import { Op } from "sequelize";
import { AppError } from "@/lib/errors/app-error";
import type { Role } from "@/lib/permissions/roles";
import { getSequelize } from "@/lib/db/sequelize";
import { Invitation, Membership, Shop, User } from "@/models";

export interface MemberDto {
  id: string;
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export interface PendingInvitationDto {
  id: string;
  email: string;
  role: Role;
  createdAt: string;
  expiresAt: string;
}

function toMemberDto(m: Membership): MemberDto {
  return { id: m.id, userId: m.userId, name: m.user!.name, email: m.user!.email, role: m.role, joinedAt: m.createdAt.toISOString() };
}

export function toInvitationDto(i: Invitation): PendingInvitationDto {
  return { id: i.id, email: i.email, role: i.role, createdAt: i.createdAt.toISOString(), expiresAt: i.expiresAt.toISOString() };
}

/**
 * The shop's members (oldest first) and, when `withInvitations`, its pending invitations (not accepted, not expired).
 * Pending invitations are only shown to those who may manage members.
 */
export async function listMembers(
  shopId: string,
  withInvitations: boolean,
): Promise<{ members: MemberDto[]; invitations: PendingInvitationDto[] }> {
  getSequelize();
  const members = await Membership.findAll({
    where: { shopId },
    include: [{ model: User, as: "user" }],
    order: [["createdAt", "ASC"]],
  });
  const invitations = withInvitations
    ? await Invitation.findAll({
        where: { shopId, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
        order: [["createdAt", "DESC"]],
      })
    : [];
  return { members: members.map(toMemberDto), invitations: invitations.map(toInvitationDto) };
}

/**
 * Changes a member's role. Member changes of one shop are serialised by locking the shop row, so two owners
 * demoting each other at once cannot leave the shop without an owner.
 * @throws AppError NOT_FOUND (not a membership of this shop), CONFLICT (would remove the last owner).
 */
export async function changeMemberRole(shopId: string, membershipId: string, role: Role): Promise<MemberDto> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    await Shop.findByPk(shopId, { lock: transaction.LOCK.UPDATE, transaction });
    const m = await Membership.findOne({ where: { id: membershipId, shopId }, include: [{ model: User, as: "user" }], transaction });
    if (!m) throw new AppError("NOT_FOUND", "No such member in this shop.");
    if (m.role === "owner" && role !== "owner") await assertAnotherOwner(shopId, m.id, "demoted", transaction);
    await m.update({ role }, { transaction });
    return toMemberDto(m);
  });
}

/** Removes a member from the shop (their account stays). Same last-owner rule as changeMemberRole. */
export async function removeMember(shopId: string, membershipId: string): Promise<void> {
  const sequelize = getSequelize();
  await sequelize.transaction(async (transaction) => {
    await Shop.findByPk(shopId, { lock: transaction.LOCK.UPDATE, transaction });
    const m = await Membership.findOne({ where: { id: membershipId, shopId }, transaction });
    if (!m) throw new AppError("NOT_FOUND", "No such member in this shop.");
    if (m.role === "owner") await assertAnotherOwner(shopId, m.id, "removed", transaction);
    await m.destroy({ transaction });
  });
}

async function assertAnotherOwner(
  shopId: string,
  exceptMembershipId: string,
  verb: string,
  transaction: import("sequelize").Transaction,
): Promise<void> {
  const others = await Membership.count({
    where: { shopId, role: "owner", id: { [Op.ne]: exceptMembershipId } },
    transaction,
  });
  if (others === 0) {
    throw new AppError("CONFLICT", `The last owner cannot be ${verb}. Make another member an owner first.`);
  }
}
