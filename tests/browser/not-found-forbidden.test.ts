// In Chromium: an unknown address, an unknown case number and a page outside one's role each show
// Tearline's own page (not the framework's bare one) with a way back that works, on a phone and a desk.
import { expect, test } from "vitest";
import { DESK, PHONE } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";

const ui = browserPerFile();

for (const [label, viewport] of [
  ["phone", PHONE],
  ["desk", DESK],
] as const) {
  test(`an unknown address and an unknown case number show the branded not-found page with a way back (${label})`, async () => {
    const page = await ui.signIn("engineer", viewport);
    for (const path of ["/no-such-page-here", "/cases/TL-99-99999"]) {
      const res = await page.goto(path);
      expect(res?.status()).toBe(404);
      await expect.poll(() => page.locator("h1").first().textContent()).toBe("There is no page at this address");
      expect(await page.textContent("body")).not.toContain("This page could not be found");
      await ui.shot(page, `e2e-not-found${path.replace(/\//g, "_")}-${label}`, { fullPage: false });
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
    const page = await ui.signIn("inspector", viewport);
    await page.goto("/admin/sites");
    await page.waitForURL((u) => u.pathname === "/forbidden");
    expect(await page.locator("h1").first().textContent()).toBe("This page is not open to your role");
    // Nothing of the admin page leaked into what the inspector sees.
    expect(await page.textContent("body")).not.toContain("Sites & limits");
    await ui.shot(page, `e2e-forbidden-${label}`, { fullPage: false });
    await page.getByRole("link", { name: "Back to your home page" }).click();
    await page.waitForURL((u) => u.pathname === "/");
    await page.locator("main h1").first().waitFor();
    await page.context().close();
  });
}
