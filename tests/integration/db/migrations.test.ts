import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Sequelize, QueryTypes } from "sequelize";
import { migrateDown, migrateUp, migrationStatus } from "@/lib/db/migrator";
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";

/**
 * Migrations up and down on a fresh, throw-away database created next to DATABASE_URL's (the shared test database
 * is never migrated down: other tests and the e2e run use it).
 */
const dbName = `peelform_mig_${randomBytes(4).toString("hex")}`;
let fresh: Sequelize;

function urlFor(database: string): string {
  const u = new URL(process.env.DATABASE_URL!);
  u.pathname = `/${database}`;
  return u.toString();
}

async function tables(): Promise<string[]> {
  const rows = await fresh.query<{ name: string }>(
    "SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename",
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
}

beforeAll(async () => {
  await getSequelize().query(`CREATE DATABASE ${dbName}`);
  fresh = new Sequelize(urlFor(dbName), { dialect: "postgres", logging: false });
});
afterAll(async () => {
  await fresh?.close();
  await getSequelize().query(`DROP DATABASE IF EXISTS ${dbName} WITH (FORCE)`);
  await closeSequelize();
});

describe("migrations on a fresh database", () => {
  it("up creates every table and records each migration in SequelizeMeta", async () => {
    const applied = await migrateUp({ sequelize: fresh });
    expect(applied.length).toBeGreaterThanOrEqual(2);
    expect(await tables()).toEqual(
      expect.arrayContaining(["SequelizeMeta", "invitations", "memberships", "password_reset_tokens", "projects", "shops", "users"]),
    );
    const meta = await fresh.query<{ name: string }>('SELECT name FROM "SequelizeMeta" ORDER BY name', { type: QueryTypes.SELECT });
    expect(meta.map((m) => m.name)).toEqual(applied);
    expect((await migrationStatus({ sequelize: fresh })).pending).toEqual([]);
    expect(await migrateUp({ sequelize: fresh })).toEqual([]);
  });

  it("the schema enforces roles, statuses, lower-case unique e-mails and one membership per user and shop", async () => {
    const q = (sql: string) => fresh.query(sql);
    /** The PostgreSQL message of a failed statement (Sequelize wraps it as `parent`). */
    const pgError = (sql: string) =>
      q(sql).then(
        () => "no error",
        (e: { parent?: { message?: string; constraint?: string }; message: string }) => `${e.parent?.constraint ?? ""} ${e.parent?.message ?? e.message}`,
      );
    await q("INSERT INTO users (id, name, email, password_hash) VALUES ('11111111-1111-4111-8111-111111111111', 'A', 'a@peelform.test', 'h')");
    await q("INSERT INTO shops (id, name) VALUES ('22222222-2222-4222-8222-222222222222', 'S')");
    expect(await pgError("INSERT INTO users (name, email, password_hash) VALUES ('B', 'a@peelform.test', 'h')")).toMatch(/unique|duplicate/i);
    expect(await pgError("INSERT INTO users (name, email, password_hash) VALUES ('B', 'Upper@peelform.test', 'h')")).toMatch(/users_email_lower/);
    expect(await pgError("INSERT INTO memberships (user_id, shop_id, role) VALUES ('11111111-1111-4111-8111-111111111111', '22222222-2222-4222-8222-222222222222', 'boss')")).toMatch(/memberships_role_check/);
    await q("INSERT INTO memberships (user_id, shop_id, role) VALUES ('11111111-1111-4111-8111-111111111111', '22222222-2222-4222-8222-222222222222', 'owner')");
    expect(await pgError("INSERT INTO memberships (user_id, shop_id, role) VALUES ('11111111-1111-4111-8111-111111111111', '22222222-2222-4222-8222-222222222222', 'designer')")).toMatch(/unique|duplicate/i);
    expect(await pgError("INSERT INTO projects (shop_id, name, status) VALUES ('22222222-2222-4222-8222-222222222222', 'P', 'done')")).toMatch(/projects_status_check/);
    const [rows] = await q("INSERT INTO projects (shop_id, name, due_date) VALUES ('22222222-2222-4222-8222-222222222222', 'P', '2027-02-28') RETURNING id, status, due_date::text AS due");
    expect(rows).toEqual([expect.objectContaining({ status: "planning", due: "2027-02-28" })]);
    // Deleting the shop removes its memberships and projects.
    await q("DELETE FROM shops WHERE id = '22222222-2222-4222-8222-222222222222'");
    const [left] = await q("SELECT (SELECT count(*) FROM memberships)::int AS m, (SELECT count(*) FROM projects)::int AS p");
    expect(left).toEqual([{ m: 0, p: 0 }]);
  });

  it("down one step, then all the way, leaves only SequelizeMeta; up again works", async () => {
    const { executed } = await migrationStatus({ sequelize: fresh });
    const last = await migrateDown({ sequelize: fresh });
    expect(last).toEqual([executed[executed.length - 1]]);
    const rest = await migrateDown({ sequelize: fresh, to: 0 });
    expect(rest).toEqual(executed.slice(0, -1).reverse());
    expect(await tables()).toEqual(["SequelizeMeta"]);
    expect((await migrationStatus({ sequelize: fresh })).executed).toEqual([]);
    expect(await migrateUp({ sequelize: fresh })).toEqual(executed);
  });
});
