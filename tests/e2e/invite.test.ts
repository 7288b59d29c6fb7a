import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoEmail, e2eBaseUrl } from "./helpers/base-url";
import { headerShopName, headerRole } from "./helpers/header";
import { E2eBrowser } from "./helpers/browser";

/**
 * The owner invites a new address as reviewer; the e-mail arrives in the dev mailbox (the SMTP fake's .eml files
 * shown by /mailbox); its link opens the invitation, the invitee creates an account and lands in the owner's shop
 * with the invited role.
 */
describe("invite a new member by e-mail", () => {
  let b: E2eBrowser;

  beforeAll(async () => {
    b = await E2eBrowser.launch(await e2eBaseUrl());
  });
  afterAll(async () => {
    await b?.close();
  });

  it("the invitee follows the mailed link, signs up and joins with the invited role", async () => {
    const invitee = `e2e-invitee-${Date.now()}@peelform.test`;
    const page = b.page;

    await b.signIn(demoEmail("owner"));
    const shopName = await headerShopName(page);
    expect(shopName).not.toBe("");

    await b.goto("/members");
    const form = page.getByRole("form", { name: "Invite a member" });
    // The shared schema refuses a malformed address before anything is sent.
    await form.getByLabel("E-mail").fill("not-an-address");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await form.getByText("Enter a valid e-mail address, like name@example.com.").waitFor();

    await form.getByLabel("E-mail").fill(invitee);
    await form.getByLabel("Role").selectOption("reviewer");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${invitee}.`).waitFor();
    await page.locator(`[data-invitation-email="${invitee}"]`).getByText("Reviewer").waitFor();
    await b.screenshot("owner-invited");

    // The message in the dev mailbox.
    await b.goto("/mailbox");
    await page.getByRole("heading", { level: 1, name: "Dev mailbox" }).waitFor();
    const entry = page.getByRole("link").filter({ hasText: `to ${invitee}` });
    await entry.first().waitFor({ timeout: 15_000 });
    await entry.first().click();
    await page.waitForURL(/\/mailbox\/[A-Za-z0-9_-]+$/);
    await page.getByText(shopName).first().waitFor();
    const link = page.locator('a[href*="/invite/"]').first();
    const href = await link.getAttribute("href");
    expect(href).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    await b.screenshot("mailbox-invite");

    // Sign out the owner, then follow the link as the invitee.
    await b.goto("/projects");
    await b.signOut();
    await page.goto(href!);
    await page.getByRole("heading", { level: 1, name: "You are invited" }).waitFor();
    expect((await page.getByTestId("invite-shop").textContent())?.trim()).toBe(shopName);
    expect((await page.getByTestId("invite-role").textContent())?.trim()).toBe("Reviewer");
    await page.getByLabel("Your name").fill("Rowan Invitee");
    await page.getByLabel("Choose a password").fill("short");
    await page.getByRole("button", { name: "Create account and join" }).click();
    await page.getByText("Password must be at least 8 characters.").waitFor();
    await page.getByLabel("Choose a password").fill("e2e-invitee-pass-1");
    await page.getByRole("button", { name: "Create account and join" }).click();

    await page.waitForURL(/\/projects$/, { timeout: 30_000 });
    await page.getByRole("heading", { level: 1, name: "Projects" }).waitFor();
    expect(await headerShopName(page)).toBe(shopName);
    expect(await headerRole(page)).toBe("Reviewer");
    expect(await page.getByRole("button", { name: "New project" }).count()).toBe(0);
    await b.screenshot("invitee-projects");

    // The members list now has the new reviewer; the link is used up.
    await b.goto("/members");
    await page.getByRole("row").filter({ hasText: invitee }).waitFor();
    await b.signOut();
    await page.goto(href!);
    await page.getByText(/This invitation cannot be used/).waitFor();

    // The owner changes the newcomer's role, then removes them.
    await b.signIn(demoEmail("owner"));
    await b.goto("/members");
    const row = page.getByRole("row").filter({ hasText: invitee });
    await row.getByRole("combobox", { name: "Role of Rowan Invitee" }).selectOption("fabricator");
    await page.getByText("Rowan Invitee is now fabricator.").waitFor();
    await page.reload();
    expect(await page.getByRole("row").filter({ hasText: invitee }).getByRole("combobox").inputValue()).toBe("fabricator");
    await page.getByRole("row").filter({ hasText: invitee }).getByRole("button", { name: "Remove Rowan Invitee" }).click();
    await page.getByRole("row").filter({ hasText: invitee }).getByRole("button", { name: "Confirm removal" }).click();
    await page.getByText("Rowan Invitee was removed from the shop.").waitFor();
    await page.getByRole("row").filter({ hasText: invitee }).waitFor({ state: "detached" });

    expect(b.unexpectedProblems()).toEqual([]);
  });

  it("the last owner cannot demote themselves, and the screen says why", async () => {
    await b.reset();
    await b.signIn(demoEmail("owner"));
    const page = b.page;
    await b.goto("/members");
    const ownRow = page.getByRole("row").filter({ hasText: demoEmail("owner") });
    await ownRow.getByRole("combobox").selectOption("designer");
    await page.getByRole("alert").filter({ hasText: "The last owner cannot be" }).waitFor();
    await page.reload();
    expect(await page.getByRole("row").filter({ hasText: demoEmail("owner") }).getByRole("combobox").inputValue()).toBe("owner");
    // The refused PATCH answers 409, which Chromium logs as a failed request.
    expect(b.unexpectedProblems((p) => /status of 409/.test(p.text))).toEqual([]);
  });
});
