import bcrypt from "bcryptjs";

/** bcrypt cost factor 12 (~250 ms per hash on these machines): slow enough to hurt guessing, fast enough to sign in. */
export const BCRYPT_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

let dummyHash: Promise<string> | null = null;

/**
 * Compares against a hash of no known password when the e-mail is unknown, so a wrong e-mail costs the same time
 * as a wrong password (no account discovery by timing).
 */
export async function burnPasswordCheck(password: string): Promise<false> {
  dummyHash ??= bcrypt.hash("peelform-no-such-account", BCRYPT_COST);
  await bcrypt.compare(password, await dummyHash);
  return false;
}
