import type { JWT } from "next-auth/jwt";
import { readSessionToken } from "@/lib/auth/session-token";
import { AppError } from "@/lib/errors/app-error";
import type { Role } from "@/lib/permissions/roles";
import { getSequelize } from "@/lib/db/sequelize";
import { Membership, Shop, User } from "@/models";

/** Who is calling, in which shop, with which role: loaded fresh from the database on every request. */
export interface SessionContext {
  user: User;
  shop: Shop;
  membership: Membership;
  role: Role;
  token: JWT;
}

/**
 * Resolves the session of a request from its next-auth cookie. The token's active shop is used when the user still
 * belongs to it, else their oldest membership (e.g. after being removed from the shop they had open).
 * @throws AppError UNAUTHENTICATED without a valid session (none, tampered, user gone, password changed since);
 *   FORBIDDEN when the user belongs to no shop.
 */
export async function loadSession(req: Request): Promise<SessionContext> {
  const token = await readSessionToken(req);
  if (!token?.userId || typeof token.userId !== "string") {
    throw new AppError("UNAUTHENTICATED", "Sign in to continue.");
  }
  getSequelize();
  const user = await User.findByPk(token.userId);
  if (!user || user.sessionVersion !== (token.sv ?? 0)) {
    throw new AppError("UNAUTHENTICATED", "Your session has ended. Sign in again.");
  }
  const include = [{ model: Shop, as: "shop" }];
  let membership =
    typeof token.shopId === "string"
      ? await Membership.findOne({ where: { userId: user.id, shopId: token.shopId }, include })
      : null;
  membership ??= await Membership.findOne({ where: { userId: user.id }, include, order: [["createdAt", "ASC"]] });
  if (!membership?.shop) {
    throw new AppError("FORBIDDEN", "You are not a member of any shop. Ask a shop owner for an invitation.");
  }
  return { user, shop: membership.shop, membership, role: membership.role, token };
}
