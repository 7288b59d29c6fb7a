import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoEmail, e2eBaseUrl } from "./helpers/base-url";
import { headerShopName, headerRole, waitForHeaderShop } from "./helpers/header";
import { E2eBrowser } from "./helpers/browser";

/**
 * Someone who already runs a shop is invited into the demo shop: they accept with their existing password, land in
 * the demo shop with the invited role, and the header offers a shop switcher to go back to their own shop.
 */
describe("several shops: invitation for an existing account and the shop switcher", () => {
  let b: E2eBrowser;
  const stamp = Date.now();
  const email = `e2e-two-shops-${stamp}@peelform.test`;
  const password = "e2e-two-shops-pass-1";
  const ownShop = `E2E Side Shop ${stamp}`;

  beforeAll(async () => {
    b = await E2eBrowser.launch(await e2eBaseUrl());
  });
  afterAll(async () => {
    await b?.close();
  });

  it("an existing account joins a second shop and switches between both", async () => {
    const page = b.page;

    // Their own shop.
    await b.goto("/sign-up");
    await page.getByLabel("Your name").fill("Kit Twoshops");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password", { exact: true }).fill(password);
    await page.getByLabel("Shop name").fill(ownShop);
    await page.getByRole("button", { name: "Create shop and sign in" }).click();
    await page.waitForURL(/\/projects$/, { timeout: 30_000 });
    await page.getByRole("heading", { level: 1, name: "Projects" }).waitFor();
    expect(await page.getByRole("combobox", { name: "Active shop" }).count()).toBe(0);
    await b.signOut();

    // The demo owner invites them as designer.
    await b.signIn(demoEmail("owner"));
    const demoShop = await headerShopName(page);
    await b.goto("/members");
    const form = page.getByRole("form", { name: "Invite a member" });
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Role").selectOption("designer");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${email}.`).waitFor();

    await b.goto("/mailbox");
    await page.getByRole("link").filter({ hasText: `to ${email}` }).first().click();
    const href = await page.locator('a[href*="/invite/"]').first().getAttribute("href");
    expect(href).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    await b.goto("/projects");
    await b.signOut();

    // Accept with the existing password.
    await page.goto(href!);
    await page.getByText("You already have a Peelform account.").waitFor();
    expect(await page.getByLabel("Your name").count()).toBe(0);
    await page.getByLabel("Your password").fill(password);
    await page.getByRole("button", { name: "Join the shop" }).click();
    await page.waitForURL(/\/projects$/, { timeout: 30_000 });
    await page.getByRole("heading", { level: 1, name: "Projects" }).waitFor();
    await waitForHeaderShop(page, demoShop);
    expect(await headerRole(page)).toBe("Designer");
    expect(await page.getByRole("button", { name: "New project" }).count()).toBe(1);

    // Switch back to their own shop.
    const switcher = page.getByRole("combobox", { name: "Active shop" });
    await switcher.waitFor();
    expect(await switcher.locator("option").count()).toBe(2);
    await b.screenshot("two-shops-switcher");
    await switcher.selectOption({ label: ownShop });
    await page.getByText(`Switched to ${ownShop}.`).waitFor();
    await waitForHeaderShop(page, ownShop);
    expect(await headerRole(page)).toBe("Owner");
    await page.getByText("No projects yet.").waitFor();

    // The choice is kept in the session: a reload stays in their own shop.
    await page.reload();
    await waitForHeaderShop(page, ownShop);

    expect(b.unexpectedProblems()).toEqual([]);
  });
});
