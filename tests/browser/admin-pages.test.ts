// In Chromium: the admin pages and the code reference at phone and desk sizes. Each fits a phone screen,
// shows its own content and works; screenshots go to the shots folder for review.
import { randomBytes } from "node:crypto";
import { expect, test } from "vitest";
import type { Page } from "playwright-core";
import { as } from "../support/api";
import { DESK, PHONE } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";

const ui = browserPerFile();

const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 20_000, interval: 100 });
const fitsWidth = (page: Page, width: number) => page.evaluate((w) => document.documentElement.scrollWidth <= w, width);

const PAGES = [
  { path: "/admin/users", heading: "People", shows: "Invite someone" },
  { path: "/admin/sites", heading: "Sites & limits", shows: "1/16 in (0.0625 in, 1.5875 mm)" },
  { path: "/admin/codes", heading: "Code lists", shows: "fatigue.subsurface" },
  { path: "/admin/codes?list=cause", heading: "Code lists", shows: "water-ingress" },
  { path: "/reference", heading: "Damage codes", shows: "ISO 15243:2017 clause" },
];

for (const [label, viewport] of [
  ["phone", PHONE],
  ["desk", DESK],
] as const) {
  test(`admin pages and the reference at ${label} size`, async () => {
    const page = await ui.signIn("admin", viewport);
    for (const p of PAGES) {
      await page.goto(p.path);
      await poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe(p.heading);
      const text = await page.locator("main").innerText();
      expect(text.includes(p.shows), `${p.path} should show "${p.shows}"`).toBe(true);
      expect(await fitsWidth(page, viewport.width), `${p.path} is wider than the screen`).toBe(true);
      await ui.shot(page, `admin${p.path.replace(/[/?=]/g, "_")}-${label}`);
    }
    await page.context().close();
  }, 120_000);
}

test("the reference finds a code from a misspelt shop word, on a phone", async () => {
  const page = await ui.signIn("inspector", PHONE);
  await page.goto("/reference");
  await page.fill("input[type=search]", "spaling");
  await poll(() => page.locator("[data-testid^=ref-damage-]").first().getAttribute("data-testid")).toBe("ref-damage-fatigue.subsurface");
  await ui.shot(page, `reference-search-phone`);
  await page.context().close();
}, 60_000);

test("changing a site's limit in millimetres shows inches as you type, and refuses more than 1/4 in", async () => {
  const code = `B${randomBytes(3).toString("hex").toUpperCase()}`;
  const made = await (
    await as("admin")
  ).json("POST", "/api/admin/sites", { code, name: `Browser yard ${code}`, kind: "wheel-shop", railway: "Sable River Rail" });
  expect(made.status).toBe(201);
  const page = await ui.signIn("admin", PHONE);
  await page.goto("/admin/sites");
  const card = page.getByTestId(`site-${code}`);
  await card.getByRole("button", { name: "Edit" }).click();
  await card.getByRole("radio", { name: "mm" }).click();
  const limit = card.getByLabel("Remove when end play is more than");
  // 1/16 in shown as 1.5875 mm (1 in = 25.4 mm exactly, NIST SP 811; from memory)
  await poll(() => limit.inputValue()).toBe("1.5875");
  await limit.fill("7");
  await poll(() => card.getByTestId("endPlayMaxIn-other-unit").textContent()).toBe("= 0.27559 in"); // 7 / 25.4 (arithmetic)
  await card.getByRole("button", { name: "Save changes" }).click();
  await poll(() => card.textContent()).toContain("at most 0.25 in");
  await ui.shot(page, `site-limit-refused-phone`);
  await page.context().close();
}, 60_000);
