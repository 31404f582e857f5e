// One browser per test file: launched before the file's tests, closed after, with sign-in as a
// demo role and a screenshot folder. Use it at the top of a browser test file:
//   const ui = browserPerFile();   (not a React hook: a plain name so the hooks rule leaves it alone)
//   test("…", async () => { const page = await ui.signIn("inspector", PHONE); … await ui.shot(page, "name"); });
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Browser, BrowserContextOptions, Locator, Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import { DEMO_PASSWORD } from "../../scripts/seed/demo-people";
import { demoUser, type DemoRole } from "./api";
import { DESK, launch } from "./browser";
import { APP_URL } from "./env";
import { SignInPage } from "./pages/sign-in-page";

/** Where screenshots go for review (`TEST_SHOTS_DIR` to move them). */
export const SHOTS = process.env.TEST_SHOTS_DIR ?? "/tmp/shots";

export type Viewport = { width: number; height: number };

export type BrowserFixture = {
  readonly browser: Browser;
  /** A fresh context at `viewport`, signed in as the demo person of `role`. */
  signIn(role: DemoRole, viewport?: Viewport, options?: BrowserContextOptions): Promise<Page>;
  /** A fresh context, signed in as nobody. */
  open(viewport?: Viewport, options?: BrowserContextOptions): Promise<Page>;
  /** Saves a screenshot as SHOTS/<name>.png (whole page unless told). */
  shot(page: Page, name: string, options?: { fullPage?: boolean }): Promise<string>;
  /** Saves a screenshot of one part of a page as SHOTS/<name>.png. */
  shotOf(part: Locator, name: string): Promise<string>;
};

export function browserPerFile(): BrowserFixture {
  let browser: Browser | undefined;
  beforeAll(async () => {
    mkdirSync(SHOTS, { recursive: true });
    browser = await launch();
  }, 120_000);
  afterAll(async () => {
    await browser?.close();
  });

  const open = async (viewport: Viewport = DESK, options: BrowserContextOptions = {}) => {
    const ctx = await fixture.browser.newContext({ viewport, baseURL: APP_URL, ...options });
    return ctx.newPage();
  };
  const fixture: BrowserFixture = {
    get browser() {
      if (!browser)
        throw new Error("The browser is not running yet: call browserPerFile() at the top of the file and use it inside tests.");
      return browser;
    },
    open,
    async signIn(role, viewport = DESK, options = {}) {
      const page = await open(viewport, options);
      const signIn = await new SignInPage(page).goto();
      await signIn.signIn(demoUser(role).email, DEMO_PASSWORD);
      return page;
    },
    async shot(page, name, options = {}) {
      const file = path.join(SHOTS, `${name}.png`);
      await page.screenshot({ path: file, fullPage: options.fullPage ?? true });
      return file;
    },
    async shotOf(part, name) {
      const file = path.join(SHOTS, `${name}.png`);
      await part.screenshot({ path: file });
      return file;
    },
  };
  return fixture;
}
