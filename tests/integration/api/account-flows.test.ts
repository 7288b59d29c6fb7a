import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as me from "@/app/api/me/route";
import * as meShop from "@/app/api/me/shop/route";
import * as projects from "@/app/api/projects/route";
import * as signup from "@/app/api/account/signup/route";
import * as reset from "@/app/api/account/password-reset/route";
import * as resetConfirm from "@/app/api/account/password-reset/confirm/route";
import * as invite from "@/app/api/invitations/[token]/route";
import * as inviteAccept from "@/app/api/invitations/[token]/accept/route";
import * as invitations from "@/app/api/shop/invitations/route";
import * as members from "@/app/api/shop/members/route";
import * as member from "@/app/api/shop/members/[id]/route";
import { authorizeCredentials, SignInRateLimitedError } from "@/lib/auth/authorize-credentials";
import { hashLinkToken } from "@/lib/auth/link-token";
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { Invitation, Membership, PasswordResetToken, User } from "@/models";
import { call, errorOf } from "./support/call";
import { cleanupFixtures, trackShop, createProjectIn, createShopWithRoles, createUser, ensureSchema, FIXTURE_PASSWORD, sessionCookie, uniqueEmail, type ShopFixture } from "./support/fixtures";
import { latestMailTo, linkToken } from "./support/mailbox";

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

const ip = () => `198.51.100.${Math.floor(Math.random() * 250) + 1}`;

describe("sign-up", () => {
  it("creates the shop and its owner; the e-mail is stored lower-case and is unique", async () => {
    const email = uniqueEmail("SignUp").replace("t-", "T-");
    const res = await call(signup.POST, "POST", "/api/account/signup", { json: { name: "Wren Tallow", email, password: "moth-wings-42", shopName: "Tallow Props" } });
    expect(res.status).toBe(201);
    const body = await res.json();
    trackShop(body.shop.id);
    expect(body.user.email).toBe(email.toLowerCase());
    expect(body.shop.name).toBe("Tallow Props");
    const m = await Membership.findOne({ where: { userId: body.user.id, shopId: body.shop.id } });
    expect(m?.role).toBe("owner");
    const stored = await User.findByPk(body.user.id);
    expect(stored!.passwordHash).toMatch(/^\$2[aby]\$12\$/); // bcrypt, cost 12
    expect(stored!.passwordHash).not.toContain("moth-wings-42");

    const again = await call(signup.POST, "POST", "/api/account/signup", { json: { name: "X", email: email.toUpperCase(), password: "another-pass-1", shopName: "Other" } });
    expect(again.status).toBe(409);
    expect((await errorOf(again)).code).toBe("CONFLICT");

    const user = await authorizeCredentials({ email: email.toUpperCase(), password: "moth-wings-42" }, ip());
    expect(user).toMatchObject({ id: body.user.id, shopId: body.shop.id });
  });
});

describe("sign-in", () => {
  it("wrong password or unknown e-mail → null (CredentialsSignin)", async () => {
    expect(await authorizeCredentials({ email: f.users.owner.email, password: "wrong-password" }, ip())).toBeNull();
    expect(await authorizeCredentials({ email: uniqueEmail("ghost"), password: FIXTURE_PASSWORD }, ip())).toBeNull();
    expect(await authorizeCredentials({ email: "", password: "" }, ip())).toBeNull();
  });

  it("five failures for one e-mail block it for 15 minutes, even with the right password", async () => {
    const user = await createUser("ratelimited");
    const addr = ip();
    for (let i = 0; i < 5; i++) expect(await authorizeCredentials({ email: user.email, password: `bad-${i}` }, addr)).toBeNull();
    const blocked = authorizeCredentials({ email: user.email, password: FIXTURE_PASSWORD }, ip());
    await expect(blocked).rejects.toBeInstanceOf(SignInRateLimitedError);
    await expect(authorizeCredentials({ email: user.email, password: FIXTURE_PASSWORD }, ip())).rejects.toThrow(/Too many sign-in attempts\. Try again in (1[0-5]|[1-9]) minutes?\./);
    // Another account is not affected.
    expect(await authorizeCredentials({ email: f.users.designer.email, password: FIXTURE_PASSWORD }, addr)).not.toBeNull();
  });

  it("successful sign-ins do not count", async () => {
    const user = await createUser("frequent");
    for (let i = 0; i < 6; i++) expect(await authorizeCredentials({ email: user.email, password: FIXTURE_PASSWORD }, ip())).not.toBeNull();
  });
});

describe("invitations", () => {
  it("owner invites a new person: e-mail link → info → accept creates the account and membership", async () => {
    const email = uniqueEmail("newcomer");
    const res = await call(invitations.POST, "POST", "/api/shop/invitations", { cookie: f.cookies.owner, json: { email, role: "reviewer" } });
    expect(res.status).toBe(201);
    const { invitation } = await res.json();
    expect(invitation).toMatchObject({ email, role: "reviewer" });

    const mail = await latestMailTo(email);
    expect(mail?.subject).toContain(f.shop.name);
    const token = linkToken(mail!.text, "invite");
    // Only the hash is stored.
    const row = await Invitation.findByPk(invitation.id);
    expect(row!.tokenHash).toBe(hashLinkToken(token));
    expect(row!.tokenHash).not.toContain(token);

    const listed = await (await call(members.GET, "GET", "/api/shop/members", { cookie: f.cookies.owner })).json();
    expect(listed.invitations.map((i: { id: string }) => i.id)).toContain(invitation.id);
    const listedForDesigner = await (await call(members.GET, "GET", "/api/shop/members", { cookie: f.cookies.designer })).json();
    expect(listedForDesigner.invitations).toEqual([]);

    const info = await call(invite.GET, "GET", "/api/invitations/x", { params: { token } });
    expect(await info.json()).toEqual({ shopName: f.shop.name, email, role: "reviewer", accountExists: false });

    const noName = await call(inviteAccept.POST, "POST", "/x", { params: { token }, json: { password: "new-person-pw" } });
    expect(noName.status).toBe(422);
    expect((await errorOf(noName)).message).toMatch(/^name: /);
    const weak = await call(inviteAccept.POST, "POST", "/x", { params: { token }, json: { name: "Ada Ferrule", password: "short" } });
    expect(weak.status).toBe(422);
    expect((await errorOf(weak)).message).toMatch(/^password: /);

    const ok = await call(inviteAccept.POST, "POST", "/x", { params: { token }, json: { name: "Ada Ferrule", password: "new-person-pw" } });
    expect(ok.status).toBe(200);
    expect(await ok.json()).toMatchObject({ email, role: "reviewer", accountCreated: true, shop: { id: f.shop.id } });
    const signedIn = await authorizeCredentials({ email, password: "new-person-pw" }, ip());
    expect(signedIn?.shopId).toBe(f.shop.id);

    const reused = await call(inviteAccept.POST, "POST", "/x", { params: { token }, json: { name: "Again", password: "new-person-pw" } });
    expect(reused.status).toBe(409);
    expect((await errorOf(reused)).message).toMatch(/already been accepted/);
    expect((await call(invite.GET, "GET", "/x", { params: { token } })).status).toBe(409);
  });

  it("an existing account joins with its own password; a wrong password is refused", async () => {
    const other = await createShopWithRoles();
    const person = other.users.designer;
    await call(invitations.POST, "POST", "/api/shop/invitations", { cookie: f.cookies.owner, json: { email: person.email.toUpperCase(), role: "fabricator" } });
    const token = linkToken((await latestMailTo(person.email))!.text, "invite");
    const info = await (await call(invite.GET, "GET", "/x", { params: { token } })).json();
    expect(info.accountExists).toBe(true);

    const wrong = await call(inviteAccept.POST, "POST", "/x", { params: { token }, json: { password: "not-their-password" } });
    expect(wrong.status).toBe(422);
    const ok = await call(inviteAccept.POST, "POST", "/x", { params: { token }, json: { password: FIXTURE_PASSWORD } });
    expect(ok.status).toBe(200);
    expect((await ok.json()).accountCreated).toBe(false);

    const cookie = await sessionCookie(person, other.shop.id);
    const mine = await (await call(me.GET, "GET", "/api/me", { cookie })).json();
    expect(mine.shops.map((s: { id: string }) => s.id).sort()).toEqual([f.shop.id, other.shop.id].sort());

    // Switching shops re-issues the session cookie; the new cookie lists the new shop's projects.
    const target = await createProjectIn(f.shop.id, "Visible after switch");
    const sw = await call(meShop.POST, "POST", "/api/me/shop", { cookie, json: { shopId: f.shop.id } });
    expect(sw.status).toBe(200);
    expect((await sw.json()).role).toBe("fabricator");
    const setCookie = sw.headers.get("set-cookie")!;
    expect(setCookie).toMatch(/HttpOnly/);
    expect(setCookie).toMatch(/SameSite=Lax/);
    const switched = setCookie.split(";")[0];
    const list = await (await call(projects.GET, "GET", "/api/projects", { cookie: switched })).json();
    expect(list.projects.map((p: { id: string }) => p.id)).toContain(target.id);
  });

  it("expired, replaced and member invitations answer clearly", async () => {
    const email = uniqueEmail("late");
    await call(invitations.POST, "POST", "/api/shop/invitations", { cookie: f.cookies.owner, json: { email, role: "designer" } });
    const first = linkToken((await latestMailTo(email))!.text, "invite");
    await call(invitations.POST, "POST", "/api/shop/invitations", { cookie: f.cookies.owner, json: { email, role: "designer" } });
    const second = linkToken((await latestMailTo(email))!.text, "invite");
    expect(second).not.toBe(first);
    expect((await call(invite.GET, "GET", "/x", { params: { token: first } })).status).toBe(404);

    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashLinkToken(second) } });
    const expired = await call(inviteAccept.POST, "POST", "/x", { params: { token: second }, json: { name: "Late", password: "late-person-pw" } });
    expect(expired.status).toBe(409);
    expect((await errorOf(expired)).message).toMatch(/expired/);

    const already = await call(invitations.POST, "POST", "/api/shop/invitations", { cookie: f.cookies.owner, json: { email: f.users.fabricator.email, role: "designer" } });
    expect(already.status).toBe(409);
  });
});

describe("members", () => {
  it("the last owner can be neither demoted nor removed (409); with a second owner both work", async () => {
    const s = await createShopWithRoles();
    const demote = await call(member.PATCH, "PATCH", "/x", { cookie: s.cookies.owner, params: { id: s.memberships.owner.id }, json: { role: "designer" } });
    expect(demote.status).toBe(409);
    expect((await errorOf(demote)).message).toMatch(/last owner/);
    const remove = await call(member.DELETE, "DELETE", "/x", { cookie: s.cookies.owner, params: { id: s.memberships.owner.id } });
    expect(remove.status).toBe(409);

    const promote = await call(member.PATCH, "PATCH", "/x", { cookie: s.cookies.owner, params: { id: s.memberships.designer.id }, json: { role: "owner" } });
    expect(promote.status).toBe(200);
    expect((await promote.json()).member).toMatchObject({ id: s.memberships.designer.id, role: "owner", email: s.users.designer.email });
    const demoteNow = await call(member.PATCH, "PATCH", "/x", { cookie: s.cookies.owner, params: { id: s.memberships.owner.id }, json: { role: "reviewer" } });
    expect(demoteNow.status).toBe(200);
    // The former owner's next request already runs with the new role.
    const after = await (await call(me.GET, "GET", "/api/me", { cookie: s.cookies.owner })).json();
    expect(after.role).toBe("reviewer");
    expect(after.permissions).not.toContain("member:manage");
  });

  it("a removed member loses access at once", async () => {
    const s = await createShopWithRoles();
    const res = await call(member.DELETE, "DELETE", "/x", { cookie: s.cookies.owner, params: { id: s.memberships.fabricator.id } });
    expect(res.status).toBe(204);
    const gone = await call(projects.GET, "GET", "/api/projects", { cookie: s.cookies.fabricator });
    expect(gone.status).toBe(403);
  });
});

describe("password reset", () => {
  it("request → e-mail link → confirm; old sessions end; the link works once", async () => {
    const user = await createUser("forgetful");
    const oldCookie = await sessionCookie(user, null);
    const res = await call(reset.POST, "POST", "/api/account/password-reset", { json: { email: user.email.toUpperCase() } });
    expect(res.status).toBe(202);
    const mail = await latestMailTo(user.email);
    expect(mail?.subject).toMatch(/Reset your Peelform password/);
    const token = linkToken(mail!.text, "reset-password");
    const row = await PasswordResetToken.findOne({ where: { userId: user.id } });
    expect(row!.tokenHash).toBe(hashLinkToken(token));

    const weak = await call(resetConfirm.POST, "POST", "/x", { json: { token, password: "123" } });
    expect(weak.status).toBe(422);
    const ok = await call(resetConfirm.POST, "POST", "/x", { json: { token, password: "fresh-start-99" } });
    expect(ok.status).toBe(200);

    expect(await authorizeCredentials({ email: user.email, password: "fresh-start-99" }, ip())).not.toBeNull();
    expect(await authorizeCredentials({ email: user.email, password: FIXTURE_PASSWORD }, ip())).toBeNull();
    expect((await call(me.GET, "GET", "/api/me", { cookie: oldCookie })).status).toBe(401);

    const again = await call(resetConfirm.POST, "POST", "/x", { json: { token, password: "fresh-start-100" } });
    expect(again.status).toBe(409);
    expect((await errorOf(again)).message).toMatch(/already been used/);
  });

  it("unknown e-mail → 202 and no e-mail; expired link → 409", async () => {
    const ghost = uniqueEmail("ghost");
    const res = await call(reset.POST, "POST", "/api/account/password-reset", { json: { email: ghost } });
    expect(res.status).toBe(202);
    expect(await latestMailTo(ghost)).toBeNull();

    const user = await createUser("slow");
    await call(reset.POST, "POST", "/api/account/password-reset", { json: { email: user.email } });
    const token = linkToken((await latestMailTo(user.email))!.text, "reset-password");
    getSequelize();
    await PasswordResetToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    const expired = await call(resetConfirm.POST, "POST", "/x", { json: { token, password: "fresh-start-99" } });
    expect(expired.status).toBe(409);
    expect((await errorOf(expired)).message).toMatch(/expired/);
  });

  it("more than three requests an hour for one address → 429 with Retry-After", async () => {
    const email = uniqueEmail("flood");
    for (let i = 0; i < 3; i++) expect((await call(reset.POST, "POST", "/x", { json: { email }, headers: { "x-forwarded-for": ip() } })).status).toBe(202);
    const res = await call(reset.POST, "POST", "/x", { json: { email }, headers: { "x-forwarded-for": ip() } });
    expect(res.status).toBe(429);
    expect((await errorOf(res)).code).toBe("RATE_LIMITED");
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
  });
});
