import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

/**
 * Debian's Chromium through playwright-core for e2e tests (playwright's own browser downloads are not reachable
 * here). The flags are the ones that work as root in these containers; WebGL renders through SwiftShader.
 * Each call gets a fresh profile folder, removed again by close().
 */
export const CHROMIUM_PATH = "/usr/bin/chromium";

export const CHROMIUM_FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

export async function launchChromium(opts: { viewport?: { width: number; height: number } } = {}): Promise<BrowserSession> {
  if (!fs.existsSync(CHROMIUM_PATH)) {
    throw new Error(`${CHROMIUM_PATH} is missing: apt-get install -y chromium (npm test does this)`);
  }
  const profileDir = fs.mkdtempSync(path.join(os.tmpdir(), "peelform-chromium-"));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_FLAGS,
    viewport: opts.viewport ?? { width: 1280, height: 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      fs.rmSync(profileDir, { recursive: true, force: true });
    },
  };
}
