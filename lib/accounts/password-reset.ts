import { Op } from "sequelize";
import { appUrl } from "@/lib/auth/auth-config";
import { createLinkToken, hashLinkToken } from "@/lib/auth/link-token";
import { hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors/app-error";
import { sendMail } from "@/lib/mail/send-mail";
import { resetRequestsByEmail, resetRequestsByIp } from "@/lib/rate-limit/limits";
import { getSequelize } from "@/lib/db/sequelize";
import { PasswordResetToken, User } from "@/models";

/** Reset links work for one hour. // Common practice (OWASP Forgot Password guidance: short-lived, single-use). */
export const RESET_TTL_MS = 60 * 60 * 1000;

function resetMail(name: string, link: string) {
  return {
    subject: "Reset your Peelform password",
    text: [
      `Hello ${name},`,
      "",
      "Someone (hopefully you) asked to reset the password of your Peelform account. Open this link to choose a new one:",
      link,
      "",
      "The link works once and expires in one hour. If you did not ask for this, ignore this e-mail: your password stays as it is.",
    ].join("\n"),
  };
}

/**
 * Starts a password reset: if an account has this e-mail, stores a one-hour single-use token (its hash) and e-mails
 * `${APP_URL}/reset-password/${token}`. The caller answers 202 either way, so the form does not reveal accounts.
 * @throws AppError RATE_LIMITED after too many requests for the address or from the IP.
 */
export async function requestPasswordReset(email: string, ip: string): Promise<void> {
  const [byEmail, byIp] = await Promise.all([resetRequestsByEmail.check(email), resetRequestsByIp.check(ip)]);
  if (!byEmail.allowed || !byIp.allowed) {
    const wait = Math.max(byEmail.retryAfterSeconds, byIp.retryAfterSeconds);
    throw new AppError("RATE_LIMITED", `Too many reset requests. Try again in ${Math.ceil(wait / 60)} minutes.`, { retryAfterSeconds: wait });
  }
  await Promise.all([resetRequestsByEmail.record(email), resetRequestsByIp.record(ip)]);

  const sequelize = getSequelize();
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  await sequelize.transaction(async (transaction) => {
    const { token, tokenHash } = createLinkToken();
    await PasswordResetToken.create({ userId: user.id, tokenHash, expiresAt: new Date(Date.now() + RESET_TTL_MS) }, { transaction });
    await sendMail({ to: user.email, ...resetMail(user.name, `${appUrl()}/reset-password/${token}`) });
  });
}

/**
 * Sets a new password from a reset link. Uses the token up, voids the user's other open reset links, and bumps the
 * session version so every existing session of the account ends.
 * @throws AppError NOT_FOUND (unknown link), CONFLICT (used or expired).
 */
export async function confirmPasswordReset(token: string, password: string): Promise<void> {
  const sequelize = getSequelize();
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    const row = await PasswordResetToken.findOne({
      where: { tokenHash: hashLinkToken(token) },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!row) throw new AppError("NOT_FOUND", "This reset link is not valid. Ask for a new one.");
    if (row.usedAt) throw new AppError("CONFLICT", "This reset link has already been used. Ask for a new one.");
    if (row.expiresAt.getTime() <= Date.now()) throw new AppError("CONFLICT", "This reset link has expired. Ask for a new one.");
    const user = await User.findByPk(row.userId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!user) throw new AppError("NOT_FOUND", "This reset link is not valid. Ask for a new one.");
    const now = new Date();
    await user.update({ passwordHash, sessionVersion: user.sessionVersion + 1 }, { transaction });
    await PasswordResetToken.update({ usedAt: now }, { where: { userId: user.id, usedAt: null, id: { [Op.ne]: row.id } }, transaction });
    await row.update({ usedAt: now }, { transaction });
  });
}
