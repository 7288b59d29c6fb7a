import { appUrl } from "@/lib/auth/auth-config";
import { createLinkToken, hashLinkToken } from "@/lib/auth/link-token";
import { AppError } from "@/lib/errors/app-error";
import { sendMail } from "@/lib/mail/send-mail";
import type { Role } from "@/lib/permissions/roles";
import { invitationMail } from "@/lib/shops/invitation-mail";
import { toInvitationDto, type PendingInvitationDto } from "@/lib/shops/members";
import { getSequelize } from "@/lib/db/sequelize";
import { Invitation, Membership, Shop, User } from "@/models";

/** Invitation links work for 7 days. */
export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

/**
 * Invites an e-mail address into the shop with a role and e-mails the link `${APP_URL}/invite/${token}`. An older
 * pending invitation of the same address is replaced (its link stops working). The row and the e-mail succeed or
 * fail together: if the mail server refuses, nothing is stored.
 * @throws AppError CONFLICT when the address already belongs to a member.
 */
export async function createInvitation(
  shop: Shop,
  inviter: User,
  input: { email: string; role: Role },
): Promise<{ invitation: PendingInvitationDto; token: string }> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: input.email }, transaction });
    if (existing && (await Membership.count({ where: { userId: existing.id, shopId: shop.id }, transaction })) > 0) {
      throw new AppError("CONFLICT", `${input.email} is already a member of ${shop.name}.`);
    }
    await Invitation.destroy({ where: { shopId: shop.id, email: input.email, acceptedAt: null }, transaction });
    const { token, tokenHash } = createLinkToken();
    const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
    const inv = await Invitation.create(
      { shopId: shop.id, invitedById: inviter.id, email: input.email, role: input.role, tokenHash, expiresAt },
      { transaction },
    );
    const link = `${appUrl()}/invite/${token}`;
    await sendMail({ to: input.email, ...invitationMail({ shopName: shop.name, inviterName: inviter.name, role: input.role, link, expiresAt }) });
    return { invitation: toInvitationDto(inv), token };
  });
}

/** Withdraws a pending invitation of this shop (its link stops working). */
export async function revokeInvitation(shopId: string, invitationId: string): Promise<void> {
  getSequelize();
  const n = await Invitation.destroy({ where: { id: invitationId, shopId, acceptedAt: null } });
  if (n === 0) throw new AppError("NOT_FOUND", "No such pending invitation in this shop.");
}

/**
 * Finds a usable invitation by its link token.
 * @throws AppError NOT_FOUND (unknown or withdrawn link), CONFLICT (already accepted, or expired).
 */
export async function findUsableInvitation(
  token: string,
  transaction?: import("sequelize").Transaction,
): Promise<Invitation & { shop: Shop }> {
  getSequelize();
  const inv = await Invitation.findOne({
    where: { tokenHash: hashLinkToken(token) },
    include: [{ model: Shop, as: "shop" }],
    transaction,
    lock: transaction ? { level: transaction.LOCK.UPDATE, of: Invitation } : undefined,
  });
  if (!inv || !inv.shop) {
    throw new AppError("NOT_FOUND", "This invitation link is not valid. It may have been replaced by a newer one.");
  }
  if (inv.acceptedAt) throw new AppError("CONFLICT", "This invitation has already been accepted. Sign in instead.");
  if (inv.expiresAt.getTime() <= Date.now()) {
    throw new AppError("CONFLICT", "This invitation has expired. Ask the shop owner to send a new one.");
  }
  return inv as Invitation & { shop: Shop };
}
