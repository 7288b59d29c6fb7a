import type { Transaction } from "sequelize";
import { hashPassword } from "@/lib/auth/password";
import { getSequelize } from "@/lib/db/sequelize";
import { DEMO_PASSWORD, DEMO_SHOP, DEMO_USERS, OUTSIDER_SHOP, type DemoShop } from "@/seeders/demo-scenario";
import { Membership, Project, Shop, User } from "@/models";

export interface SeedSummary {
  usersCreated: number;
  shopsCreated: number;
  membershipsCreated: number;
  projectsCreated: number;
}

/**
 * Loads the demo scenario (seeders/demo-scenario.ts). Idempotent: rows are found by their natural keys (user e-mail;
 * shop name together with its first owner; project name within the shop) and only missing ones are created, so a
 * second run changes nothing (no updates, no re-hashing). Rows edited since are left alone.
 */
export async function seedDemo(): Promise<SeedSummary> {
  const sequelize = getSequelize();
  const summary: SeedSummary = { usersCreated: 0, shopsCreated: 0, membershipsCreated: 0, projectsCreated: 0 };
  await sequelize.transaction(async (transaction) => {
    // One seeding at a time across processes (two `npm start` at once must not create two demo shops).
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext('peelform:seed-demo'))", { transaction });
    const users = new Map<string, User>();
    for (const u of DEMO_USERS) {
      let user = await User.findOne({ where: { email: u.email }, transaction });
      if (!user) {
        user = await User.create({ email: u.email, name: u.name, passwordHash: await hashPassword(DEMO_PASSWORD) }, { transaction });
        summary.usersCreated++;
      }
      users.set(u.email, user);
    }
    for (const shop of [DEMO_SHOP, OUTSIDER_SHOP]) await seedShop(shop, users, summary, transaction);
  });
  return summary;
}

async function seedShop(def: DemoShop, users: Map<string, User>, summary: SeedSummary, transaction: Transaction) {
  const owner = users.get(def.members.find((m) => m.role === "owner")!.email)!;
  const candidates = await Shop.findAll({ where: { name: def.name }, order: [["createdAt", "ASC"]], transaction });
  let shop: Shop | undefined;
  for (const c of candidates) {
    if (await Membership.count({ where: { shopId: c.id, userId: owner.id, role: "owner" }, transaction })) {
      shop = c;
      break;
    }
  }
  if (!shop) {
    shop = await Shop.create({ name: def.name }, { transaction });
    summary.shopsCreated++;
  }
  for (const m of def.members) {
    const user = users.get(m.email)!;
    const exists = await Membership.count({ where: { shopId: shop.id, userId: user.id }, transaction });
    if (!exists) {
      await Membership.create({ shopId: shop.id, userId: user.id, role: m.role }, { transaction });
      summary.membershipsCreated++;
    }
  }
  for (const p of def.projects) {
    const exists = await Project.count({ where: { shopId: shop.id, name: p.name }, transaction });
    if (!exists) {
      await Project.create({ shopId: shop.id, createdById: owner.id, ...p }, { transaction });
      summary.projectsCreated++;
    }
  }
}
