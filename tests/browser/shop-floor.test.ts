// In Chromium: an incomplete removal shows what to fix and goes to it; a filing with unticked safety
// confirmations carries a flag the engineer sees; the main screens pass axe-core's serious and critical rules.
import { expect, test } from "vitest";
import { as } from "../support/api";
import { pool } from "../support/db";
import { seriousAxeProblems } from "../support/axe";
import { DESK, PHONE } from "../support/browser";
import { APP_URL } from "../support/env";
import { fieldReport } from "../api/cases/fixtures";
import { browserPerFile } from "../support/browser-fixture";
import { CasePage } from "../support/pages/case-page";
import { NewRemovalPage } from "../support/pages/new-removal-page";

const ui = browserPerFile();

test("an incomplete removal shows a summary at the top with a link per field, and focus moves to the first", async () => {
  const page = await ui.signIn("inspector", PHONE);
  await new NewRemovalPage(page).goto();
  await page.click("text=File removal report");
  const summary = page.locator('[data-testid="error-summary"]');
  await summary.waitFor();
  expect(await summary.textContent()).toContain("Choose what triggered the removal.");
  // Words of the form only: no internal field names.
  expect(await summary.textContent()).not.toMatch(/trigger:/);
  await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("trigger");
  expect(await page.getAttribute("#trigger", "aria-invalid")).toBe("true");
  await ui.shot(page, "e2e-error-summary-phone", { fullPage: false });
  // Nothing was put in the outbox for a report that cannot be filed.
  expect(await page.locator('[data-testid="queued"]').count()).toBe(0);
  // The link in the summary goes back to the field after focus has moved on.
  await page.focus("#carMark");
  await summary.getByRole("link").first().click();
  await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("trigger");
  await page.context().close();
});

test("the inspector reopens a filed report for correction and the form loads with what was filed", async () => {
  const inspector = await as("inspector");
  const base = await fieldReport();
  const res = await inspector.request("POST", "/api/cases", base);
  expect(res.status).toBe(201);
  const { case: filed } = (await res.json()) as { case: { number: string } };
  const page = await ui.signIn("inspector", PHONE);
  await page.goto(`/cases/${filed.number}`);
  await page.locator("h1").waitFor();
  // The case page itself carries no editor; it loads on demand for the correction.
  expect(await page.locator("#carMark").count()).toBe(0);
  await page.goto(`/cases/${filed.number}?edit=field`);
  await expect.poll(() => page.locator("#carNumber").inputValue(), { timeout: 15_000 }).toBe(base.carNumber);
  await ui.shot(page, "e2e-field-edit-phone");
  await page.context().close();
});

test("a report filed with safety confirmations unticked shows the flag to the engineer", async () => {
  const inspector = await as("inspector");
  const base = await fieldReport();
  const res = await inspector.request("POST", "/api/cases", {
    ...base,
    fieldChecks: { ...base.fieldChecks, confirmations: { ppe: true, blueSignal: true } },
  });
  expect(res.status).toBe(201);
  const { case: filed } = (await res.json()) as { case: { number: string } };
  for (const viewport of [PHONE, DESK]) {
    const page = await ui.signIn("engineer", viewport);
    await new CasePage(page).goto(filed.number);
    const flag = page.locator('[data-testid="safety-flag"]');
    await flag.waitFor();
    const text = (await flag.textContent()) ?? "";
    expect(text).toContain("Not confirmed: wheelset is out from under the car and secured against rolling");
    expect(text).not.toContain("blue-signal protection is in place");
    expect(text).toMatch(/employer's procedures, the applicable interchange rules and local codes/);
    await ui.shot(page, `e2e-safety-flag-${viewport === PHONE ? "phone" : "desk"}`, { fullPage: false });
    await page.context().close();
  }
  // The printed report carries it too.
  const report = await (await as("engineer")).request("GET", `/cases/${filed.number}/report`);
  expect(report.status).toBe(200);
  expect(await report.text()).toContain("Safety flag: confirmations left unticked at filing");
});

test("axe-core finds no serious or critical problem on sign-in, the list, a case and the removal form", async () => {
  const anon = await ui.browser.newContext({ viewport: PHONE, baseURL: APP_URL });
  const signIn = await anon.newPage();
  await signIn.goto("/sign-in");
  const found: Record<string, unknown> = { "/sign-in": await seriousAxeProblems(signIn) };
  await anon.close();
  const page = await ui.signIn("analyst", PHONE);
  await page.goto("/cases");
  await page.locator("main a[href^='/cases/TL-']:visible").first().waitFor();
  found["/cases"] = await seriousAxeProblems(page);
  const first = await page.locator("main a[href^='/cases/TL-']:visible").first().getAttribute("href");
  await page.goto(first!);
  found[first!] = await seriousAxeProblems(page);
  await page.context().close();
  const inspector = await ui.signIn("inspector", PHONE);
  await inspector.goto("/cases/new");
  found["/cases/new"] = await seriousAxeProblems(inspector);
  await inspector.context().close();
  expect(found).toEqual({ "/sign-in": [], "/cases": [], [first!]: [], "/cases/new": [] });
}, 90_000);

test("on a phone the menu shows every destination without sideways scrolling, each at least 44 px tall", async () => {
  const page = await ui.signIn("admin", PHONE);
  await page.goto("/");
  await page.getByRole("button", { name: "Menu" }).click();
  const links = page.locator('#phone-menu nav[aria-label="Main"] a');
  // The admin sees every destination: six for the casebook, five for administration (components/shell/nav-items.ts).
  expect(await links.count()).toBe(11);
  for (const box of await links.evaluateAll((els) => els.map((e) => e.getBoundingClientRect().toJSON() as DOMRect))) {
    expect(box.height).toBeGreaterThanOrEqual(44);
    expect(box.right).toBeLessThanOrEqual(PHONE.width);
    expect(box.left).toBeGreaterThanOrEqual(0);
  }
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
  await ui.shot(page, "e2e-phone-menu", { fullPage: false });
  await page.getByRole("link", { name: "Sites & limits" }).click();
  await page.waitForURL((u) => u.pathname === "/admin/sites");
  expect(await page.locator("#phone-menu").count()).toBe(0);
  await page.context().close();
});

test("axe-core finds no serious or critical problem on a signed case, the search results and the tallies", async () => {
  const { rows } = await pool.query<{ number: string }>(
    "SELECT c.number FROM cases c WHERE c.status = 'signed' AND EXISTS (SELECT 1 FROM photos p WHERE p.case_id = c.id) ORDER BY c.number LIMIT 1",
  );
  const signed = `/cases/${rows[0].number}`;
  const found: Record<string, unknown> = {};
  for (const viewport of [PHONE, DESK]) {
    const page = await ui.signIn("engineer", viewport);
    for (const [path, ready] of [
      [signed, '[data-testid="photo-tile"]'],
      ["/search?q=spall+cup+outboard+row", '[data-testid="search-hit"]'],
      ["/tallies", "main h1"],
      ["/tallies/life", "[data-life-causes]"],
    ] as const) {
      await page.goto(path);
      await page.locator(ready).first().waitFor();
      found[`${path} (${viewport.width} px)`] = await seriousAxeProblems(page);
    }
    await page.context().close();
  }
  expect(found).toEqual(Object.fromEntries(Object.keys(found).map((k) => [k, []])));
}, 120_000);
