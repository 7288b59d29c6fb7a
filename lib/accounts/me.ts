import type { SessionContext } from "@/lib/api/session-context";
import { encodeSessionToken, sessionSetCookie } from "@/lib/auth/session-token";
import { AppError } from "@/lib/errors/app-error";
import { permissionsOf, type Action } from "@/lib/permissions/permissions";
import type { Role } from "@/lib/permissions/roles";
import { getSequelize } from "@/lib/db/sequelize";
import { Membership, Shop } from "@/models";

export interface MeDto {
  user: { id: string; name: string; email: string };
  shop: { id: string; name: string };
  role: Role;
  permissions: Action[];
  shops: { id: string; name: string; role: Role }[];
}

/** GET /api/me: who I am, my active shop and role, what I may do there, and all my shops. */
export async function describeMe(s: SessionContext): Promise<MeDto> {
  getSequelize();
  const memberships = await Membership.findAll({
    where: { userId: s.user.id },
    include: [{ model: Shop, as: "shop" }],
    order: [["createdAt", "ASC"]],
  });
  return {
    user: { id: s.user.id, name: s.user.name, email: s.user.email },
    shop: { id: s.shop.id, name: s.shop.name },
    role: s.role,
    permissions: permissionsOf(s.role),
    shops: memberships.map((m) => ({ id: m.shopId, name: m.shop!.name, role: m.role })),
  };
}

/**
 * POST /api/me/shop: makes another of my shops the active one and returns the Set-Cookie of the re-issued session
 * token. A shop I do not belong to answers NOT_FOUND.
 */
export async function switchActiveShop(
  s: SessionContext,
  shopId: string,
): Promise<{ setCookie: string; session: SessionContext }> {
  getSequelize();
  const membership = await Membership.findOne({ where: { userId: s.user.id, shopId }, include: [{ model: Shop, as: "shop" }] });
  if (!membership?.shop) throw new AppError("NOT_FOUND", "You are not a member of that shop.");
  const jwt = await encodeSessionToken({
    userId: s.user.id,
    shopId: membership.shopId,
    sessionVersion: s.user.sessionVersion,
    name: s.user.name,
    email: s.user.email,
  });
  return {
    setCookie: sessionSetCookie(jwt),
    session: { ...s, shop: membership.shop, membership, role: membership.role, token: { ...s.token, shopId: membership.shopId } },
  };
}
