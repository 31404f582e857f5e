// In Chromium on a phone: the unit switch asks before touching a number, and a reading no bearing can show is refused until confirmed.
import { expect, test } from "vitest";
import { PHONE } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";
import { NewRemovalPage } from "../support/pages/new-removal-page";

const ui = browserPerFile();

test("switching units asks; converting keeps the reading, 5 in is refused until confirmed as typed", async () => {
  const page = await ui.signIn("inspector", PHONE);
  const form = await new NewRemovalPage(page).goto();
  const reading = form.reading(1);
  await reading.fill("0.070");
  await form.chooseUnits("mm");
  await page.waitForSelector('[data-testid="unit-switch"]');
  await ui.shot(page, "e2e-unit-switch-phone", { fullPage: false });
  await page.click("text=Convert them to mm");
  // arithmetic: 0.070 in × 25.4 mm/in = 1.778 mm (NIST SP 811)
  await expect.poll(() => reading.inputValue()).toBe("1.778");

  await form.chooseUnits("inches");
  await page.click("text=Convert them to inches");
  // common practice: no journal bearing shows more than 1/4 in of end play
  await reading.fill("5");
  await expect.poll(() => page.textContent("form")).toContain("more than a journal bearing can show");
  expect(await reading.getAttribute("aria-invalid")).toBe("true");
  await ui.shot(page, "e2e-implausible-phone", { fullPage: false });
  await page.click("text=Confirm the reading as typed");
  await expect.poll(() => reading.getAttribute("aria-invalid")).toBe(null);
  await page.context().close();
});
