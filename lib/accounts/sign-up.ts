import { hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors/app-error";
import type { SignUpInput } from "@/lib/validations/account";
import { getSequelize } from "@/lib/db/sequelize";
import { Membership, Shop, User } from "@/models";

/**
 * Creates a new shop and its first user as owner, in one transaction.
 * @throws AppError CONFLICT when the e-mail already has an account.
 */
export async function signUp(
  input: SignUpInput,
): Promise<{ user: { id: string; name: string; email: string }; shop: { id: string; name: string } }> {
  const sequelize = getSequelize();
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    if ((await User.count({ where: { email: input.email }, transaction })) > 0) {
      throw new AppError("CONFLICT", "An account with this e-mail already exists. Sign in instead, or reset your password.");
    }
    const user = await User.create({ name: input.name, email: input.email, passwordHash }, { transaction });
    const shop = await Shop.create({ name: input.shopName }, { transaction });
    await Membership.create({ userId: user.id, shopId: shop.id, role: "owner" }, { transaction });
    return { user: { id: user.id, name: user.name, email: user.email }, shop: { id: shop.id, name: shop.name } };
  });
}
