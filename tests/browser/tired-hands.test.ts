// In Chromium on a phone: the unit switch asks before touching a number, and a reading no bearing can show is refused until confirmed.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { launch, PHONE, signedInPage } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

test("switching units asks; converting keeps the reading, 5 in is refused until confirmed as typed", async () => {
  const page = await signedInPage(browser, "inspector", PHONE);
  await page.goto("/cases/new");
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  const reading = page.locator('[aria-label="Trial 1 reading"]');
  await reading.fill("0.070");
  await page.click('role=radiogroup[name="Units"] >> role=radio[name="mm"]');
  await page.waitForSelector('[data-testid="unit-switch"]');
  await page.screenshot({ path: "/tmp/shots/e2e-unit-switch-phone.png", fullPage: false });
  await page.click("text=Convert them to mm");
  // arithmetic: 0.070 in × 25.4 mm/in = 1.778 mm (NIST SP 811)
  await expect.poll(() => reading.inputValue()).toBe("1.778");

  await page.click('role=radiogroup[name="Units"] >> role=radio[name="inches"]');
  await page.click("text=Convert them to inches");
  // common practice: no journal bearing shows more than 1/4 in of end play
  await reading.fill("5");
  await expect.poll(() => page.textContent("form")).toContain("more than a journal bearing can show");
  expect(await reading.getAttribute("aria-invalid")).toBe("true");
  await page.screenshot({ path: "/tmp/shots/e2e-implausible-phone.png", fullPage: false });
  await page.click("text=Confirm the reading as typed");
  await expect.poll(() => reading.getAttribute("aria-invalid")).toBe(null);
  await page.context().close();
});
