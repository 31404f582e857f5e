// On a phone every control on the main screens is big enough for a gloved finger: at least 44 x 44 CSS px
// (WCAG 2.2, 2.5.5 Target Size (Enhanced); links inside a sentence are exempt as that criterion allows,
// see tests/support/touch-targets.ts).
import { afterAll, beforeAll, expect, test } from "vitest";
import { mkdirSync } from "node:fs";
import type { Browser, Page } from "playwright-core";
import { launch, PHONE, signedInPage } from "../support/browser";
import { pool } from "../support/db";
import { smallTouchTargets, type SmallTarget } from "../support/touch-targets";

let browser: Browser;
beforeAll(async () => {
  mkdirSync("/tmp/shots", { recursive: true });
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

async function check(page: Page, path: string, ready: string, found: Record<string, SmallTarget[]>) {
  await page.goto(path);
  await page.locator(ready).first().waitFor();
  found[path] = await smallTouchTargets(page);
  await page.screenshot({ path: `/tmp/shots/targets${path.replace(/[/?=&+]/g, "_")}-phone.png`, fullPage: true });
}

test("every control on the list, a case, search and tallies is at least 44 x 44 px on a phone", async () => {
  const found: Record<string, SmallTarget[]> = {};
  // The analyst works the bench: on a case in teardown with photos the teardown and verdict forms,
  // the photo viewer and its tag fields are all on screen to be walked.
  const { rows } = await pool.query<{ number: string }>(
    "SELECT c.number FROM cases c WHERE c.status = 'bench' AND EXISTS (SELECT 1 FROM photos p WHERE p.case_id = c.id) ORDER BY c.number LIMIT 1",
  );
  const bench = `/cases/${rows[0].number}`;
  const analyst = await signedInPage(browser, "analyst", PHONE);
  await check(analyst, "/cases", "main a[href^='/cases/TL-']:visible", found);
  await check(analyst, bench, '[data-testid="photo-tile"]', found);
  await analyst.locator('[data-testid="photo-tile"]').first().click();
  await analyst.locator('[data-testid="lightbox"]').waitFor();
  found["photo viewer"] = await smallTouchTargets(analyst, '[data-testid="lightbox"]');
  const details = analyst.getByRole("button", { name: /details/i });
  if (await details.count()) await details.first().click();
  await analyst.getByRole("button", { name: "Edit tags" }).click();
  found["photo tags"] = await smallTouchTargets(analyst, '[data-testid="lightbox"]');
  await analyst.screenshot({ path: "/tmp/shots/targets-photo-tags-phone.png" });
  await analyst.context().close();

  const engineer = await signedInPage(browser, "engineer", PHONE);
  await check(engineer, "/search?q=spall+cup", '[data-testid="search-hit"]', found);
  await check(engineer, "/tallies", "main h1", found);
  await check(engineer, "/tallies/life", "main h1", found);
  await engineer.context().close();

  const inspector = await signedInPage(browser, "inspector", PHONE);
  await check(inspector, "/cases/new", "#trigger", found);
  await inspector.context().close();

  const empty = Object.fromEntries(Object.keys(found).map((k) => [k, []]));
  expect(found).toEqual(empty);
}, 150_000);
