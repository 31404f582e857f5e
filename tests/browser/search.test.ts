// In Chromium: a search held in the URL shows highlighted hits on desktop and phone, the
// filters open as a drawer on a phone, and a facet link narrows the list.
import { beforeAll, expect, test } from "vitest";
import { PHONE, DESK } from "../support/browser";
import { caseWith, markerWord, people } from "../api/search/casebook";
import { browserPerFile } from "../support/browser-fixture";
import { SearchPage } from "../support/pages/search-page";

const ui = browserPerFile();

const marker = markerWord();
const url = `/search?q=spaling+${marker}`;

beforeAll(async () => {
  const p = await people();
  // Invented cases: two spalls (one written up, one only coded) and one unrelated.
  await caseWith(marker, {
    siteId: p.mjc,
    trigger: "wayside-hot",
    primaryCause: "end-of-life",
    notes: "Deep spalling in the load zone of the cup outboard raceway, about 20 mm long. Rollers of the outboard row marked.",
    findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 4, notes: "Spalled area 20 x 8 mm at 12 o'clock." }],
  });
  await caseWith(marker, {
    siteId: p.pyc,
    trigger: "hand-roll",
    notes: "Metal flaked from the inboard cone raceway.",
    findings: [{ component: "cone-inboard", damageCode: "fatigue.subsurface", severity: 3 }],
  });
  await caseWith(marker, {
    siteId: p.mjc,
    trigger: "welding",
    notes: "Grey bands across the raceway.",
    findings: [{ component: "rollers-inboard", damageCode: "electrical.fluting", severity: 3 }],
  });
});

test("a shared search link shows the matching cases with the words marked (desktop)", async () => {
  const page = await ui.signIn("engineer", DESK);
  const search = await new SearchPage(page).goto(url);
  await search.waitForHits();
  expect(await search.hits().count()).toBe(2);
  expect(await search.input().inputValue()).toBe(`spaling ${marker}`);
  const marks = await search.markedWords();
  expect(marks).toContain("spalling");
  expect(await page.textContent('[data-testid="understood"]')).toContain("spalling");
  await ui.shot(page, "search-desktop");

  // A facet link narrows the list and the URL keeps it.
  await page.click('[data-testid="facet-panel"] a:has-text("Pellham Yard car shop")');
  await page.waitForURL(/site=PYC/);
  await expect.poll(() => search.hits().count()).toBe(1);
  expect(await search.activeFilters().textContent()).toContain("Pellham Yard car shop");
  await page.context().close();
});

test("on a phone the hits fit the screen and the filters open as a drawer", async () => {
  const page = await ui.signIn("engineer", PHONE);
  await (await new SearchPage(page).goto(url)).waitForHits();
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(PHONE.width);
  await ui.shot(page, "search-phone");
  await page.click('[data-testid="open-filters"]');
  await page.waitForSelector('[role="dialog"] [data-testid="facet-panel"]');
  await ui.shot(page, "search-phone-filters", { fullPage: false });
  await page.click('[role="dialog"] a:has-text("Wayside hot-bearing alarm")');
  await page.waitForURL(/trigger=wayside-hot/);
  await expect.poll(() => page.locator('[data-testid="search-hit"]').count()).toBe(1);
  await page.context().close();
});

test("the damage finder picks a code out of a long list by a shop word", async () => {
  const wide = markerWord();
  const codes = [
    "fatigue.surface",
    "corrosion.moisture",
    "corrosion.fretting",
    "electrical.arc",
    "deformation.debris",
    "cage.broken",
    "seal.leaking",
  ];
  for (const code of codes)
    await caseWith(wide, { notes: "Bench check.", findings: [{ component: "cup", damageCode: code, severity: 2 }] });
  const page = await ui.signIn("engineer", DESK);
  await new SearchPage(page).goto(wide);
  await page.waitForSelector('[data-testid="damage-finder"]');
  await page.fill('[data-testid="damage-finder"]', "rust");
  // "rust" is a shop word for water etch (common practice); fretting rust also names fretting.
  await expect
    .poll(async () =>
      (
        await page
          .locator('[data-testid="facet-panel"] section:has([data-testid="damage-finder"]) [data-testid="facet-value"]')
          .allTextContents()
      ).join("|"),
    )
    .toMatch(/^Water etch1/);
  await page.context().close();
});

test("a search with nothing to find suggests what to try", async () => {
  const page = await ui.signIn("inspector", PHONE);
  await new SearchPage(page).goto(`brinelling+${marker}`);
  await page.waitForSelector('[data-testid="no-results"]');
  await ui.shot(page, "search-phone-empty");
  await page.context().close();
});
