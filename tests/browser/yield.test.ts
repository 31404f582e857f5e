// In Chromium: a manager opens Tallies › Removal yield on the demo data and every figure draws;
// the table view and the CSV download work. Screenshots at phone and desk sizes go to the shots folder (tests/support/browser-fixture.ts).
import { expect, test } from "vitest";
import type { Page } from "playwright-core";
import { DESK, PHONE } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";
import { TalliesPage } from "../support/pages/tallies-page";

const ui = browserPerFile();

const CARDS = [
  "Hot-bearing alarms: reading against outcome",
  "Acoustic alarms by level",
  "Detectors against the fleet",
  "Remove calls confirmed, by shop",
  "Remove calls confirmed, by inspector",
  "Remove calls confirmed over time",
  "Keep calls followed by a removal",
  "What no-defect removals cost, by trigger",
  "What no-defect removals cost, by detector",
];

const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 30_000, interval: 150 });
const card = (page: Page, title: string) =>
  page.locator("section[data-chart-card]", { has: page.getByRole("heading", { name: title, exact: true }) });

for (const [label, viewport] of [
  ["desk", DESK],
  ["phone", PHONE],
] as const) {
  test(`every removal-yield figure draws on the demo (${label})`, async () => {
    const page = await ui.signIn("manager", viewport);
    await new TalliesPage(page).goto("yield");
    await poll(() => page.getByRole("link", { name: "Removal yield" }).getAttribute("aria-current")).toBe("page");
    const summary = page.locator("[data-yield-summary]");
    await poll(() => summary.innerText()).toContain("over the owner's threshold");
    expect(await summary.innerText()).toContain("applies no alarm threshold of its own");
    for (const title of CARDS) {
      const c = card(page, title);
      await poll(() => c.count()).toBe(1);
      await poll(() => c.locator("svg.recharts-surface").count()).toBeGreaterThan(0);
    }
    // the fitted curve and its band are drawn, and the funnel holds the over-alarming detector
    await poll(() => card(page, CARDS[0]).locator(".recharts-line-curve").count()).toBeGreaterThan(0);
    await ui.shot(page, `yield-${label}`);
    // The plot names only detectors below the fleet's rate, which moves with whatever else the casebook holds;
    // the detector's own row is always in the figure's table.
    const funnel = card(page, "Detectors against the fleet");
    await funnel.getByRole("button", { name: "Table" }).click();
    await poll(() => funnel.locator("table").innerText()).toContain("D-217");
    expect(await page.evaluate((w) => document.documentElement.scrollWidth <= w, viewport.width)).toBe(true);
    await page.close();
  }, 120_000);
}

test("a figure's table view and CSV hold its numbers", async () => {
  const page = await ui.signIn("manager", DESK);
  await new TalliesPage(page).goto("yield");
  const c = card(page, "Detectors against the fleet");
  await c.getByRole("button", { name: "Table" }).click();
  await poll(() => c.locator("table").innerText()).toContain("Fleet");
  const [download] = await Promise.all([page.waitForEvent("download"), c.getByRole("button", { name: "CSV" }).click()]);
  const text = await (await download.createReadStream()).toArray();
  expect(Buffer.concat(text).toString("utf8")).toContain("D-217");
  await page.close();
}, 60_000);
