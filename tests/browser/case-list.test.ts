// In Chromium: the case list read from a link, sorted by a header, filtered, searched, columns
// chosen, and shown as cards on a phone. Screenshots go to /tmp/shots for review.
import { mkdirSync } from "node:fs";
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launch, PHONE, DESK, signedInPage } from "../support/browser";
import { buildCasebook, removeCasebook, TOKEN, type Built } from "../api/cases/list-fixture";

let browser: Browser;
let book: Built[] = [];
const SHOTS = "/tmp/shots";

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  book = await buildCasebook();
  browser = await launch();
}, 90_000);
afterAll(async () => {
  await browser?.close();
  await removeCasebook(book);
}, 90_000);

// The list loads in the browser after the page: give each check time on a busy machine.
const poll = <T,>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 20_000, interval: 100 });
const rowNumbers = (page: Page) => page.locator("[data-testid=case-row] td:first-child").allTextContents();
const sorted = (xs: string[]) => [...xs].sort();
const numbers = (keep: (b: Built) => boolean) => book.filter(keep).map((b) => b.number);

test("an engineer opens a shared link, sorts by a header and adds a filter", async () => {
  const page = await signedInPage(browser, "engineer", DESK);
  await page.goto(`/cases?status=signed&q=${TOKEN}`);
  const signed = numbers((b) => b.status === "signed");
  await poll(async () => sorted(await rowNumbers(page))).toEqual(sorted(signed));
  expect(await page.getAttribute("[data-testid=stage-signed]", "aria-pressed")).toBe("true");
  expect(await page.inputValue("[data-testid=case-search]")).toBe(TOKEN);

  // A date column starts newest first; a second click turns it round.
  const header = page.locator('th:has(button:has-text("Removed on"))');
  await header.locator("button").click();
  await page.waitForURL(/sort=removedOn:desc/);
  await poll(() => header.getAttribute("aria-sort")).toBe("descending");
  const newestFirst = book.filter((b) => b.status === "signed").sort((a, b) => (a.removedOn! < b.removedOn! ? 1 : -1)).map((b) => b.number);
  await poll(() => rowNumbers(page)).toEqual(newestFirst);
  await header.locator("button").click();
  await page.waitForURL(/sort=removedOn:asc/);
  await poll(() => header.getAttribute("aria-sort")).toBe("ascending");
  await poll(() => rowNumbers(page)).toEqual([...newestFirst].reverse());
  expect(await page.getAttribute('th:has(button:has-text("Car"))', "aria-sort")).toBe("none");

  await page.click("[data-testid=filter-trigger]");
  await page.locator('label:has-text("Wayside hot-bearing alarm") input').check();
  await page.waitForURL(/trigger=wayside-hot/);
  const hotSigned = numbers((b) => b.status === "signed" && b.trigger === "wayside-hot");
  await poll(async () => sorted(await rowNumbers(page))).toEqual(sorted(hotSigned));
  await page.keyboard.press("Escape");
  expect(await page.textContent("[data-testid=case-count]")).toContain(`${hotSigned.length} cases match`);

  // The export link carries the same filters and sort, without the page.
  const href = await page.getAttribute("[data-testid=export-csv]", "href");
  expect(href).toContain("status=signed");
  expect(href).toContain("trigger=wayside-hot");
  expect(href).toContain("sort=removedOn:asc");
  await page.screenshot({ path: `${SHOTS}/case-list-filtered-desk.png` });

  // The back button goes back to the unfiltered state.
  await page.goBack();
  await poll(async () => (await rowNumbers(page)).length).toBe(signed.length);
  await page.context().close();
}, 90_000);

test("searching, paging and choosing columns", async () => {
  const page = await signedInPage(browser, "engineer", DESK);
  await page.goto("/cases?pageSize=10");
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
  await page.screenshot({ path: `${SHOTS}/case-list-columns-desk.png`, fullPage: true });

  await page.goto(`/cases?q=${TOKEN}-nothing-like-this`);
  await page.locator("[data-testid=case-empty]").waitFor();
  expect(await page.textContent("[data-testid=case-empty]")).toContain("No cases match these filters");
  await page.context().close();
}, 90_000);

test("on a phone the list is cards; a tap opens the case", async () => {
  const page = await signedInPage(browser, "engineer", PHONE);
  await page.goto(`/cases?status=signoff&q=${TOKEN}`);
  const want = numbers((b) => b.status === "signoff");
  await poll(() => page.locator("[data-testid=case-card]").count()).toBe(want.length);
  expect(await page.locator("[data-testid=case-table]").isVisible()).toBe(false);
  const cardText = await page.locator("[data-testid=case-cards]").textContent();
  for (const n of want) expect(cardText).toContain(n);
  expect(cardText).toContain("Awaiting sign-off");
  await page.screenshot({ path: `${SHOTS}/case-list-cards-phone.png`, fullPage: true });
  await page.click("text=Filters");
  await page.screenshot({ path: `${SHOTS}/case-list-filters-phone.png` });
  await page.locator("[data-testid=case-card]").first().click();
  await page.waitForURL(/\/cases\/TL-\d{2}-\d{5}$/);
  await page.context().close();
}, 90_000);
