// In Chromium: a search held in the URL shows highlighted hits on desktop and phone, the
// filters open as a drawer on a phone, and a facet link narrows the list.
import { afterAll, beforeAll, expect, test } from "vitest";
import { mkdirSync } from "node:fs";
import type { Browser } from "playwright-core";
import { launch, PHONE, DESK, signedInPage } from "../support/browser";
import { caseWith, markerWord, people } from "../api/search/casebook";

let browser: Browser;
const marker = markerWord();
const url = `/search?q=spaling+${marker}`;

beforeAll(async () => {
  mkdirSync("/tmp/shots", { recursive: true });
  const p = await people();
  // Invented cases: two spalls (one written up, one only coded) and one unrelated.
  await caseWith(marker, {
    siteId: p.mjc, trigger: "wayside-hot", primaryCause: "end-of-life",
    notes: "Deep spalling in the load zone of the cup outboard raceway, about 20 mm long. Rollers of the outboard row marked.",
    findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 4, notes: "Spalled area 20 x 8 mm at 12 o'clock." }],
  });
  await caseWith(marker, { siteId: p.pyc, trigger: "hand-roll", notes: "Metal flaked from the inboard cone raceway.", findings: [{ component: "cone-inboard", damageCode: "fatigue.subsurface", severity: 3 }] });
  await caseWith(marker, { siteId: p.mjc, trigger: "welding", notes: "Grey bands across the raceway.", findings: [{ component: "rollers-inboard", damageCode: "electrical.fluting", severity: 3 }] });
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

test("a shared search link shows the matching cases with the words marked (desktop)", async () => {
  const page = await signedInPage(browser, "engineer", DESK);
  await page.goto(url);
  await page.waitForSelector('[data-testid="search-hit"]');
  expect(await page.locator('[data-testid="search-hit"]').count()).toBe(2);
  expect(await page.inputValue('[data-testid="search-input"]')).toBe(`spaling ${marker}`);
  const marks = (await page.locator('[data-testid="hit-snippet"] mark').allTextContents()).map((m) => m.toLowerCase());
  expect(marks).toContain("spalling");
  expect(await page.textContent('[data-testid="understood"]')).toContain("spalling");
  await page.screenshot({ path: "/tmp/shots/search-desktop.png", fullPage: true });

  // A facet link narrows the list and the URL keeps it.
  await page.click('[data-testid="facet-panel"] a:has-text("Pellham Yard car shop")');
  await page.waitForURL(/site=PYC/);
  await expect.poll(() => page.locator('[data-testid="search-hit"]').count()).toBe(1);
  expect(await page.locator('[data-testid="active-filters"]').textContent()).toContain("Pellham Yard car shop");
  await page.context().close();
});

test("on a phone the hits fit the screen and the filters open as a drawer", async () => {
  const page = await signedInPage(browser, "engineer", PHONE);
  await page.goto(url);
  await page.waitForSelector('[data-testid="search-hit"]');
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(PHONE.width);
  await page.screenshot({ path: "/tmp/shots/search-phone.png", fullPage: true });
  await page.click('[data-testid="open-filters"]');
  await page.waitForSelector('[role="dialog"] [data-testid="facet-panel"]');
  await page.screenshot({ path: "/tmp/shots/search-phone-filters.png" });
  await page.click('[role="dialog"] a:has-text("Wayside hot-bearing alarm")');
  await page.waitForURL(/trigger=wayside-hot/);
  await expect.poll(() => page.locator('[data-testid="search-hit"]').count()).toBe(1);
  await page.context().close();
});

test("the damage finder picks a code out of a long list by a shop word", async () => {
  const wide = markerWord();
  const codes = ["fatigue.surface", "corrosion.moisture", "corrosion.fretting", "electrical.arc", "deformation.debris", "cage.broken", "seal.leaking"];
  for (const code of codes) await caseWith(wide, { notes: "Bench check.", findings: [{ component: "cup", damageCode: code, severity: 2 }] });
  const page = await signedInPage(browser, "engineer", DESK);
  await page.goto(`/search?q=${wide}`);
  await page.waitForSelector('[data-testid="damage-finder"]');
  await page.fill('[data-testid="damage-finder"]', "rust");
  // "rust" is a shop word for water etch (common practice); fretting rust also names fretting.
  await expect.poll(async () => (await page.locator('[data-testid="facet-panel"] section:has([data-testid="damage-finder"]) [data-testid="facet-value"]').allTextContents()).join("|")).toMatch(/^Water etch1/);
  await page.context().close();
});

test("a search with nothing to find suggests what to try", async () => {
  const page = await signedInPage(browser, "inspector", PHONE);
  await page.goto(`/search?q=brinelling+${marker}`);
  await page.waitForSelector('[data-testid="no-results"]');
  await page.screenshot({ path: "/tmp/shots/search-phone-empty.png", fullPage: true });
  await page.context().close();
});
