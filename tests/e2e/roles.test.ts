import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { can } from "@/lib/permissions/permissions";
import { DEMO_ROLES, demoEmail, e2eBaseUrl } from "./helpers/base-url";
import { headerShopName, headerRole } from "./helpers/header";
import { E2eBrowser } from "./helpers/browser";

const ROLE_LABEL = { owner: "Owner", designer: "Designer", reviewer: "Reviewer", fabricator: "Fabricator" } as const;

/**
 * Each demo role signs in and sees exactly the controls its permissions allow (lib/permissions/permissions.ts is the
 * expectation, so the screens and the table cannot drift apart). A designer creates and edits a project first so
 * every role has one to open; the owner deletes it at the end.
 */
describe("screens per role", () => {
  let b: E2eBrowser;
  let projectPath = "";
  const projectName = `E2E troll mask ${Date.now()}`;

  beforeAll(async () => {
    b = await E2eBrowser.launch(await e2eBaseUrl());
  });
  afterAll(async () => {
    await b?.close();
  });

  it("a designer creates a project and edits its notes and status", async () => {
    await b.reset();
    await b.signIn(demoEmail("designer"));
    const page = b.page;
    await page.getByRole("button", { name: "New project" }).click();
    const form = page.getByRole("form", { name: "New project" });
    // An empty name is refused on the client with the shared schema's message.
    await form.getByRole("button", { name: "Create project" }).click();
    await form.getByText("Project name is required.").waitFor();

    await form.getByLabel("Project name").fill(projectName);
    await form.getByLabel("Client").fill("Harbour Street Theatre");
    await form.getByLabel("Due date").fill("2027-05-01");
    await form.getByRole("button", { name: "Create project" }).click();
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    projectPath = new URL(page.url()).pathname;
    await page.getByRole("heading", { level: 1, name: projectName }).waitFor();
    await page.getByText("01 May 2027").waitFor();

    await page.getByRole("button", { name: "Edit project" }).click();
    const edit = page.getByRole("form", { name: "Edit project" });
    await edit.getByLabel("Notes").fill("EVA 6 mm, contact cement outdoors only.");
    await edit.getByLabel("Status").selectOption("patterning");
    await edit.getByRole("button", { name: "Save changes" }).click();
    await page.getByText("Project saved.").waitFor();
    await page.getByText("EVA 6 mm, contact cement outdoors only.").waitFor();
    expect(await page.getByRole("listitem").filter({ hasText: "Patterning" }).getAttribute("aria-current")).toBe("step");

    await b.screenshot("designer-project");
    expect(b.unexpectedProblems()).toEqual([]);
    await b.signOut();
  });

  for (const role of DEMO_ROLES) {
    it(`${role} sees what a ${role} may do`, async () => {
      expect(projectPath, "the designer scenario must create the project first").not.toBe("");
      await b.reset();
      await b.signIn(demoEmail(role));
      const page = b.page;

      // Header: shop, role, sign-out.
      expect(await headerShopName(page)).not.toBe("");
      expect(await headerRole(page)).toBe(ROLE_LABEL[role]);
      await page.getByRole("button", { name: "Sign out" }).waitFor();

      // Projects list.
      expect(await page.getByRole("button", { name: "New project" }).count()).toBe(can(role, "project:create") ? 1 : 0);
      await page.getByRole("link", { name: projectName }).waitFor();
      expect(await page.getByRole("heading", { name: "Shop safety" }).count()).toBe(1);
      await b.screenshot(`${role}-projects`);

      // Project page.
      await page.getByRole("link", { name: projectName }).click();
      await page.waitForURL((u) => u.pathname === projectPath);
      await page.getByRole("heading", { level: 1, name: projectName }).waitFor();
      await page.getByText("EVA 6 mm, contact cement outdoors only.").waitFor();
      expect(await page.getByRole("button", { name: "Edit project" }).count()).toBe(can(role, "project:update") ? 1 : 0);
      expect(await page.getByRole("button", { name: "Delete project" }).count()).toBe(can(role, "project:delete") ? 1 : 0);

      // Members.
      await page.getByRole("navigation", { name: "Studio" }).getByRole("link", { name: "Members" }).click();
      await page.getByRole("heading", { level: 1, name: "Members" }).waitFor();
      await page.getByRole("row").filter({ hasText: demoEmail("owner") }).waitFor();
      const manage = can(role, "member:manage");
      expect(await page.getByRole("button", { name: "Send invitation" }).count()).toBe(can(role, "invitation:create") ? 1 : 0);
      expect(await page.getByRole("combobox", { name: /^Role of / }).count() > 0).toBe(manage);
      expect(await page.getByRole("button", { name: /^Remove / }).count() > 0).toBe(manage);
      await b.screenshot(`${role}-members`);

      expect(b.unexpectedProblems()).toEqual([]);
      await b.signOut();
    });
  }

  it("the owner deletes the project after confirming", async () => {
    await b.reset();
    await b.signIn(demoEmail("owner"));
    const page = b.page;
    await b.goto(projectPath);
    await page.getByRole("button", { name: "Delete project" }).click();
    await page.getByText(`Delete “${projectName}” for everyone in the shop?`).waitFor();
    await page.getByRole("button", { name: "Yes, delete" }).click();
    await page.waitForURL(/\/projects$/);
    await page.getByText(`Project “${projectName}” deleted.`).waitFor();
    await page.getByRole("heading", { level: 1, name: "Projects" }).waitFor();
    expect(await page.getByRole("link", { name: projectName }).count()).toBe(0);

    // The old address now answers with the not-found screen.
    await b.goto(projectPath);
    await page.getByText("This project is not in your shop.").waitFor();
    expect(b.unexpectedProblems((p) => /status of 404/.test(p.text))).toEqual([]);
  });
});
