// In Chromium: an inspector files a case on a phone, an analyst records findings and a verdict,
// an engineer signs it through the signature ceremony, and the case list shows it signed.
import { expect, test } from "vitest";
import { PHONE, DESK } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";
import { CaseListPage } from "../support/pages/case-list-page";
import { CasePage } from "../support/pages/case-page";
import { NewRemovalPage } from "../support/pages/new-removal-page";

const ui = browserPerFile();

let number = "";
const car = String(300000 + Math.floor(Math.random() * 99999));

test("inspector files a removal on a phone and sees the live field call", async () => {
  const page = await ui.signIn("inspector", PHONE);
  const form = await new NewRemovalPage(page).goto();
  await page.fill("#carMark", "brwx");
  await page.fill("#carNumber", car);
  await page.click('[aria-label$="Axle 3 left"]');
  await page.selectOption("#trigger", "end-play-high");
  await page.fill("#detail-endPlayIn", "0.07");
  await page.fill("#serial", "BRW7781");
  await page.selectOption("#bearingClass", "F");
  await form.handRollAllSmooth();
  await form.reading(1).fill("0.071");
  await page.click("text=Add trial");
  await form.reading(2).fill("0.069");
  // Mean 0.070 in is over the 1/16 in (0.0625 in) limit (common practice for interchange).
  await expect.poll(() => form.endPlayResult()).toContain("0.0700 in");
  await expect.poll(() => form.callValue()).toBe("remove");
  await ui.shot(page, "e2e-new-removal-phone");
  await form.file();
  const casePage = new CasePage(page);
  number = await casePage.waitForCase();
  await expect.poll(() => casePage.heading()).toBe(number);
  await page.context().close();
});

test("analyst receives, records a finding with the code picker, writes the verdict and sends it for sign-off", async () => {
  const page = await ui.signIn("analyst", DESK);
  await new CasePage(page).goto(number);
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
  await ui.shot(page, "e2e-case-analyst-desk");
  await page.context().close();
});

test("engineer signs through the ceremony: wrong password refused, right one signs, the report shows the hash check", async () => {
  const page = await ui.signIn("engineer", DESK);
  await new CasePage(page).goto(number);
  await page.click("text=Sign verdict");
  const ceremony = page.locator('[data-testid="signature-ceremony"]');
  await ceremony.waitFor();
  expect(await ceremony.textContent()).toContain("End of life");
  expect(await ceremony.textContent()).toContain("What your signature means");
  const shownHash = (await page.textContent('[data-testid="sign-hash"]'))!.trim();
  expect(shownHash).toMatch(/^[0-9a-f]{64}$/);
  await ui.shot(page, "e2e-sign-ceremony-desk");
  await page.check("text=I have reviewed this and sign it as my own judgement.");
  await page.fill("#sign-password", "not-my-password-9");
  await page.click("text=Sign this verdict");
  await page.waitForSelector("text=That password is not right");
  expect(await page.textContent("main")).not.toContain("This case is read-only");
  const { DEMO_PASSWORD } = await import("../../scripts/seed/demo-people");
  await page.fill("#sign-password", DEMO_PASSWORD);
  await page.click("text=Sign this verdict");
  await page.waitForSelector("text=This case is read-only");
  expect(await page.textContent('[data-testid="signature-check"]')).toContain("exactly as signed");
  await new CasePage(page).goto(number, "report");
  const report = (await page.textContent("main")) ?? "";
  expect(report.replace(/\s+/g, "")).toContain(shownHash);
  expect(report).toContain("Matches: the verdict, findings and photos are exactly as signed.");
  await new CasePage(page).goto(number);
  await new CaseListPage(page).goto(`q=${car}`);
  const row = page.locator(`text=${number}`).first();
  await row.waitFor();
  const listText = await page.textContent("main");
  expect(listText).toContain(number);
  expect(listText).toContain("Signed");
  await ui.shot(page, "e2e-case-list-desk", { fullPage: false });
  await page.context().close();
});
