// In Chromium: the case list read from a link, sorted by a header, filtered, searched, columns
// chosen, and shown as cards on a phone. Screenshots go to the shots folder for review.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, DESK } from "../support/browser";
import { buildCasebook, removeCasebook, TOKEN, type Built } from "../api/cases/list-fixture";
import { browserPerFile } from "../support/browser-fixture";
import { CaseListPage } from "../support/pages/case-list-page";

const ui = browserPerFile();

let book: Built[] = [];

beforeAll(async () => {
  book = await buildCasebook();
}, 90_000);
afterAll(async () => {
  await removeCasebook(book);
}, 90_000);

// The list loads in the browser after the page: give each check time on a busy machine.
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 20_000, interval: 100 });
const rowNumbers = (page: Page) => new CaseListPage(page).rowNumbers();
const sorted = (xs: string[]) => [...xs].sort();
const numbers = (keep: (b: Built) => boolean) => book.filter(keep).map((b) => b.number);

test("an engineer opens a shared link, sorts by a header and adds a filter", async () => {
  const page = await ui.signIn("engineer", DESK);
  await new CaseListPage(page).goto(`status=signed&q=${TOKEN}`);
  const signed = numbers((b) => b.status === "signed");
  await poll(async () => sorted(await rowNumbers(page))).toEqual(sorted(signed));
  expect(await page.getAttribute("[data-testid=stage-signed]", "aria-pressed")).toBe("true");
  expect(await page.inputValue("[data-testid=case-search]")).toBe(TOKEN);

  // A date column starts newest first; a second click turns it round.
  const list = new CaseListPage(page);
  const header = list.header("Removed on");
  await header.locator("button").click();
  await page.waitForURL(/sort=removedOn:desc/);
  await poll(() => header.getAttribute("aria-sort")).toBe("descending");
  const newestFirst = book
    .filter((b) => b.status === "signed")
    .sort((a, b) => (a.removedOn! < b.removedOn! ? 1 : -1))
    .map((b) => b.number);
  await poll(() => rowNumbers(page)).toEqual(newestFirst);
  await header.locator("button").click();
  await page.waitForURL(/sort=removedOn:asc/);
  await poll(() => header.getAttribute("aria-sort")).toBe("ascending");
  await poll(() => rowNumbers(page)).toEqual([...newestFirst].reverse());
  expect(await page.getAttribute('th:has(button:has-text("Car"))', "aria-sort")).toBe("none");

  await list.openFilters();
  await page.locator('label:has-text("Wayside hot-bearing alarm") input').check();
  await page.waitForURL(/trigger=wayside-hot/);
  const hotSigned = numbers((b) => b.status === "signed" && b.trigger === "wayside-hot");
  await poll(async () => sorted(await rowNumbers(page))).toEqual(sorted(hotSigned));
  await page.keyboard.press("Escape");
  expect(await list.countText()).toContain(`${hotSigned.length} cases match`);

  // The export link carries the same filters and sort, without the page.
  const href = await list.exportHref();
  expect(href).toContain("status=signed");
  expect(href).toContain("trigger=wayside-hot");
  expect(href).toContain("sort=removedOn:asc");
  await ui.shot(page, `case-list-filtered-desk`, { fullPage: false });

  // The back button goes back to the unfiltered state.
  await page.goBack();
  await poll(async () => (await rowNumbers(page)).length).toBe(signed.length);
  await page.context().close();
}, 90_000);

test("searching, paging and choosing columns", async () => {
  const page = await ui.signIn("engineer", DESK);
  await new CaseListPage(page).goto("pageSize=10");
  await page.evaluate(() => localStorage.removeItem("tearline.case-list.columns.v1"));
  await page.fill("[data-testid=case-search]", TOKEN);
  await page.waitForURL(new RegExp(`q=${TOKEN}`));
  await poll(() => page.textContent("[data-testid=case-pager]")).toContain(`1–10 of ${book.length}`);
  await page.click('[aria-label="Next page"]');
  await page.waitForURL(/page=2/);
  await poll(async () => (await rowNumbers(page)).length).toBe(book.length - 10);

  expect(await page.locator('th:has-text("Serial")').count()).toBe(0); // hidden by default
  await page.click("[data-testid=column-chooser]");
  await page.locator('label:has-text("Serial") input').check();
  await page.keyboard.press("Escape");
  await page.locator('th:has-text("Serial")').waitFor();
  await page.reload();
  await page.locator("[data-testid=case-row]").first().waitFor();
  expect(await page.locator('th:has-text("Serial")').count()).toBe(1); // kept in this browser
  await ui.shot(page, `case-list-columns-desk`);

  await new CaseListPage(page).goto(`q=${TOKEN}-nothing-like-this`);
  await page.locator("[data-testid=case-empty]").waitFor();
  expect(await page.textContent("[data-testid=case-empty]")).toContain("No cases match these filters");
  await page.context().close();
}, 90_000);

test("on a phone the list is cards; a tap opens the case", async () => {
  const page = await ui.signIn("engineer", PHONE);
  await new CaseListPage(page).goto(`status=signoff&q=${TOKEN}`);
  const want = numbers((b) => b.status === "signoff");
  await poll(() => page.locator("[data-testid=case-card]").count()).toBe(want.length);
  expect(await page.locator("[data-testid=case-table]").isVisible()).toBe(false);
  const cardText = await page.locator("[data-testid=case-cards]").textContent();
  for (const n of want) expect(cardText).toContain(n);
  expect(cardText).toContain("Awaiting sign-off");
  await ui.shot(page, `case-list-cards-phone`);
  await page.click("text=Filters");
  await ui.shot(page, `case-list-filters-phone`, { fullPage: false });
  await page.locator("[data-testid=case-card]").first().click();
  await page.waitForURL(/\/cases\/TL-\d{2}-\d{5}$/);
  await page.context().close();
}, 90_000);
