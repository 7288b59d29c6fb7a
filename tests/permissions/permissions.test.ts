import { describe, expect, it } from "vitest";
import { ACTIONS, can, PERMISSIONS, permissionsOf, type Action } from "@/lib/permissions/permissions";
import { ROLES } from "@/lib/permissions/roles";

/**
 * The permission table against the role descriptions of the API contract: owner everything incl. members; designer
 * create/edit projects, scans, seams, run flattening; reviewer read all, review decisions, comments; fabricator read
 * projects and approved patterns, download, comment.
 */
describe("permission table", () => {
  it("names only known actions, without duplicates", () => {
    for (const role of ROLES) {
      for (const a of PERMISSIONS[role]) expect(ACTIONS).toContain(a);
      expect(new Set(PERMISSIONS[role]).size).toBe(PERMISSIONS[role].length);
    }
  });

  it("owner may do everything", () => {
    for (const a of ACTIONS) expect(can("owner", a)).toBe(true);
  });

  it("only the owner manages members, invites and deletes projects", () => {
    for (const a of ["member:manage", "invitation:create", "project:delete"] as Action[]) {
      expect(ROLES.filter((r) => can(r, a))).toEqual(["owner"]);
    }
  });

  it("designer edits projects, scans and seams and runs flattening, but does not decide reviews", () => {
    for (const a of ["project:create", "project:update", "scan:upload", "seams:edit", "flatten:run"] as Action[]) expect(can("designer", a)).toBe(true);
    expect(can("designer", "review:decide")).toBe(false);
  });

  it("reviewer reads everything, decides reviews and comments, but changes no project data", () => {
    for (const a of ["project:read", "pattern:read", "pattern:read-approved", "review:decide", "comment:create"] as Action[]) expect(can("reviewer", a)).toBe(true);
    for (const a of ["project:create", "project:update", "scan:upload", "seams:edit", "flatten:run"] as Action[]) expect(can("reviewer", a)).toBe(false);
  });

  it("fabricator reads projects and approved patterns only, downloads and comments", () => {
    expect(permissionsOf("fabricator").sort()).toEqual(["comment:create", "member:read", "pattern:download", "pattern:read-approved", "project:read"]);
    expect(can("fabricator", "pattern:read")).toBe(false);
  });

  it("every member can read projects and the member list; every action is granted to someone", () => {
    for (const r of ROLES) {
      expect(can(r, "project:read")).toBe(true);
      expect(can(r, "member:read")).toBe(true);
    }
    for (const a of ACTIONS) expect(ROLES.some((r) => can(r, a))).toBe(true);
  });

  it("no role, or an unknown one, may do nothing", () => {
    for (const a of ACTIONS) {
      expect(can(null, a)).toBe(false);
      expect(can(undefined, a)).toBe(false);
      expect(can("janitor" as never, a)).toBe(false);
    }
  });

  it("permissionsOf keeps table order", () => {
    for (const r of ROLES) expect(permissionsOf(r)).toEqual(ACTIONS.filter((a) => PERMISSIONS[r].includes(a)));
  });
});
