// In Chromium: the printable report (draft mark, print layout), the Notices switches and the outbox,
// at phone and desk sizes. Screenshots go to the shots folder (tests/support/browser-fixture.ts) for review.
import { randomUUID } from "node:crypto";
import { writeFileSync } from "node:fs";
import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import { expect, test } from "vitest";
import type { Page } from "playwright-core";
import { APP_URL } from "../support/env";
import { DESK, PHONE } from "../support/browser";
import { db, t } from "../support/db";
import { createCase } from "../support/factories";
import { pdfPageCount, pdfPages } from "../support/pdf-text";
import { SHOTS, browserPerFile } from "../support/browser-fixture";
import { CasePage } from "../support/pages/case-page";

const ui = browserPerFile();

const fitsWidth = (page: Page, width: number) => page.evaluate((w) => document.documentElement.scrollWidth <= w, width);

test("a draft report shows its mark on screen and prints with numbered pages and no app chrome", async () => {
  const c = await createCase({
    status: "bench",
    findings: [{ component: "cup", damageCode: "corrosion.moisture", severity: 3, clockDeg: 30, arcDeg: 50 }],
  });
  for (const [label, viewport] of [
    ["phone", PHONE],
    ["desk", DESK],
  ] as const) {
    const page = await ui.signIn("analyst", viewport);
    await new CasePage(page).goto(c.number, "report");
    await expect.poll(() => page.locator(".tl-watermark").innerText()).toBe("DRAFT — NOT SIGNED");
    expect(await page.locator("article.tl-report").getAttribute("data-revision")).toBe("draft");
    expect(await fitsWidth(page, viewport.width), "the report is wider than the screen").toBe(true);
    await ui.shot(page, `report-draft-${label}`);
    // Scrolled well down, the mark is still in view.
    await page.evaluate(() => window.scrollTo(0, 1600));
    await expect
      .poll(async () => {
        const box = await page.locator(".tl-watermark").boundingBox();
        return box !== null && box.y > 0 && box.y < viewport.height;
      })
      .toBe(true);
    await ui.shot(page, `report-draft-${label}-scrolled`, { fullPage: false });
    if (label === "desk") {
      const pdf = await page.pdf({ format: "Letter", printBackground: true });
      writeFileSync(`${SHOTS}/report-draft-print.pdf`, pdf);
      const pages = pdfPages(pdf);
      expect(pages).toHaveLength(pdfPageCount(pdf));
      // The print stylesheet hides the navigation and numbers every page in its margin.
      expect(pages[0]).not.toContain("Damage codes");
      pages.forEach((p, i) => expect(p).toContain(`${c.number} · page ${i + 1} of ${pages.length}`));
    }
    await page.context().close();
  }
}, 120_000);

test("a person switches a notice off on the Notices page and it stays off", async () => {
  const id = randomUUID();
  const email = `notices-${id.slice(0, 8)}@sable-river.example`;
  const password = `pw-${randomUUID()}`;
  await db.insert(t.user).values({ id, name: "Hana Kowalczyk", email, emailVerified: true, role: "analyst" });
  await db
    .insert(t.account)
    .values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(password) });

  const ctx = await ui.browser.newContext({ viewport: PHONE, baseURL: APP_URL });
  const page = await ctx.newPage();
  await page.goto("/sign-in");
  await page.fill("#email", email);
  await page.fill("#password", password);
  await Promise.all([page.waitForURL((u) => !u.pathname.startsWith("/sign-in")), page.click("button[type=submit]")]);
  await page.goto("/profile");
  const toggle = page.getByRole("switch", { name: /Verdict returned to the bench/ });
  await expect.poll(() => toggle.getAttribute("aria-checked")).toBe("true");
  await toggle.click();
  await expect.poll(() => page.getByRole("status").innerText()).toContain("switched off");
  await ui.shot(page, `profile-notices-phone`);
  const [row] = await db.select({ prefs: t.user.noticePrefs }).from(t.user).where(eq(t.user.id, id));
  expect(row.prefs).toEqual({ "verdict-returned": false });
  await page.reload();
  await expect.poll(() => page.getByRole("switch", { name: /Verdict returned to the bench/ }).getAttribute("aria-checked")).toBe("false");
  // Engineers' sign-off notice is not offered to an analyst.
  expect(await page.getByRole("switch", { name: /waiting for sign-off/ }).count()).toBe(0);
  await ctx.close();
}, 60_000);

test("the outbox lists mail with its status and shows what the mail fake received", async () => {
  for (const [label, viewport] of [
    ["phone", PHONE],
    ["desk", DESK],
  ] as const) {
    const page = await ui.signIn("admin", viewport);
    await page.goto("/admin/outbox");
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Outbox");
    await expect.poll(() => page.getByText("Test mailbox: mail caught on this installation, never delivered").count()).toBe(1);
    expect(await fitsWidth(page, viewport.width), "the outbox is wider than the screen").toBe(true);
    await ui.shot(page, `admin-outbox-${label}`);
    await page.context().close();
  }
}, 60_000);
