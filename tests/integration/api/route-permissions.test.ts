import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { ACTIONS, can } from "@/lib/permissions/permissions";
import { ROLES, type Role } from "@/lib/permissions/roles";
import { call, errorOf } from "./support/call";
import { cleanupFixtures, createShopWithRoles, ensureSchema, type ShopFixture } from "./support/fixtures";
import { PUBLIC_ROUTES, SESSION_ROUTES } from "./support/routes";

/**
 * Every session route × every role and signed out. The expected status comes from the permission table: a role
 * with the route's action (read from the handler) gets the success status, others 403, signed-out callers 401.
 */
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

describe("route × role matrix", () => {
  it("covers only actions that exist in the permission table", () => {
    for (const r of SESSION_ROUTES) {
      expect(r.handler.routeOptions.auth, r.name).toBe("required");
      if (r.handler.routeOptions.action) expect(ACTIONS, r.name).toContain(r.handler.routeOptions.action);
    }
    for (const r of PUBLIC_ROUTES) expect(r.handler.routeOptions.auth, r.name).toBe("none");
  });

  for (const r of SESSION_ROUTES) {
    for (const role of [...ROLES, null] as (Role | null)[]) {
      const action = r.handler.routeOptions.action;
      const expected = role === null ? 401 : !action || can(role, action) ? r.success : 403;
      it(`${r.name} as ${role ?? "signed out"} → ${expected}`, async () => {
        const { params, json } = await r.prepare(f);
        const res = await call(r.handler, r.method, r.path, { cookie: role ? f.cookies[role] : undefined, params, json });
        expect(res.status).toBe(expected);
        if (expected >= 400) {
          const err = await errorOf(res);
          expect(err.code).toBe(expected === 401 ? "UNAUTHENTICATED" : "FORBIDDEN");
          expect(err.message.length).toBeGreaterThan(5);
        }
      });
    }
  }

  it("GET /api/me lists exactly the permissions can() grants", async () => {
    for (const role of ROLES) {
      const res = await call(SESSION_ROUTES[0].handler, "GET", "/api/me", { cookie: f.cookies[role] });
      const body = await res.json();
      expect(body.role).toBe(role);
      expect(body.shop).toEqual({ id: f.shop.id, name: f.shop.name });
      expect(body.permissions).toEqual(ACTIONS.filter((a) => can(role, a)));
      expect(body.shops).toEqual([{ id: f.shop.id, name: f.shop.name, role }]);
    }
  });

  it("a tampered or foreign-secret cookie is signed out", async () => {
    const cookie = f.cookies.owner.slice(0, -4) + "AAAA";
    const res = await call(SESSION_ROUTES[0].handler, "GET", "/api/me", { cookie });
    expect(res.status).toBe(401);
  });
});
