import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { e2eBaseUrl } from "./helpers/base-url";
import { headerShopName, headerRole } from "./helpers/header";
import { E2eBrowser, type PageProblem } from "./helpers/browser";

/** The failed credentials call answers 401; Chromium logs every failed request, so that one line is expected. */
const isSignInRefusal = (p: PageProblem) => p.kind === "console" && /status of 401/.test(p.text) && /\/api\/auth\/callback\/credentials/.test(p.url);

describe("accounts: landing, sign-up, sign-out, wrong password", () => {
  let b: E2eBrowser;
  const stamp = Date.now();
  const email = `e2e-founder-${stamp}@peelform.test`;
  const password = "e2e-founder-pass-1";
  const shopName = `E2E Foam Works ${stamp}`;
  const newPassword = "e2e-founder-pass-2";

  beforeAll(async () => {
    b = await E2eBrowser.launch(await e2eBaseUrl());
  });
  afterAll(async () => {
    await b?.close();
  });

  it("the landing page introduces the product to signed-out visitors", async () => {
    await b.goto("/");
    const page = b.page;
    await page.getByRole("heading", { level: 1 }).waitFor();
    await page.getByRole("main").getByRole("link", { name: "Sign in" }).waitFor();
    await page.getByRole("main").getByRole("link", { name: "Create a shop" }).waitFor();
    // Studio screens need a session.
    await b.goto("/projects");
    await page.waitForURL(/\/sign-in/);
    expect(b.unexpectedProblems()).toEqual([]);
  });

  it("someone new creates a shop and is its owner", async () => {
    await b.reset();
    await b.goto("/sign-up");
    const page = b.page;
    await page.getByLabel("Your name").fill("Sam Founder");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password", { exact: true }).fill(password);
    await page.getByLabel("Shop name").fill(shopName);
    await page.getByRole("button", { name: "Create shop and sign in" }).click();
    await page.waitForURL(/\/projects$/, { timeout: 30_000 });
    expect(await headerShopName(page)).toBe(shopName);
    expect(await headerRole(page)).toBe("Owner");
    await page.getByText("No projects yet.").waitFor();
    // Signed in, the landing page sends you to your projects.
    await b.goto("/");
    await page.waitForURL(/\/projects$/);
    expect(b.unexpectedProblems()).toEqual([]);
  });

  it("sign-out ends the session", async () => {
    await b.signOut();
    await b.goto("/projects");
    await b.page.waitForURL(/\/sign-in/);
    expect(b.unexpectedProblems()).toEqual([]);
  });

  it("a wrong password shows a clear error and keeps you on the sign-in page", async () => {
    await b.reset();
    await b.goto("/sign-in");
    const page = b.page;
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password", { exact: true }).fill("not-the-password");
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    const alert = page.getByRole("alert").filter({ hasText: "Wrong e-mail or password. Check both and try again." });
    await alert.waitFor();
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await b.screenshot("wrong-password");

    // The right password still works afterwards.
    await page.getByLabel("Password", { exact: true }).fill(password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL(/\/projects$/, { timeout: 30_000 });
    expect(await headerShopName(page)).toBe(shopName);
    expect(b.unexpectedProblems(isSignInRefusal)).toEqual([]);
  });

  it("a signed-out visit to a studio page returns there after signing in", async () => {
    await b.reset();
    const page = b.page;
    await b.goto("/members");
    await page.waitForURL(/\/sign-in\?callbackUrl=/);
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password", { exact: true }).fill(password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL(/\/members$/, { timeout: 30_000 });
    await page.getByRole("heading", { level: 1, name: "Members" }).waitFor();
    expect(b.unexpectedProblems()).toEqual([]);
  });

  it("a forgotten password is replaced through the e-mailed link, and sign-in works by keyboard alone", async () => {
    await b.reset();
    const page = b.page;
    await b.goto("/sign-in");
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL(/\/forgot-password$/);
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByText(`If an account exists for ${email}, a link to choose a new password is on its way.`, { exact: false }).waitFor();

    await b.goto("/mailbox");
    await page.getByRole("link").filter({ hasText: `to ${email}` }).first().click();
    const href = await page.locator('a[href*="/reset-password/"]').first().getAttribute("href");
    expect(href).toMatch(/\/reset-password\/[A-Za-z0-9_-]{43}$/);
    await page.goto(href!);
    await page.getByLabel("New password", { exact: true }).fill("short");
    await page.getByRole("button", { name: "Save new password" }).click();
    await page.getByText("Password must be at least 8 characters.").waitFor();
    await page.getByLabel("New password", { exact: true }).fill(newPassword);
    await page.getByRole("button", { name: "Save new password" }).click();
    await page.waitForURL(/\/sign-in\?notice=reset$/);
    await page.getByText("Your password was changed. Sign in with the new one.").waitFor();

    // Keyboard only: type, Tab to the password, Enter submits; the focused field shows a visible outline.
    await page.getByLabel("E-mail").focus();
    await page.keyboard.type(email);
    await page.keyboard.press("Tab");
    expect(await page.evaluate(() => document.activeElement?.id)).toBe("sign-in-password");
    const outline = await page.evaluate(() => getComputedStyle(document.activeElement as Element).outlineStyle);
    expect(outline).not.toBe("none");
    await page.keyboard.type(newPassword);
    await page.keyboard.press("Enter");
    await page.waitForURL(/\/projects$/, { timeout: 30_000 });
    expect(await headerShopName(page)).toBe(shopName);
    expect(b.unexpectedProblems()).toEqual([]);
  });
});
