// In Chromium: an unknown address, an unknown case number and a page outside one's role each show
// Tearline's own page (not the framework's bare one) with a way back that works, on a phone and a desk.
import { afterAll, beforeAll, expect, test } from "vitest";
import { mkdirSync } from "node:fs";
import type { Browser } from "playwright-core";
import { DESK, launch, PHONE, signedInPage } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  mkdirSync("/tmp/shots", { recursive: true });
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

for (const [label, viewport] of [["phone", PHONE], ["desk", DESK]] as const) {
  test(`an unknown address and an unknown case number show the branded not-found page with a way back (${label})`, async () => {
    const page = await signedInPage(browser, "engineer", viewport);
    for (const path of ["/no-such-page-here", "/cases/TL-99-99999"]) {
      const res = await page.goto(path);
      expect(res?.status()).toBe(404);
      await expect.poll(() => page.locator("h1").first().textContent()).toBe("There is no page at this address");
      expect(await page.textContent("body")).not.toContain("This page could not be found");
      await page.screenshot({ path: `/tmp/shots/e2e-not-found${path.replace(/\//g, "_")}-${label}.png` });
    }
    await page.getByRole("link", { name: "Open the case list" }).click();
    await page.waitForURL((u) => u.pathname === "/cases");
    await page.goto("/no-such-page-here");
    await page.getByRole("link", { name: "Back to your home page" }).click();
    await page.waitForURL((u) => u.pathname === "/");
    await page.locator("main h1").first().waitFor();
    await page.context().close();
  });

  test(`a role opening an admin page sees the branded forbidden page with a way back (${label})`, async () => {
    const page = await signedInPage(browser, "inspector", viewport);
    await page.goto("/admin/sites");
    await page.waitForURL((u) => u.pathname === "/forbidden");
    expect(await page.locator("h1").first().textContent()).toBe("This page is not open to your role");
    // Nothing of the admin page leaked into what the inspector sees.
    expect(await page.textContent("body")).not.toContain("Sites & limits");
    await page.screenshot({ path: `/tmp/shots/e2e-forbidden-${label}.png` });
    await page.getByRole("link", { name: "Back to your home page" }).click();
    await page.waitForURL((u) => u.pathname === "/");
    await page.locator("main h1").first().waitFor();
    await page.context().close();
  });
}
