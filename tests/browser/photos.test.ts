// In Chromium: an analyst drops several photos on a case, watches them upload, opens the lightbox,
// steps through with the keyboard, and puts one beside a photo of another case; then the phone view.
import { beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, DESK } from "../support/browser";
import { eq } from "drizzle-orm";
import { as } from "../support/api";
import { db, t } from "../support/db";
import { createCase } from "../support/factories";
import { racewayJpeg, textAsJpeg } from "../support/photo-files";
import { upload } from "../api/photos/helpers";
import { browserPerFile } from "../support/browser-fixture";
import { CasePage } from "../support/pages/case-page";

const ui = browserPerFile();

let caseNumber = "";
let caseId = "";
let otherPhotoId = "";
let otherNumber = "";

beforeAll(async () => {
  const c = await createCase({
    status: "bench",
    findings: [{ component: "cup", row: "inboard", damageCode: "fatigue.subsurface", severity: 3, clockDeg: 90 }],
  });
  caseNumber = c.number;
  caseId = c.id;
  // A similar case with a photo already on it, for the side-by-side view.
  const other = await createCase({ status: "bench", findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 3 }] });
  const res = await upload(await as("analyst"), other.id, await racewayJpeg(40, { width: 1200, height: 900 }), "similar-spall.jpg", {
    component: "cup",
    row: "outboard",
    clockDeg: "60",
    caption: "Spall near the outboard rib",
  });
  otherPhotoId = res.body.photo!.id;
  otherNumber = other.number;
  await db.update(t.cases).set({ status: "signed", signedAt: new Date() }).where(eq(t.cases.id, other.id));
});

async function thumbsLoaded(page: Page) {
  return page.$$eval('[data-testid="photo-tile"] img', (imgs) =>
    imgs.every((i) => (i as HTMLImageElement).complete && (i as HTMLImageElement).naturalWidth > 0),
  );
}

test("drop several photos, see each one's progress and result, then open the lightbox", async () => {
  const page = await ui.signIn("analyst", DESK);
  await new CasePage(page).goto(caseNumber, "photos");
  await expect.poll(() => page.textContent("h1")).toContain(`All photos of ${caseNumber}`);

  // Tags chosen before the drop go with every file of the batch.
  await page.click("text=Tags for the next photos");
  await page.selectOption('select[id$="-part"]', "cup");
  await page.selectOption('select[id$="-row"]', "inboard");
  const files = await Promise.all(
    [1, 2, 3].map(async (i) => ({
      name: `cup-raceway-${i}.jpg`,
      mimeType: "image/jpeg",
      buffer: await racewayJpeg(i, { width: 1200, height: 900 }),
    })),
  );
  files.push({ name: "notes.jpg", mimeType: "image/jpeg", buffer: textAsJpeg() });
  await page.setInputFiles('[data-testid="photo-drop-input"]', files);

  await expect.poll(() => page.locator('[data-testid="upload-item"][data-status="done"]').count(), { timeout: 30_000 }).toBe(3);
  const failed = page.locator('[data-testid="upload-item"][data-status="failed"]');
  await expect.poll(() => failed.count()).toBe(1);
  expect(await failed.textContent()).toMatch(/not a photo: its content is plain text/);
  await expect.poll(() => page.locator('[data-testid="photo-tile"]').count()).toBe(3);
  await expect.poll(() => thumbsLoaded(page)).toBe(true);
  expect(await page.locator('section[aria-label="Cup"]').count()).toBe(1);
  await ui.shot(page, "photos-desk");

  // Retrying the refused file asks the server again and gets the same clear answer.
  await page.click('[aria-label="Retry notes.jpg"]');
  await expect.poll(() => failed.count()).toBe(1);

  await page.locator('[data-testid="photo-tile"]').first().click();
  const box = page.locator('[data-testid="lightbox"]');
  await box.waitFor();
  const first = await page.getAttribute('[data-testid="lightbox-image"]', "src");
  await expect.poll(() => page.$eval('[data-testid="lightbox-image"]', (i) => (i as HTMLImageElement).naturalWidth)).toBe(1200);
  expect(await box.getAttribute("aria-label")).toMatch(/^Photo 1 of 3: Cup, inboard row/);
  await ui.shot(page, "photos-lightbox-desk", { fullPage: false });

  await page.keyboard.press("ArrowRight");
  await expect.poll(() => page.getAttribute('[data-testid="lightbox-image"]', "src")).not.toBe(first);
  expect(await box.getAttribute("aria-label")).toMatch(/^Photo 2 of 3/);

  // Click zooms at the point; a second click returns to fit.
  const img = page.locator('[data-testid="lightbox-image"]');
  await page.mouse.click(500, 400);
  await expect.poll(() => img.evaluate((el) => (el as HTMLElement).style.transform)).toContain("scale(2.5)");
  await page.mouse.click(500, 400);
  await expect.poll(() => img.evaluate((el) => (el as HTMLElement).style.transform)).toContain("scale(1)");

  // Tag editing in the lightbox: a caption and the finding.
  await page.click("text=Edit tags");
  await page.fill('textarea[id$="-caption"]', "Spall in the load zone, inboard raceway");
  await page.selectOption('[data-testid="lightbox"] select[id$="-finding"]', { index: 1 });
  await page.click("text=Save tags");
  await expect.poll(() => box.textContent()).toContain("Spall in the load zone, inboard raceway");

  await page.keyboard.press("Escape");
  await expect.poll(() => box.count()).toBe(0);
  await page.context().close();
});

test("compare a photo of this case with a similar case's photo", async () => {
  const page = await ui.signIn("engineer", DESK);
  const res = await (await as("engineer")).json<{ photos: { id: string }[] }>("GET", `/api/cases/${caseId}/photos`);
  const mine = res.body.photos[0].id;
  await page.goto(`/photos/compare?a=${mine}`);
  await page.waitForSelector('section[aria-label="Choose photo B"]');
  // Photo B from another case, found by its number.
  await page.fill('input[name="case"]', otherNumber);
  await page.click("text=Show photos");
  await page.waitForSelector('[data-testid="pick-photo"]');
  await ui.shot(page, "photos-compare-pick-desk");
  await page.locator(`a[href$="b=${otherPhotoId}"]`).click();
  await page.waitForURL(/b=/);
  await page.waitForSelector('[data-testid="compare-B"]');
  expect(await page.textContent('[data-testid="compare-B"]')).toContain("Spall near the outboard rib");
  await expect
    .poll(() => page.$$eval('[data-testid^="compare-"] img', (imgs) => imgs.every((i) => (i as HTMLImageElement).naturalWidth > 0)))
    .toBe(true);
  await ui.shot(page, "photos-compare-desk");
  await page.context().close();
});

test("on a phone: the camera button, the grid and the lightbox fit 390 px", async () => {
  const page = await ui.signIn("analyst", PHONE);
  await new CasePage(page).goto(caseNumber, "photos");
  await page.waitForSelector('[data-testid="photo-tile"]');
  expect(await page.isVisible("text=Take photo")).toBe(true);
  expect(await page.getAttribute('[data-testid="photo-camera-input"]', "capture")).toBe("environment");
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await expect.poll(() => thumbsLoaded(page)).toBe(true);
  await ui.shot(page, "photos-phone");
  await page.locator('[data-testid="photo-tile"]').nth(1).click();
  await page.locator('[data-testid="lightbox"]').waitFor();
  await expect.poll(() => page.$eval('[data-testid="lightbox-image"]', (i) => (i as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
  await ui.shot(page, "photos-lightbox-phone", { fullPage: false });
  await page.context().close();
});
