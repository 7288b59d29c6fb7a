import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors/app-error";
import type { Role } from "@/lib/permissions/roles";
import { signInFailuresByEmail, signInFailuresByIp } from "@/lib/rate-limit/limits";
import { tooManySignInsMessage } from "@/lib/auth/authorize-credentials";
import { findUsableInvitation } from "@/lib/shops/invitations";
import { newPasswordField } from "@/lib/validations/fields";
import { formatIssues } from "@/lib/validations/format-issues";
import type { InvitationAcceptInput } from "@/lib/validations/members";
import { getSequelize } from "@/lib/db/sequelize";
import { Membership, User } from "@/models";

export interface InvitationInfoDto {
  shopName: string;
  email: string;
  role: Role;
  accountExists: boolean;
}

/** GET /api/invitations/[token]: what the invitation page shows before accepting. */
export async function describeInvitation(token: string): Promise<InvitationInfoDto> {
  const inv = await findUsableInvitation(token);
  const accountExists = (await User.count({ where: { email: inv.email } })) > 0;
  return { shopName: inv.shop.name, email: inv.email, role: inv.role, accountExists };
}

/**
 * Accepts an invitation. Without an account for the invited address it creates one (`name` required, `password`
 * must meet the new-password rules); with an account, `password` must be that account's password (wrong guesses
 * count against the same limits as sign-in). Either way the membership is added and the invitation is used up.
 * @throws AppError NOT_FOUND / CONFLICT (see findUsableInvitation), VALIDATION, RATE_LIMITED.
 */
export async function acceptInvitation(
  token: string,
  input: InvitationAcceptInput,
  ip: string,
): Promise<{ shop: { id: string; name: string }; email: string; role: Role; accountCreated: boolean }> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const inv = await findUsableInvitation(token, transaction);
    let user = await User.findOne({ where: { email: inv.email }, transaction });
    const accountCreated = !user;

    if (user) {
      const [byEmail, byIp] = await Promise.all([signInFailuresByEmail.check(inv.email), signInFailuresByIp.check(ip)]);
      if (!byEmail.allowed || !byIp.allowed) {
        const wait = Math.max(byEmail.retryAfterSeconds, byIp.retryAfterSeconds);
        throw new AppError("RATE_LIMITED", tooManySignInsMessage(wait), { retryAfterSeconds: wait });
      }
      if (!(await verifyPassword(input.password, user.passwordHash))) {
        await Promise.all([signInFailuresByEmail.record(inv.email), signInFailuresByIp.record(ip)]);
        throw new AppError("VALIDATION", `password: This is not the password of the existing account ${inv.email}.`);
      }
    } else {
      if (!input.name) throw new AppError("VALIDATION", "name: Name is required to create your account.");
      const pw = newPasswordField.safeParse(input.password);
      if (!pw.success) throw new AppError("VALIDATION", formatIssues(pw.error, "password"));
      user = await User.create({ name: input.name, email: inv.email, passwordHash: await hashPassword(pw.data) }, { transaction });
    }

    const already = await Membership.findOne({ where: { userId: user.id, shopId: inv.shopId }, transaction });
    if (!already) await Membership.create({ userId: user.id, shopId: inv.shopId, role: inv.role }, { transaction });
    await inv.update({ acceptedAt: new Date() }, { transaction });
    return { shop: { id: inv.shop.id, name: inv.shop.name }, email: inv.email, role: already?.role ?? inv.role, accountCreated };
  });
}
