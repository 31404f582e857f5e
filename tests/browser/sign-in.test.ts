// In Chromium at phone size: a wrong password shows the error; the right one lands on the home page.
import { mkdirSync } from "node:fs";
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_PASSWORD } from "../../scripts/seed/demo-people";
import { demoUser } from "../support/api";
import { launch, PHONE } from "../support/browser";
import { APP_URL } from "../support/env";

const SHOTS = "/tmp/shots";
let browser: Browser;

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

test("sign-in on a phone: wrong password refused with a message, right password opens the home page", async () => {
  const ctx = await browser.newContext({ viewport: PHONE, baseURL: APP_URL, hasTouch: true, isMobile: true });
  const page = await ctx.newPage();
  const person = demoUser("inspector");

  await page.goto("/sign-in");
  await page.fill("#email", person.email);
  await page.fill("#password", "not-the-password");
  await page.click("button[type=submit]");
  const alert = page.getByRole("form", { name: "Sign in" }).getByRole("alert");
  await expect.poll(() => alert.textContent(), { timeout: 15_000 }).toContain("do not match an account");
  expect(new URL(page.url()).pathname).toBe("/sign-in");
  await page.screenshot({ path: `${SHOTS}/sign-in-refused-phone.png`, fullPage: true });

  // The page fits the phone: nothing wider than the screen.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);

  await page.fill("#password", DEMO_PASSWORD);
  await Promise.all([page.waitForURL((u) => u.pathname === "/", { timeout: 30_000 }), page.click("button[type=submit]")]);
  await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent(), { timeout: 15_000 }).toContain(person.name.split(" ")[0]);
  await page.screenshot({ path: `${SHOTS}/sign-in-home-phone.png`, fullPage: true });

  // Signing out from the phone menu ends the session: the casebook asks for a sign-in again.
  await page.getByRole("button", { name: /menu/i }).first().click();
  await Promise.all([page.waitForURL((u) => u.pathname === "/sign-in", { timeout: 30_000 }), page.getByRole("button", { name: "Sign out" }).last().click()]);
  await page.goto("/cases");
  expect(new URL(page.url()).pathname).toBe("/sign-in");
  expect((await ctx.cookies()).some((c) => c.name.includes("session_token") && c.value)).toBe(false);
  await ctx.close();
}, 60_000);

test("empty fields get a message under each field", async () => {
  const ctx = await browser.newContext({ viewport: PHONE, baseURL: APP_URL });
  const page = await ctx.newPage();
  await page.goto("/sign-in");
  await page.click("button[type=submit]");
  await expect.poll(() => page.getByRole("form", { name: "Sign in" }).getByRole("alert").allTextContents(), { timeout: 10_000 }).toEqual(
    expect.arrayContaining([expect.stringMatching(/valid e-mail/), expect.stringMatching(/Enter your password/)]),
  );
  await ctx.close();
});
