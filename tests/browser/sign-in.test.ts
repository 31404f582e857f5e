// In Chromium at phone size: a wrong password shows the error; the right one lands on the home page.
import { expect, test } from "vitest";
import { DEMO_PASSWORD } from "../../scripts/seed/demo-people";
import { demoUser } from "../support/api";
import { PHONE } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";
import { SignInPage } from "../support/pages/sign-in-page";

const ui = browserPerFile();

test("sign-in on a phone: wrong password refused with a message, right password opens the home page", async () => {
  const page = await ui.open(PHONE, { hasTouch: true, isMobile: true });
  const person = demoUser("inspector");

  const signIn = await new SignInPage(page).goto();
  await signIn.fill(person.email, "not-the-password");
  await signIn.submit();
  await expect.poll(() => signIn.alerts().textContent(), { timeout: 15_000 }).toContain("do not match an account");
  expect(new URL(page.url()).pathname).toBe("/sign-in");
  await ui.shot(page, `sign-in-refused-phone`);

  // The page fits the phone: nothing wider than the screen.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);

  await signIn.signIn(person.email, DEMO_PASSWORD, "/");
  await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent(), { timeout: 15_000 }).toContain(person.name.split(" ")[0]);
  await ui.shot(page, `sign-in-home-phone`);

  // Signing out from the phone menu ends the session: the casebook asks for a sign-in again.
  await page.getByRole("button", { name: /menu/i }).first().click();
  await Promise.all([
    page.waitForURL((u) => u.pathname === "/sign-in", { timeout: 30_000 }),
    page.getByRole("button", { name: "Sign out" }).last().click(),
  ]);
  await page.goto("/cases");
  expect(new URL(page.url()).pathname).toBe("/sign-in");
  expect((await page.context().cookies()).some((c) => c.name.includes("session_token") && c.value)).toBe(false);
  await page.context().close();
}, 60_000);

test("empty fields get a message under each field", async () => {
  const page = await ui.open(PHONE);
  const signIn = await new SignInPage(page).goto();
  await signIn.submit();
  await expect
    .poll(() => signIn.alerts().allTextContents(), { timeout: 10_000 })
    .toEqual(expect.arrayContaining([expect.stringMatching(/valid e-mail/), expect.stringMatching(/Enter your password/)]));
  await page.context().close();
});
