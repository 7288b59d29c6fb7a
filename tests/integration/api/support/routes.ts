import { randomBytes } from "node:crypto";
import * as me from "@/app/api/me/route";
import * as meShop from "@/app/api/me/shop/route";
import * as projects from "@/app/api/projects/route";
import * as project from "@/app/api/projects/[id]/route";
import * as members from "@/app/api/shop/members/route";
import * as member from "@/app/api/shop/members/[id]/route";
import * as invitations from "@/app/api/shop/invitations/route";
import * as invitation from "@/app/api/shop/invitations/[id]/route";
import * as signup from "@/app/api/account/signup/route";
import * as reset from "@/app/api/account/password-reset/route";
import * as resetConfirm from "@/app/api/account/password-reset/confirm/route";
import * as invite from "@/app/api/invitations/[token]/route";
import * as inviteAccept from "@/app/api/invitations/[token]/accept/route";
import type { RouteHandler } from "@/lib/api/route-handler";
import { createLinkToken } from "@/lib/auth/link-token";
import { Invitation } from "@/models";
import { createExtraMember, createProjectIn, uniqueEmail, type ShopFixture } from "./fixtures";

/**
 * Every API route of the platform layer, with what a successful call needs. The permission a route requires is
 * NOT restated here: tests read it from the handler (`routeOptions.action`, set by route()), and the expected
 * status of each role from can() over lib/permissions/permissions.ts.
 */
export interface RouteCase {
  name: string;
  method: string;
  path: string;
  handler: RouteHandler;
  /** Status of a permitted call. */
  success: number;
  /** Builds params and body for one permitted call (fresh targets for destructive routes). */
  prepare: (f: ShopFixture) => Promise<{ params?: Record<string, string>; json?: unknown }>;
  /** A body with one wrong field and the field the 422 message must name (routes with a body). */
  invalid?: { json: unknown; field: string };
  /** Params of the right shape that match nothing. */
  missingParams?: Record<string, string>;
}

const NO_UUID = "00000000-0000-4000-8000-000000000000";
const NO_TOKEN = "A".repeat(43);

export const SESSION_ROUTES: RouteCase[] = [
  { name: "GET /api/me", method: "GET", path: "/api/me", handler: me.GET, success: 200, prepare: async () => ({}) },
  {
    name: "POST /api/me/shop", method: "POST", path: "/api/me/shop", handler: meShop.POST, success: 200,
    prepare: async (f) => ({ json: { shopId: f.shop.id } }),
    invalid: { json: { shopId: "not-a-uuid" }, field: "shopId" },
  },
  { name: "GET /api/projects", method: "GET", path: "/api/projects", handler: projects.GET, success: 200, prepare: async () => ({}) },
  {
    name: "POST /api/projects", method: "POST", path: "/api/projects", handler: projects.POST, success: 201,
    prepare: async () => ({ json: { name: "Lantern fox head", client: "Matrix", dueDate: "2027-02-01", status: "planning" } }),
    invalid: { json: { name: "Fox", dueDate: "2027-02-30" }, field: "dueDate" },
  },
  {
    name: "GET /api/projects/[id]", method: "GET", path: "/api/projects/x", handler: project.GET, success: 200,
    prepare: async (f) => ({ params: { id: (await createProjectIn(f.shop.id)).id } }),
    missingParams: { id: NO_UUID },
  },
  {
    name: "PATCH /api/projects/[id]", method: "PATCH", path: "/api/projects/x", handler: project.PATCH, success: 200,
    prepare: async (f) => ({ params: { id: (await createProjectIn(f.shop.id)).id }, json: { status: "patterning" } }),
    invalid: { json: { status: "finished" }, field: "status" },
    missingParams: { id: NO_UUID },
  },
  {
    name: "DELETE /api/projects/[id]", method: "DELETE", path: "/api/projects/x", handler: project.DELETE, success: 204,
    prepare: async (f) => ({ params: { id: (await createProjectIn(f.shop.id)).id } }),
    missingParams: { id: NO_UUID },
  },
  { name: "GET /api/shop/members", method: "GET", path: "/api/shop/members", handler: members.GET, success: 200, prepare: async () => ({}) },
  {
    name: "POST /api/shop/invitations", method: "POST", path: "/api/shop/invitations", handler: invitations.POST, success: 201,
    prepare: async () => ({ json: { email: uniqueEmail("invitee"), role: "designer" } }),
    invalid: { json: { email: uniqueEmail("invitee"), role: "boss" }, field: "role" },
  },
  {
    name: "DELETE /api/shop/invitations/[id]", method: "DELETE", path: "/api/shop/invitations/x", handler: invitation.DELETE, success: 204,
    prepare: async (f) => {
      const inv = await Invitation.create({
        shopId: f.shop.id, invitedById: f.users.owner.id, email: uniqueEmail("pending"), role: "reviewer",
        tokenHash: createLinkToken().tokenHash, expiresAt: new Date(Date.now() + 86_400_000),
      });
      return { params: { id: inv.id } };
    },
    missingParams: { id: NO_UUID },
  },
  {
    name: "PATCH /api/shop/members/[id]", method: "PATCH", path: "/api/shop/members/x", handler: member.PATCH, success: 200,
    prepare: async (f) => ({ params: { id: (await createExtraMember(f.shop.id)).id }, json: { role: "reviewer" } }),
    invalid: { json: { role: "" }, field: "role" },
    missingParams: { id: NO_UUID },
  },
  {
    name: "DELETE /api/shop/members/[id]", method: "DELETE", path: "/api/shop/members/x", handler: member.DELETE, success: 204,
    prepare: async (f) => ({ params: { id: (await createExtraMember(f.shop.id)).id } }),
    missingParams: { id: NO_UUID },
  },
];

/** Routes anyone may call (signed out included); their flows are tested in account-flows.test.ts. */
export const PUBLIC_ROUTES: RouteCase[] = [
  {
    name: "POST /api/account/signup", method: "POST", path: "/api/account/signup", handler: signup.POST, success: 201,
    prepare: async () => ({ json: { name: "New Owner", email: uniqueEmail("signup"), password: "long-enough-1", shopName: `Shop ${randomBytes(2).toString("hex")}` } }),
    invalid: { json: { name: "New Owner", email: "not-an-email", password: "long-enough-1", shopName: "S" }, field: "email" },
  },
  {
    name: "POST /api/account/password-reset", method: "POST", path: "/api/account/password-reset", handler: reset.POST, success: 202,
    prepare: async () => ({ json: { email: uniqueEmail("nobody") } }),
    invalid: { json: { email: 42 }, field: "email" },
  },
  {
    name: "POST /api/account/password-reset/confirm", method: "POST", path: "/api/account/password-reset/confirm", handler: resetConfirm.POST, success: 404,
    prepare: async () => ({ json: { token: NO_TOKEN, password: "long-enough-1" } }),
    invalid: { json: { token: NO_TOKEN, password: "short" }, field: "password" },
  },
  {
    name: "GET /api/invitations/[token]", method: "GET", path: "/api/invitations/x", handler: invite.GET, success: 404,
    prepare: async () => ({ params: { token: NO_TOKEN } }),
    missingParams: { token: "too-short" },
  },
  {
    name: "POST /api/invitations/[token]/accept", method: "POST", path: "/api/invitations/x/accept", handler: inviteAccept.POST, success: 404,
    prepare: async () => ({ params: { token: NO_TOKEN }, json: { name: "X", password: "long-enough-1" } }),
    invalid: { json: { name: "X" }, field: "password" },
    missingParams: { token: "too-short" },
  },
];
