import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as projects from "@/app/api/projects/route";
import * as project from "@/app/api/projects/[id]/route";
import { closeSequelize } from "@/lib/db/sequelize";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { call } from "./support/call";
import { cleanupFixtures, createShopWithRoles, ensureSchema, type ShopFixture } from "./support/fixtures";

/** Project CRUD through the API: the contract's shape, partial updates, ordering, deletion. */
let f: ShopFixture;
beforeAll(async () => {
  await ensureSchema();
  f = await createShopWithRoles();
});
afterAll(async () => {
  await cleanupFixtures();
  await closeRateLimitStore();
  await closeSequelize();
});

const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

describe("projects", () => {
  it("create → read → partial update → delete, with the contract's shape", async () => {
    const created = await call(projects.POST, "POST", "/api/projects", {
      cookie: f.cookies.designer,
      json: { name: "Paper crane puppet", client: "Lakeside Children's Theatre", dueDate: "2027-02-28", notes: "Wingspan 3 m" },
    });
    expect(created.status).toBe(201);
    const { project: p } = await created.json();
    expect(p).toEqual({
      id: expect.stringMatching(/^[0-9a-f-]{36}$/),
      name: "Paper crane puppet",
      client: "Lakeside Children's Theatre",
      dueDate: "2027-02-28",
      notes: "Wingspan 3 m",
      status: "planning",
      createdAt: expect.stringMatching(ISO),
      updatedAt: expect.stringMatching(ISO),
    });

    const read = await (await call(project.GET, "GET", "/x", { cookie: f.cookies.fabricator, params: { id: p.id } })).json();
    expect(read.project).toEqual(p);

    const patched = await (await call(project.PATCH, "PATCH", "/x", { cookie: f.cookies.designer, params: { id: p.id }, json: { status: "in_review", client: null } })).json();
    expect(patched.project).toMatchObject({ name: "Paper crane puppet", client: null, dueDate: "2027-02-28", notes: "Wingspan 3 m", status: "in_review" });
    expect(Date.parse(patched.project.updatedAt)).toBeGreaterThanOrEqual(Date.parse(p.updatedAt));

    expect((await call(project.DELETE, "DELETE", "/x", { cookie: f.cookies.owner, params: { id: p.id } })).status).toBe(204);
    expect((await call(project.GET, "GET", "/x", { cookie: f.cookies.owner, params: { id: p.id } })).status).toBe(404);
  });

  it("lists soonest due first, undated last", async () => {
    const s = await createShopWithRoles();
    for (const [name, dueDate] of [["later", "2027-09-01"], ["undated", null], ["sooner", "2027-01-15"]] as const) {
      await call(projects.POST, "POST", "/api/projects", { cookie: s.cookies.owner, json: { name, dueDate } });
    }
    const list = await (await call(projects.GET, "GET", "/api/projects", { cookie: s.cookies.reviewer })).json();
    expect(list.projects.map((p: { name: string }) => p.name)).toEqual(["sooner", "later", "undated"]);
  });
});
