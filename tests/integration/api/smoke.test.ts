import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as me from "@/app/api/me/route";
import * as projects from "@/app/api/projects/route";
import { closeSequelize } from "@/lib/db/sequelize";
import { call } from "./support/call";
import { createShopWithRoles, ensureSchema, type ShopFixture } from "./support/fixtures";

let f: ShopFixture;
beforeAll(async () => {
  await ensureSchema();
  f = await createShopWithRoles();
});
afterAll(async () => {
  await closeSequelize();
});

describe("smoke", () => {
  it("me and projects", async () => {
    const r = await call(me.GET, "GET", "/api/me", { cookie: f.cookies.owner });
    expect(r.status).toBe(200);
    const body = await r.json();
    expect(body.role).toBe("owner");
    const p = await call(projects.POST, "POST", "/api/projects", { cookie: f.cookies.designer, json: { name: "Moth" } });
    expect(p.status).toBe(201);
    const l = await call(projects.GET, "GET", "/api/projects", { cookie: f.cookies.fabricator });
    expect((await l.json()).projects).toHaveLength(1);
    expect((await call(me.GET, "GET", "/api/me")).status).toBe(401);
  });
});
