import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as meShop from "@/app/api/me/shop/route";
import * as projects from "@/app/api/projects/route";
import * as project from "@/app/api/projects/[id]/route";
import * as members from "@/app/api/shop/members/route";
import * as member from "@/app/api/shop/members/[id]/route";
import * as invitation from "@/app/api/shop/invitations/[id]/route";
import { createLinkToken } from "@/lib/auth/link-token";
import { seedDemo } from "@/lib/db/seed-demo";
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { DEMO_SHOP, OUTSIDER_SHOP } from "@/seeders/demo-scenario";
import { Invitation, Membership, Project, Shop, User } from "@/models";
import { call, errorOf } from "./support/call";
import { cleanupFixtures, createShopWithRoles, ensureSchema, sessionCookie, uniqueEmail, type ShopFixture } from "./support/fixtures";

/**
 * The outsider (owner of another shop, so every permission) must not reach anything of the demo shop: 404. The
 * demo rows are only read (and the failed attempts must leave them unchanged).
 */
let outsiderCookie: string;
let ownerCookie: string;
let demoShop: Shop;
let outsiderShop: Shop;
let demoProjectIds: string[];
let demoMembershipIds: string[];
let victim: ShopFixture;
let victimInvitationId: string;

beforeAll(async () => {
  await ensureSchema();
  await seedDemo();
  getSequelize();
  const outsider = (await User.findOne({ where: { email: "outsider@peelform.test" } }))!;
  const owner = (await User.findOne({ where: { email: "owner@peelform.test" } }))!;
  demoShop = (await Membership.findOne({ where: { userId: owner.id, role: "owner" }, include: [{ model: Shop, as: "shop", where: { name: DEMO_SHOP.name } }] }))!.shop!;
  outsiderShop = (await Membership.findOne({ where: { userId: outsider.id }, include: [{ model: Shop, as: "shop", where: { name: OUTSIDER_SHOP.name } }] }))!.shop!;
  outsiderCookie = await sessionCookie(outsider, outsiderShop.id);
  ownerCookie = await sessionCookie(owner, demoShop.id);
  demoProjectIds = (await Project.findAll({ where: { shopId: demoShop.id } })).map((p) => p.id);
  demoMembershipIds = (await Membership.findAll({ where: { shopId: demoShop.id } })).map((m) => m.id);
  // The demo shop stays read-only here (the e2e run uses it at the same time): the pending invitation to attack
  // lives in a fresh shop.
  victim = await createShopWithRoles();
  victimInvitationId = (await Invitation.create({
    shopId: victim.shop.id, invitedById: victim.users.owner.id, email: uniqueEmail("iso"), role: "designer",
    tokenHash: createLinkToken().tokenHash, expiresAt: new Date(Date.now() + 3_600_000),
  })).id;
});
afterAll(async () => {
  await cleanupFixtures();
  await closeRateLimitStore();
  await closeSequelize();
});

describe("shop isolation", () => {
  it("the demo shop has projects and members to attack", () => {
    expect(demoProjectIds.length).toBeGreaterThanOrEqual(DEMO_SHOP.projects.length);
    expect(demoMembershipIds.length).toBeGreaterThanOrEqual(4);
  });

  it("the outsider's project list holds only their shop's projects", async () => {
    const res = await call(projects.GET, "GET", "/api/projects", { cookie: outsiderCookie });
    const body = (await res.json()) as { projects: { id: string }[] };
    expect(body.projects.length).toBeGreaterThan(0);
    for (const p of body.projects) expect(demoProjectIds).not.toContain(p.id);
  });

  it("demo project ids answer 404 to the outsider (read, update, delete) and stay unchanged", async () => {
    for (const id of demoProjectIds) {
      for (const [h, method, json] of [[project.GET, "GET", undefined], [project.PATCH, "PATCH", { name: "pwned" }], [project.DELETE, "DELETE", undefined]] as const) {
        const res = await call(h, method, `/api/projects/${id}`, { cookie: outsiderCookie, params: { id }, json });
        expect(res.status, `${method} ${id}`).toBe(404);
        expect((await errorOf(res)).code).toBe("NOT_FOUND");
      }
    }
    expect(await Project.count({ where: { shopId: demoShop.id, name: "pwned" } })).toBe(0);
    expect(await Project.count({ where: { id: demoProjectIds } })).toBe(demoProjectIds.length);
  });

  it("demo memberships answer 404 to the outsider (role change, removal)", async () => {
    for (const id of demoMembershipIds) {
      expect((await call(member.PATCH, "PATCH", "/api/shop/members/x", { cookie: outsiderCookie, params: { id }, json: { role: "fabricator" } })).status).toBe(404);
      expect((await call(member.DELETE, "DELETE", "/api/shop/members/x", { cookie: outsiderCookie, params: { id } })).status).toBe(404);
    }
    expect(await Membership.count({ where: { id: demoMembershipIds } })).toBe(demoMembershipIds.length);
  });

  it("another shop's pending invitation cannot be withdrawn by the outsider", async () => {
    const res = await call(invitation.DELETE, "DELETE", "/api/shop/invitations/x", { cookie: outsiderCookie, params: { id: victimInvitationId } });
    expect(res.status).toBe(404);
    expect(await Invitation.count({ where: { id: victimInvitationId } })).toBe(1);
    const listed = await (await call(members.GET, "GET", "/api/shop/members", { cookie: outsiderCookie })).json();
    expect(listed.invitations.map((i: { id: string }) => i.id)).not.toContain(victimInvitationId);
  });

  it("the outsider cannot switch into the demo shop", async () => {
    const res = await call(meShop.POST, "POST", "/api/me/shop", { cookie: outsiderCookie, json: { shopId: demoShop.id } });
    expect(res.status).toBe(404);
    expect(res.headers.get("set-cookie")).toBeNull();
  });

  it("a session cookie naming a foreign shop falls back to the user's own shop", async () => {
    const outsider = (await User.findOne({ where: { email: "outsider@peelform.test" } }))!;
    const forged = await sessionCookie(outsider, demoShop.id);
    const res = await call(members.GET, "GET", "/api/shop/members", { cookie: forged });
    const body = (await res.json()) as { members: { userId: string }[] };
    expect(body.members.map((m) => m.userId)).toEqual([outsider.id]);
  });

  it("the demo owner does not see the outsider's projects either", async () => {
    const res = await call(projects.GET, "GET", "/api/projects", { cookie: ownerCookie });
    const ids = ((await res.json()) as { projects: { id: string }[] }).projects.map((p) => p.id);
    const outsiderIds = (await Project.findAll({ where: { shopId: outsiderShop.id } })).map((p) => p.id);
    for (const id of outsiderIds) expect(ids).not.toContain(id);
  });
});
