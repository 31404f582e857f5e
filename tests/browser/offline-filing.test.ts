// In Chromium on a phone: the removal form opens with the network switched off, a report filed offline
// waits in the device outbox, and when the connection returns it is filed exactly once.
import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Browser } from "playwright-core";
import { db, t } from "../support/db";
import { launch, PHONE, signedInPage } from "../support/browser";

let browser: Browser;
const car = String(400000 + Math.floor(Math.random() * 99999));

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

test("file a report offline, reload offline, come back online and find it filed once", async () => {
  const page = await signedInPage(browser, "inspector", PHONE);
  const context = page.context();
  await page.goto("/cases/new");
  await page.evaluate(async () => {
    localStorage.clear();
    await navigator.serviceWorker.ready;
  });
  // A second visit under the worker's control leaves the form in the device's cache.
  await page.reload();
  await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller)).toBe(true);

  await context.setOffline(true);
  await page.reload();
  await page.waitForSelector("#carMark");
  await expect.poll(() => page.getAttribute('[data-testid="outbox"]', "data-online")).toBe("false");
  // The worker built from lib/offline/service-worker.ts keeps pages and built assets in their own caches.
  expect(await page.evaluate(() => caches.keys())).toEqual(expect.arrayContaining(["tearline-pages-v2", "tearline-assets-v2"]));

  await page.fill("#carMark", "brwx");
  await page.fill("#carNumber", car);
  await page.click('[aria-label$="Axle 2 right"]');
  await page.selectOption("#trigger", "end-play-high");
  await page.fill("#detail-endPlayIn", "0.07");
  await page.fill("#serial", `OFF${car}`);
  await page.selectOption("#bearingClass", "F");
  await page.fill('[aria-label="Trial 1 reading"]', "0.071");
  const fileButton = page.locator("text=File removal report");
  await fileButton.dblclick();
  await page.waitForSelector('[data-testid="queued"]');
  await expect.poll(() => page.textContent('[data-testid="outbox"]')).toContain("1 report waiting to send");
  await page.screenshot({ path: "/tmp/shots/e2e-offline-queued-phone.png", fullPage: true });
  expect(await filedFor(car)).toBe(0);

  await context.setOffline(false);
  await expect.poll(() => page.textContent('[data-testid="outbox"]'), { timeout: 20_000 }).toContain("is filed");
  await page.waitForSelector('[data-testid="queued-sent"]');
  await page.screenshot({ path: "/tmp/shots/e2e-offline-sent-phone.png", fullPage: true });
  expect(await filedFor(car)).toBe(1);

  // A reload online finds nothing left to send, and nothing is filed twice.
  await page.reload();
  await page.waitForTimeout(1500);
  expect(await filedFor(car)).toBe(1);
  await context.close();
});

async function filedFor(carNumber: string) {
  return (await db.select({ n: count() }).from(t.cases).where(eq(t.cases.carNumber, carNumber)))[0].n;
}
