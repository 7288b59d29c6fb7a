import { randomBytes } from "node:crypto";
import { Op } from "sequelize";
import { hashPassword } from "@/lib/auth/password";
import { encodeSessionToken } from "@/lib/auth/session-token";
import { sessionCookieName } from "@/lib/auth/auth-config";
import { migrateUp } from "@/lib/db/migrator";
import { getSequelize } from "@/lib/db/sequelize";
import { ROLES, type Role } from "@/lib/permissions/roles";
import { Membership, Project, Shop, User } from "@/models";

/**
 * Test data for the API tests, against the real PostgreSQL in DATABASE_URL (npm test's stack provides it; for a
 * local run export the same variables, see tests/integration/api/README.md). Every fixture uses fresh random names, so
 * tests never depend on or disturb the demo data and can run against a database that already has rows.
 */

export const FIXTURE_PASSWORD = "fixture-password-1";
let fixtureHash: Promise<string> | null = null;

/** bcrypt at cost 12 takes ~250 ms; fixtures share one hash of FIXTURE_PASSWORD. */
export function fixturePasswordHash(): Promise<string> {
  fixtureHash ??= hashPassword(FIXTURE_PASSWORD);
  return fixtureHash;
}

let migrated: Promise<unknown> | null = null;
export function ensureSchema(): Promise<unknown> {
  migrated ??= migrateUp();
  return migrated;
}

/** Test e-mails all look like `t-<10 hex>-<label>@peelform.test`; cleanupFixtures() removes those accounts. */
export function uniqueEmail(label: string): string {
  return `t-${randomBytes(5).toString("hex")}-${label}@peelform.test`;
}

const createdShops = new Set<string>();

/** Registers a shop made by a test (e.g. through sign-up) for cleanupFixtures(). */
export function trackShop(id: string): void {
  createdShops.add(id);
}

/**
 * Deletes what this test file created: its shops (memberships, projects and invitations cascade) and every test
 * account (t-…@peelform.test; reset tokens and memberships cascade). The demo data is left alone.
 */
export async function cleanupFixtures(): Promise<void> {
  getSequelize();
  if (createdShops.size) await Shop.destroy({ where: { id: [...createdShops] } });
  createdShops.clear();
  await User.destroy({ where: { email: { [Op.like]: "t-__________-%@peelform.test" } } });
}

export async function createUser(label: string, name = `Test ${label}`): Promise<User> {
  getSequelize();
  return User.create({ name, email: uniqueEmail(label), passwordHash: await fixturePasswordHash() });
}

export interface ShopFixture {
  shop: Shop;
  users: Record<Role, User>;
  memberships: Record<Role, Membership>;
  cookies: Record<Role, string>;
}

/** A fresh shop with one member per role, and a real signed next-auth session cookie for each. */
export async function createShopWithRoles(name = `Test shop ${randomBytes(3).toString("hex")}`): Promise<ShopFixture> {
  getSequelize();
  const shop = await Shop.create({ name });
  trackShop(shop.id);
  const users = {} as Record<Role, User>;
  const memberships = {} as Record<Role, Membership>;
  const cookies = {} as Record<Role, string>;
  for (const role of ROLES) {
    users[role] = await createUser(role);
    memberships[role] = await Membership.create({ userId: users[role].id, shopId: shop.id, role });
    cookies[role] = await sessionCookie(users[role], shop.id);
  }
  return { shop, users, memberships, cookies };
}

/** `Cookie` header value with a next-auth JWT for the user, exactly as next-auth issues it after sign-in. */
export async function sessionCookie(user: User, shopId: string | null): Promise<string> {
  const jwt = await encodeSessionToken({
    userId: user.id,
    shopId,
    sessionVersion: user.sessionVersion,
    name: user.name,
    email: user.email,
  });
  return `${sessionCookieName()}=${jwt}`;
}

export async function createProjectIn(shopId: string, name = `Project ${randomBytes(3).toString("hex")}`): Promise<Project> {
  getSequelize();
  return Project.create({ shopId, name, client: "Test client", dueDate: "2027-04-01", notes: "n", status: "planning" });
}

/** A fresh fabricator membership in the shop (a target for member PATCH/DELETE). */
export async function createExtraMember(shopId: string, role: Role = "fabricator"): Promise<Membership> {
  const user = await createUser(`extra-${role}`);
  return Membership.create({ userId: user.id, shopId, role });
}
