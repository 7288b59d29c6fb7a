import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { verifyPassword } from "@/lib/auth/password";
import { migrateUp } from "@/lib/db/migrator";
import { seedDemo } from "@/lib/db/seed-demo";
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { DEMO_PASSWORD, DEMO_SHOP, DEMO_USERS, OUTSIDER_SHOP } from "@/seeders/demo-scenario";
import { Membership, Project, Shop, User } from "@/models";

/** A full dump of the demo rows (every column, updated_at included) to compare before and after a second run. */
async function snapshot(): Promise<unknown> {
  const s = getSequelize();
  const emails = DEMO_USERS.map((u) => u.email);
  const q = (sql: string) => s.query(sql, { type: QueryTypes.SELECT, replacements: { emails } });
  return {
    users: await q("SELECT * FROM users WHERE email IN (:emails) ORDER BY email"),
    memberships: await q("SELECT m.* FROM memberships m JOIN users u ON u.id = m.user_id WHERE u.email IN (:emails) ORDER BY m.id"),
    shops: await q("SELECT DISTINCT s.* FROM shops s JOIN memberships m ON m.shop_id = s.id JOIN users u ON u.id = m.user_id WHERE u.email IN (:emails) ORDER BY s.id"),
    projects: await q("SELECT p.* FROM projects p WHERE p.shop_id IN (SELECT m.shop_id FROM memberships m JOIN users u ON u.id = m.user_id WHERE u.email IN (:emails)) ORDER BY p.id"),
  };
}

beforeAll(async () => {
  await migrateUp();
});
afterAll(async () => {
  await closeSequelize();
});

describe("seedDemo", () => {
  it("creates the scenario, and a second run changes nothing", async () => {
    await seedDemo();
    const before = await snapshot();
    const second = await seedDemo();
    expect(second).toEqual({ usersCreated: 0, shopsCreated: 0, membershipsCreated: 0, projectsCreated: 0 });
    expect(await snapshot()).toEqual(before);
  });

  it("two seedings at once still create one demo shop", async () => {
    await Promise.all([seedDemo(), seedDemo()]);
    expect(await Shop.count({ where: { name: DEMO_SHOP.name } })).toBe(1);
  });

  it("has one user per role in the demo shop, the outsider's shop, and the demo password", async () => {
    const owner = (await User.findOne({ where: { email: "owner@peelform.test" } }))!;
    expect(await verifyPassword(DEMO_PASSWORD, owner.passwordHash)).toBe(true);
    const demo = (await Shop.findOne({ where: { name: DEMO_SHOP.name } }))!;
    const roles = await Membership.findAll({ where: { shopId: demo.id }, include: [{ model: User, as: "user" }] });
    expect(Object.fromEntries(roles.map((m) => [m.user!.email, m.role]))).toEqual({
      "owner@peelform.test": "owner",
      "designer@peelform.test": "designer",
      "reviewer@peelform.test": "reviewer",
      "fabricator@peelform.test": "fabricator",
    });
    expect(await Project.count({ where: { shopId: demo.id } })).toBe(DEMO_SHOP.projects.length);
    const outsider = (await User.findOne({ where: { email: "outsider@peelform.test" } }))!;
    const theirs = await Membership.findAll({ where: { userId: outsider.id }, include: [{ model: Shop, as: "shop" }] });
    expect(theirs.map((m) => [m.shop!.name, m.role])).toEqual([[OUTSIDER_SHOP.name, "owner"]]);
  });
});
