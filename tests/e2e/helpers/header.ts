import type { Page } from "playwright-core";

/** The active shop's name as the studio header shows it (plain text, or the selected entry of the shop switcher). */
export async function headerShopName(page: Page): Promise<string> {
  const identity = page.getByTestId("shop-identity");
  await identity.waitFor();
  return (await identity.getAttribute("data-shop-name")) ?? "";
}

/** Waits until the header shows `name` as the active shop. */
export async function waitForHeaderShop(page: Page, name: string): Promise<void> {
  await page.locator(`[data-testid="shop-identity"][data-shop-name="${name.replace(/"/g, '\\"')}"]`).waitFor();
}

/** The role label in the header ("Owner", "Designer", …). */
export async function headerRole(page: Page): Promise<string> {
  return ((await page.getByTestId("user-role").textContent()) ?? "").trim();
}
