// In Chromium: a manager opens the tallies on the demo data and every chart draws; the table view,
// CSV and PNG downloads work; the filters go into the URL; the life section draws its Weibull plot.
// Screenshots at phone and desk sizes go to the shots folder (tests/support/browser-fixture.ts) for review.
import { readFileSync } from "node:fs";
import { beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { DESK, PHONE } from "../support/browser";
import { createCase } from "../support/factories";
import { checkValues } from "../unit/stats/check-values";
import { insertCasebook, makeSites, specs, tag } from "../api/tallies/casebook";
import { browserPerFile } from "../support/browser-fixture";
import { TalliesPage } from "../support/pages/tallies-page";

const ui = browserPerFile();

const CLASS = tag();

// Cards whose chart is drawn by the chart library, and the two drawn as our own SVG.
const RECHARTS_CARDS = [
  "Root causes",
  "Trigger and teardown verdict",
  "Confirmed share by trigger",
  "Confirmed share by shop",
  "Monthly trend with control limits",
  "Causes by site",
];

beforeAll(async () => {
  // The demo casebook is there already; a few more cases of our own make sure every chart has data.
  const sites = await makeSites(CLASS);
  await insertCasebook(CLASS, specs(30, 2024, 2025), sites);
  // The NIST/SEMATECH 8.4.1.3 life data (fixture), for the Weibull plot.
  const nist = checkValues.weibull.nist_8_4_1_3;
  for (const [i, time] of (nist.times as number[]).entries()) {
    await createCase({
      bearingClass: `${CLASS}W`,
      status: "signed",
      primaryCause: nist.status[i] === 1 ? "water-ingress" : "seal",
      removalConfirmed: "confirmed",
      serviceMonths: time,
      removedOn: "1991-06-15",
    });
  }
});

const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 30_000, interval: 150 });
const card = (page: Page, title: string) => new TalliesPage(page).card(title);
const fitsWidth = (page: Page, width: number) => page.evaluate((w) => document.documentElement.scrollWidth <= w, width);

for (const [label, viewport] of [
  ["desk", DESK],
  ["phone", PHONE],
] as const) {
  test(`every tally chart draws for a manager (${label})`, async () => {
    const page = await ui.signIn("manager", viewport);
    const tallies = await new TalliesPage(page).goto();
    await poll(() => tallies.heading()).toBe("Tallies");
    for (const title of RECHARTS_CARDS) {
      await poll(() => card(page, title).locator("svg.recharts-surface").count()).toBeGreaterThan(0);
      // something is drawn inside, not just an empty frame
      await poll(() =>
        card(page, title).locator("svg.recharts-surface path, svg.recharts-surface circle, svg.recharts-surface rect").count(),
      ).toBeGreaterThan(2);
    }
    await poll(() => card(page, "Where damage sits").locator("svg[data-damage-map] path").count()).toBeGreaterThan(4);
    await poll(() => card(page, "Recurring causes").locator("[data-clusters], p").count()).toBeGreaterThan(0);
    expect(await page.locator("[data-headline]").innerText()).toMatch(/removals\s+[\d,]+/i);
    expect(await fitsWidth(page, viewport.width), "the page is wider than the screen").toBe(true);
    await ui.shot(page, `tallies-${label}`);
    await page.context().close();
  }, 180_000);
}

test("a chart's numbers are one click away, and it downloads as CSV and PNG", async () => {
  const page = await ui.signIn("manager", DESK);
  await new TalliesPage(page).goto("", `class=${CLASS}`);
  const pareto = card(page, "Root causes");
  await poll(() => pareto.locator("svg.recharts-surface").count()).toBe(1);

  await pareto.getByRole("button", { name: "Table" }).click();
  await poll(() => pareto.locator("table tbody tr").count()).toBeGreaterThan(1);
  expect(await pareto.locator("table thead").innerText()).toContain("Cumulative %");

  const [csv] = await Promise.all([page.waitForEvent("download"), pareto.getByRole("button", { name: "CSV" }).click()]);
  expect(csv.suggestedFilename()).toMatch(/^tearline-root-causes-\d{4}-\d{2}-\d{2}\.csv$/);
  const text = readFileSync((await csv.path())!, "utf8");
  const lines = text.replace(/^\uFEFF/, "").split("\r\n");
  expect(lines[0]).toMatch(/^Filters: /); // the filters that made the numbers come first
  expect(lines[1]).toBe("Root cause,Verdicts,Share %,Cumulative %");

  await pareto.getByRole("button", { name: "Chart" }).click();
  const [png] = await Promise.all([page.waitForEvent("download"), pareto.getByRole("button", { name: "PNG" }).click()]);
  expect(png.suggestedFilename()).toMatch(/\.png$/);
  const bytes = readFileSync((await png.path())!);
  expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature (ISO/IEC 15948)
  expect(bytes.length).toBeGreaterThan(5_000);

  // Filters live in the URL.
  await page.locator("#f-trigger").selectOption("wayside-hot");
  await poll(() => new URL(page.url()).searchParams.get("trigger")).toBe("wayside-hot");
  expect(new URL(page.url()).searchParams.get("class")).toBe(CLASS);
  await page.context().close();
}, 120_000);

for (const [label, viewport] of [
  ["desk", DESK],
  ["phone", PHONE],
] as const) {
  test(`the life section draws the Weibull plot and its parameters (${label})`, async () => {
    const page = await ui.signIn("manager", viewport);
    await new TalliesPage(page).goto("life", `class=${CLASS}W&cause=water-ingress`);
    await poll(() => page.locator("svg[data-weibull-plot] circle").count()).toBe(10);
    await poll(() => page.locator("svg[data-weibull-plot] polyline").count()).toBe(1);
    // NIST/SEMATECH 8.4.1.3 published shape 1.7208 (shown to two decimals)
    expect(await page.locator("[data-life-parameters]").innerText()).toMatch(/Shape β\s+1\.72/);
    expect(await page.locator("[data-fleet-upload]").count()).toBe(1);
    expect(await fitsWidth(page, viewport.width), "the page is wider than the screen").toBe(true);
    await ui.shot(page, `tallies-life-${label}`);
    await page.context().close();
  }, 120_000);
}
