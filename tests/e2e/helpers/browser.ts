import type { ConsoleMessage, Page } from "playwright-core";
import { launchChromium, type BrowserSession } from "../../support/chromium";
import { DEMO_PASSWORD } from "./base-url";

/** One console error or uncaught page error, with where it came from. */
export interface PageProblem {
  kind: "console" | "pageerror";
  text: string;
  url: string;
}

/**
 * A Chromium session that records every console error and uncaught exception of its page, so a test can assert
 * that a flow logged none. `allow` drops expected entries (e.g. the 401 of a deliberately wrong password).
 */
export class E2eBrowser {
  readonly problems: PageProblem[] = [];

  private constructor(
    private readonly session: BrowserSession,
    readonly base: string,
  ) {
    const page = session.page;
    // The machine is shared and small: allow slow first responses (a cold server, a busy CPU).
    page.setDefaultNavigationTimeout(60_000);
    page.on("console", (msg: ConsoleMessage) => {
      if (msg.type() === "error") this.problems.push({ kind: "console", text: msg.text(), url: msg.location().url });
    });
    page.on("pageerror", (err: Error) => this.problems.push({ kind: "pageerror", text: err.message, url: page.url() }));
  }

  static async launch(base: string, viewport = { width: 1280, height: 800 }): Promise<E2eBrowser> {
    return new E2eBrowser(await launchChromium({ viewport }), base);
  }

  get page(): Page {
    return this.session.page;
  }

  async goto(path: string): Promise<void> {
    await this.page.goto(`${this.base}${path}`, { waitUntil: "load" });
  }

  /** Signs in through the form and waits for the projects screen. */
  async signIn(email: string, password = DEMO_PASSWORD): Promise<void> {
    await this.goto("/sign-in");
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password", { exact: true }).fill(password);
    await this.page.getByRole("button", { name: "Sign in", exact: true }).click();
    await this.page.waitForURL(/\/projects$/, { timeout: 30_000 });
    await this.page.getByRole("heading", { level: 1, name: "Projects" }).waitFor();
  }

  /** Signs out with the header button and waits for the sign-in screen. */
  async signOut(): Promise<void> {
    await this.page.getByRole("button", { name: "Sign out" }).click();
    await this.page.waitForURL(/\/sign-in/, { timeout: 30_000 });
  }

  /** Forget the session (cookies) between scenarios that reuse the browser. */
  async reset(): Promise<void> {
    await this.session.context.clearCookies();
    this.problems.length = 0;
  }

  /** Problems not matched by `allow`. */
  unexpectedProblems(allow: (p: PageProblem) => boolean = () => false): PageProblem[] {
    return this.problems.filter((p) => !allow(p));
  }

  async screenshot(name: string): Promise<void> {
    const dir = process.env.E2E_SCREENSHOT_DIR;
    if (dir) await this.page.screenshot({ path: `${dir}/${name}.png`, fullPage: true });
  }

  async close(): Promise<void> {
    await this.session.close();
  }
}
