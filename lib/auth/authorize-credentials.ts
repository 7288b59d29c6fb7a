import { signInSchema } from "@/lib/validations/account";
import { burnPasswordCheck, verifyPassword } from "@/lib/auth/password";
import { signInFailuresByEmail, signInFailuresByIp } from "@/lib/rate-limit/limits";
import { getSequelize } from "@/lib/db/sequelize";
import { Membership, User } from "@/models";

/** The message an over-limit sign-in answers with (next-auth hands it to the form as `error`). */
export function tooManySignInsMessage(retryAfterSeconds: number): string {
  const minutes = Math.max(1, Math.ceil(retryAfterSeconds / 60));
  return `Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`;
}

export class SignInRateLimitedError extends Error {
  constructor(readonly retryAfterSeconds: number) {
    super(tooManySignInsMessage(retryAfterSeconds));
    this.name = "SignInRateLimitedError";
  }
}

export interface AuthorizedUser {
  id: string;
  name: string;
  email: string;
  /** The shop the session starts in: the user's oldest membership, null if they belong to none. */
  shopId: string | null;
  sessionVersion: number;
}

/**
 * Checks e-mail and password for the credentials provider. Returns the user, or null for wrong credentials
 * (next-auth reports "CredentialsSignin"). Throws SignInRateLimitedError when the e-mail or the IP has too many
 * recent failures; only failures are counted.
 */
export async function authorizeCredentials(credentials: unknown, ip: string): Promise<AuthorizedUser | null> {
  const parsed = signInSchema.safeParse({
    email: (credentials as Record<string, unknown> | undefined)?.email,
    password: (credentials as Record<string, unknown> | undefined)?.password,
  });
  if (!parsed.success) return null;
  const { email, password } = parsed.data;

  const [byEmail, byIp] = await Promise.all([signInFailuresByEmail.check(email), signInFailuresByIp.check(ip)]);
  if (!byEmail.allowed || !byIp.allowed) {
    throw new SignInRateLimitedError(Math.max(byEmail.retryAfterSeconds, byIp.retryAfterSeconds));
  }

  getSequelize();
  const user = await User.findOne({ where: { email } });
  const ok = user ? await verifyPassword(password, user.passwordHash) : await burnPasswordCheck(password);
  if (!user || !ok) {
    await Promise.all([signInFailuresByEmail.record(email), signInFailuresByIp.record(ip)]);
    return null;
  }
  const membership = await Membership.findOne({ where: { userId: user.id }, order: [["createdAt", "ASC"]] });
  return { id: user.id, name: user.name, email: user.email, shopId: membership?.shopId ?? null, sessionVersion: user.sessionVersion };
}
