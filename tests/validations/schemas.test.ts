import { describe, expect, it } from "vitest";
import { passwordResetConfirmSchema, signInSchema, signUpSchema } from "@/lib/validations/account";
import { invitationAcceptSchema, invitationCreateSchema, memberUpdateSchema } from "@/lib/validations/members";
import { projectCreateSchema, projectUpdateSchema } from "@/lib/validations/projects";
import { switchShopSchema } from "@/lib/validations/me";
import { formatIssues } from "@/lib/validations/format-issues";
import type { z } from "zod";

function message(schema: z.ZodType, value: unknown): string {
  const r = schema.safeParse(value);
  if (r.success) throw new Error(`expected a failure for ${JSON.stringify(value)}`);
  return formatIssues(r.error);
}

describe("account schemas", () => {
  it("sign-up trims, lower-cases the e-mail and checks each field", () => {
    const ok = signUpSchema.parse({ name: "  Wren  ", email: " Wren@Example.COM ", password: "long-enough", shopName: " Tallow " });
    expect(ok).toEqual({ name: "Wren", email: "wren@example.com", password: "long-enough", shopName: "Tallow" });
    expect(message(signUpSchema, { name: "", email: "a@b.co", password: "long-enough", shopName: "S" })).toBe("name: Name is required.");
    expect(message(signUpSchema, { name: "W", email: "a@b", password: "long-enough", shopName: "S" })).toMatch(/^email: Enter a valid e-mail/);
    expect(message(signUpSchema, { name: "W", email: "a@b.co", password: "short", shopName: "S" })).toBe("password: Password must be at least 8 characters.");
    expect(message(signUpSchema, { name: "W", email: "a@b.co", password: "long-enough" })).toBe("shopName: Shop name is required.");
    expect(message(signUpSchema, { name: "W", email: "a@b.co", password: "long-enough", shopName: "S", admin: true })).toMatch(/^admin: unknown field/);
  });

  it("refuses passwords bcrypt would silently cut (over 72 bytes)", () => {
    expect(signUpSchema.safeParse({ name: "W", email: "a@b.co", password: "a".repeat(72), shopName: "S" }).success).toBe(true);
    expect(message(signUpSchema, { name: "W", email: "a@b.co", password: "a".repeat(73), shopName: "S" })).toMatch(/^password: .*72 bytes/);
    // 25 three-byte characters = 75 bytes.
    expect(message(signUpSchema, { name: "W", email: "a@b.co", password: "€".repeat(25), shopName: "S" })).toMatch(/^password: /);
  });

  it("sign-in needs both fields; reset tokens must look like our links", () => {
    expect(message(signInSchema, { email: "a@b.co" })).toBe("password: Password is required.");
    expect(message(passwordResetConfirmSchema, { token: "abc", password: "long-enough" })).toMatch(/^token: This link is not valid/);
    expect(passwordResetConfirmSchema.safeParse({ token: "A".repeat(43), password: "long-enough" }).success).toBe(true);
  });
});

describe("project schemas", () => {
  it("accepts the contract's fields and normalises empty text to null", () => {
    expect(projectCreateSchema.parse({ name: " Moth ", client: "", dueDate: "", notes: "  " })).toEqual({ name: "Moth", client: null, dueDate: null, notes: null });
    expect(projectCreateSchema.parse({ name: "Moth", dueDate: "2028-02-29", status: "in_review" })).toMatchObject({ dueDate: "2028-02-29", status: "in_review" });
  });

  it("refuses impossible dates, unknown statuses and missing names", () => {
    expect(message(projectCreateSchema, { name: "Moth", dueDate: "2027-02-29" })).toBe("dueDate: Due date must be a date written YYYY-MM-DD.");
    expect(message(projectCreateSchema, { name: "Moth", dueDate: "29/02/2028" })).toMatch(/^dueDate: /);
    expect(message(projectCreateSchema, { name: "Moth", status: "done" })).toMatch(/^status: Status must be one of: planning, patterning/);
    expect(message(projectCreateSchema, {})).toBe("name: Project name is required.");
    expect(message(projectCreateSchema, { name: "x".repeat(161) })).toBe("name: Project name must be at most 160 characters.");
  });

  it("PATCH takes any subset but not nothing, and cannot blank the name", () => {
    expect(projectUpdateSchema.parse({ status: "building" })).toEqual({ status: "building" });
    expect(projectUpdateSchema.parse({ client: null })).toEqual({ client: null });
    expect(message(projectUpdateSchema, {})).toBe("body: Send at least one field to change.");
    expect(message(projectUpdateSchema, { name: "  " })).toBe("name: Project name is required.");
  });
});

describe("member schemas", () => {
  it("roles come from the role list", () => {
    expect(invitationCreateSchema.parse({ email: "A@B.co", role: "fabricator" })).toEqual({ email: "a@b.co", role: "fabricator" });
    expect(message(invitationCreateSchema, { email: "a@b.co", role: "admin" })).toBe("role: Role must be one of: owner, designer, reviewer, fabricator.");
    expect(message(memberUpdateSchema, {})).toMatch(/^role: /);
  });

  it("accepting an invitation needs a password; the name is optional here", () => {
    expect(invitationAcceptSchema.parse({ password: "x" })).toEqual({ password: "x" });
    expect(message(invitationAcceptSchema, { name: "Ada" })).toBe("password: Password is required.");
  });

  it("shop switch takes a uuid", () => {
    expect(message(switchShopSchema, { shopId: "42" })).toBe("shopId: Shop must be a valid id.");
  });
});
