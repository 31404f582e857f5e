// Debian's Chromium driven by playwright-core (no browser download), for page tests.
import { chromium, type Browser, type Page } from "playwright-core";
import { DEMO_PASSWORD } from "../../scripts/seed/demo-people";
import { demoUser, type DemoRole } from "./api";
import { APP_URL, CHROMIUM_PATH } from "./env";

export async function launch(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage"],
  });
}

export const PHONE = { width: 390, height: 844 };
export const DESK = { width: 1366, height: 900 };

export async function signedInPage(browser: Browser, role: DemoRole, viewport = DESK): Promise<Page> {
  const ctx = await browser.newContext({ viewport, baseURL: APP_URL });
  const page = await ctx.newPage();
  await page.goto("/sign-in");
  await page.fill("#email", demoUser(role).email);
  await page.fill("#password", DEMO_PASSWORD);
  await Promise.all([page.waitForURL((u) => !u.pathname.startsWith("/sign-in")), page.click("button[type=submit]")]);
  return page;
}
