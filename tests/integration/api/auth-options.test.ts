import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { JWT } from "next-auth/jwt";
import type { Session, User as AuthUser } from "next-auth";
import { authOptions } from "@/lib/auth/auth-options";
import { readSessionToken } from "@/lib/auth/session-token";
import { sessionCookieName } from "@/lib/auth/auth-config";
import { closeSequelize } from "@/lib/db/sequelize";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { cleanupFixtures, createShopWithRoles, ensureSchema, sessionCookie, type ShopFixture } from "./support/fixtures";

/** next-auth configuration: JWT claims after sign-in, shop switch through update(), cookie settings. */
let a: ShopFixture;
let b: ShopFixture;
beforeAll(async () => {
  await ensureSchema();
  a = await createShopWithRoles();
  b = await createShopWithRoles();
});
afterAll(async () => {
  await cleanupFixtures();
  await closeRateLimitStore();
  await closeSequelize();
});

type JwtCb = NonNullable<NonNullable<typeof authOptions.callbacks>["jwt"]>;
type SessionCb = NonNullable<NonNullable<typeof authOptions.callbacks>["session"]>;
const jwt = (args: Partial<Parameters<JwtCb>[0]>) => authOptions.callbacks!.jwt!({ token: {}, account: null, ...args } as Parameters<JwtCb>[0]);

describe("auth options", () => {
  it("uses JWT sessions, the credentials provider with email and password, and our sign-in page", () => {
    expect(authOptions.session?.strategy).toBe("jwt");
    expect(authOptions.pages?.signIn).toBe("/sign-in");
    const provider = authOptions.providers[0] as unknown as { id: string; options: { credentials: Record<string, unknown> } };
    expect(provider.id).toBe("credentials");
    expect(Object.keys(provider.options.credentials)).toEqual(["email", "password"]);
    expect(authOptions.useSecureCookies).toBe((process.env.APP_URL ?? "").startsWith("https://"));
  });

  it("the JWT carries user id, active shop and session version; the session exposes id and shop", async () => {
    const u = a.users.designer;
    const user = { id: u.id, name: u.name, email: u.email, shopId: a.shop.id, sessionVersion: 0 } as AuthUser;
    const token = (await jwt({ token: { name: u.name, email: u.email }, user })) as JWT;
    expect(token).toMatchObject({ userId: u.id, shopId: a.shop.id, sv: 0 });
    const session = (await authOptions.callbacks!.session!({ session: { expires: "" } as Session, token } as Parameters<SessionCb>[0])) as Session;
    expect(session.user).toEqual({ id: u.id, name: u.name, email: u.email });
    expect(session.shopId).toBe(a.shop.id);
  });

  it("update({ shopId }) switches only into shops the user belongs to", async () => {
    const u = a.users.owner;
    const start: JWT = { userId: u.id, shopId: a.shop.id, sv: 0 };
    expect(((await jwt({ token: { ...start }, trigger: "update", session: { shopId: b.shop.id } })) as JWT).shopId).toBe(a.shop.id);
    expect(((await jwt({ token: { ...start }, trigger: "update", session: { shopId: "nonsense" } })) as JWT).shopId).toBe(a.shop.id);
  });

  it("the session cookie made for tests decodes with the app's secret under next-auth's cookie name", async () => {
    const cookie = await sessionCookie(a.users.reviewer, a.shop.id);
    expect(cookie.startsWith(`${sessionCookieName()}=`)).toBe(true);
    const token = await readSessionToken(new Request("http://x/", { headers: { cookie: `other=1; ${cookie}` } }));
    expect(token).toMatchObject({ userId: a.users.reviewer.id, shopId: a.shop.id });
    // An Authorization header is not a session.
    const jwtValue = cookie.split("=")[1];
    expect(await readSessionToken(new Request("http://x/", { headers: { authorization: `Bearer ${jwtValue}` } }))).toBeNull();
  });
});
