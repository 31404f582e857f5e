// In Chromium: a case page lists its similar earlier cases with scores, reasons and the same
// part's photos side by side; an engineer links one as related and both cases list the link.
import { beforeAll, expect, test } from "vitest";
import { as } from "../support/api";
import { PHONE, DESK } from "../support/browser";
import { caseWith, markerWord, people } from "../api/search/casebook";
import { racewayJpeg } from "./similar-photos";
import { browserPerFile } from "../support/browser-fixture";
import { CasePage } from "../support/pages/case-page";

const ui = browserPerFile();

const marker = markerWord();
let target: { id: string; number: string }, twin: { id: string; number: string };
const photoIds: string[] = [];

async function uploadCupPhoto(caseId: string, stain: string) {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(await racewayJpeg(stain, 9))], { type: "image/jpeg" }), "cup.jpg");
  form.set("component", "cup");
  const res = await (await as("analyst")).request("POST", `/api/cases/${caseId}/photos`, form);
  expect(res.status).toBe(201);
  photoIds.push(((await res.json()) as { photo: { id: string } }).photo.id);
}

beforeAll(async () => {
  const p = await people();
  // Invented cases dated 1984-85, before any other test's, so the neighbours are known.
  const base = { siteId: p.mjc, bearingClass: "F", trigger: "wayside-hot", primaryCause: "water-ingress" };
  const water = [
    { component: "cup", damageCode: "corrosion.moisture", severity: 3 },
    { component: "lubricant", damageCode: "lubricant.water", severity: 2 },
  ];
  twin = await caseWith(marker, {
    ...base,
    removedOn: "1984-04-02",
    notes: "Grease milky with water; cup etched at roller spacing.",
    findings: water,
  });
  await caseWith(marker, {
    ...base,
    trigger: "hand-roll",
    bearingClass: "G",
    removedOn: "1984-05-02",
    notes: "Stain on the cone.",
    findings: [{ component: "cone-outboard", damageCode: "corrosion.moisture", severity: 2 }],
  });
  await caseWith(marker, {
    siteId: p.mjc,
    bearingClass: "E",
    trigger: "welding",
    primaryCause: "electrical",
    removedOn: "1984-06-02",
    notes: "Grey bands.",
    findings: [{ component: "rollers-inboard", damageCode: "electrical.fluting", severity: 3 }],
  });
  target = await caseWith(marker, {
    ...base,
    removedOn: "1985-02-11",
    notes: "Milky grease behind the inboard seal; water etch on the cup at roller spacing.",
    findings: water,
  });
  await uploadCupPhoto(target.id, "#5b3a1e");
  await uploadCupPhoto(twin.id, "#3f2a17");
});

test("an engineer sees the twin first with photos side by side, and links it as related", async () => {
  const page = await ui.signIn("engineer", DESK);
  await new CasePage(page).goto(target.number, "", "similar");
  await page.waitForSelector('[data-testid="similar-case"]');
  const first = page.locator('[data-testid="similar-case"]').first();
  expect(await first.textContent()).toContain(twin.number);
  expect(await first.locator('[data-kind="same-finding"]').count()).toBeGreaterThan(0);
  const compare = await first.locator('[data-testid="compare-photos"]').getAttribute("href");
  expect(compare).toBe(`/photos/compare?a=${photoIds[0]}&b=${photoIds[1]}`);
  await ui.shotOf(page.locator("#similar"), "similar-desktop");

  await first.locator('[data-testid="link-related"]').click();
  await first.locator('input[aria-label="Note on the link"]').fill("Same spring water run");
  await first.locator('button:has-text("Link")').first().click();
  await first.locator('[data-testid="linked-mark"]').waitFor();
  await page.waitForSelector(`[data-testid="related-case"]:has-text("${twin.number}")`);
  await ui.shotOf(page.locator("#similar"), "similar-linked-desktop");
  await page.context().close();
});

test("on a phone the twin's page lists the link back, and the target's list fits the screen", async () => {
  const page = await ui.signIn("engineer", PHONE);
  await new CasePage(page).goto(twin.number, "", "similar");
  await page.waitForSelector(`[data-testid="related-case"]:has-text("${target.number}")`);
  expect(await page.textContent('[data-testid="related-cases"]')).toContain("Same spring water run");
  await new CasePage(page).goto(target.number, "", "similar");
  await page.waitForSelector('[data-testid="similar-case"]');
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
  await ui.shotOf(page.locator("#similar"), "similar-phone");
  await page.context().close();
});
