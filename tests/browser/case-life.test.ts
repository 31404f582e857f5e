// In Chromium: an inspector files a case on a phone, an analyst records findings and a verdict,
// an engineer signs it, and the case list shows it signed.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { launch, PHONE, DESK, signedInPage } from "../support/browser";

let browser: Browser;
let number = "";
const car = String(300000 + Math.floor(Math.random() * 99999));

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

test("inspector files a removal on a phone and sees the live field call", async () => {
  const page = await signedInPage(browser, "inspector", PHONE);
  await page.goto("/cases/new");
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await page.fill("#carMark", "brwx");
  await page.fill("#carNumber", car);
  await page.click('[aria-label="Axle 3 left"]');
  await page.selectOption("#trigger", "end-play-high");
  await page.fill("#detail-endPlayIn", "0.07");
  await page.fill("#serial", "BRW7781");
  await page.selectOption("#bearingClass", "F");
  for (const pos of ["0", "120", "240"]) {
    for (const dir of ["pull", "push"]) await page.locator(`[data-cell="${pos}-${dir}"] >> role=radio[name="Smooth"]`).click();
  }
  await page.fill('[aria-label="Trial 1 reading"]', "0.071");
  await page.click("text=Add trial");
  await page.fill('[aria-label="Trial 2 reading"]', "0.069");
  // Mean 0.070 in is over the 1/16 in (0.0625 in) limit (common practice for interchange).
  await expect.poll(() => page.textContent('[data-testid="end-play-result"]')).toContain("0.0700 in");
  await expect.poll(() => page.getAttribute("[data-call]", "data-call")).toBe("remove");
  await page.screenshot({ path: "/tmp/shots/e2e-new-removal-phone.png", fullPage: true });
  await page.click("text=File removal report");
  await page.waitForURL(/\/cases\/TL-\d{2}-\d{5}$/);
  number = page.url().split("/").pop()!;
  await expect.poll(() => page.textContent("h1")).toBe(number);
  await page.context().close();
});

test("analyst receives, records a finding with the code picker, writes the verdict and sends it for sign-off", async () => {
  const page = await signedInPage(browser, "analyst", DESK);
  await page.goto(`/cases/${number}`);
  await page.click("text=Mark received at the lab");
  await page.waitForSelector("text=Add finding");
  await page.click("text=Add finding");
  await page.selectOption("#f-component", "cone-outboard");
  await page.fill("#f-code", "flaking");
  await page.click('role=option >> text="Subsurface spall"');
  await page.selectOption("#f-severity", "3");
  await page.fill("#f-clock", "90");
  await page.fill("#f-arc", "40");
  await page.click('button:has-text("Add finding")');
  await page.waitForSelector('[data-testid="finding"]');
  expect(await page.textContent('[data-testid="finding"]')).toContain("Subsurface spall");
  await page.selectOption("#primaryCause", "end-of-life");
  await page.click('role=radio[name="Confirmed"] >> nth=-1');
  await page.click("text=Save verdict");
  await page.waitForSelector('button:has-text("Send verdict for sign-off"):not([disabled])');
  await page.click("text=Send verdict for sign-off");
  await page.waitForSelector("text=Awaiting sign-off");
  await page.screenshot({ path: "/tmp/shots/e2e-case-analyst-desk.png", fullPage: true });
  await page.context().close();
});

test("engineer signs, and the case list shows it signed", async () => {
  const page = await signedInPage(browser, "engineer", DESK);
  await page.goto(`/cases/${number}`);
  await page.click("text=Sign verdict");
  await page.waitForSelector("text=This case is read-only");
  await page.goto(`/cases?q=${car}`);
  const row = page.locator(`text=${number}`).first();
  await row.waitFor();
  const listText = await page.textContent("main");
  expect(listText).toContain(number);
  expect(listText).toContain("Signed");
  await page.screenshot({ path: "/tmp/shots/e2e-case-list-desk.png" });
  await page.context().close();
});
