// In Chromium: a call to the API that gets no answer ends, after the client's time limit, in a
// message in the words of the screen - never a button stuck on "Saving…". The page lowers the limit
// (window.tearlineClientTimeoutMs, read by lib/client/api-problem.ts) so the held request is not a slow test.
import { randomBytes } from "node:crypto";
import { expect, test } from "vitest";
import type { Route } from "playwright-core";
import { as } from "../support/api";
import { PHONE } from "../support/browser";
import { browserPerFile } from "../support/browser-fixture";
import { pool } from "../support/db";
import { TIMEOUT_MESSAGE } from "@/lib/client/api-problem";

const ui = browserPerFile();
const LIMIT_MS = 1_500;

test("a save the server never answers ends in the timeout message, the form usable again and nothing changed", async () => {
  const code = `N${randomBytes(3).toString("hex").toUpperCase()}`;
  const made = await (
    await as("admin")
  ).json("POST", "/api/admin/sites", { code, name: `Quiet yard ${code}`, kind: "wheel-shop", railway: "Sable River Rail" });
  expect(made.status).toBe(201);

  const page = await ui.signIn("admin", PHONE);
  await page.addInitScript((ms) => Object.assign(window, { tearlineClientTimeoutMs: ms }), LIMIT_MS);
  // Every save of a site is held: the request leaves the browser and no answer ever comes back.
  const held: Route[] = [];
  await page.route("**/api/admin/sites/*", (route) => {
    if (route.request().method() === "PATCH") held.push(route);
    else void route.continue();
  });

  await page.goto("/admin/sites");
  const card = page.getByTestId(`site-${code}`);
  await card.getByRole("button", { name: "Edit" }).click();
  await card.getByLabel("Remove when end play is more than").fill("0.05");
  await card.getByRole("button", { name: "Save changes" }).click();
  await expect.poll(() => card.getByRole("button", { name: "Saving…" }).count()).toBe(1);
  await expect.poll(() => held.length).toBe(1);

  await expect.poll(() => card.getByRole("status").first().textContent(), { timeout: 15_000 }).toBe(TIMEOUT_MESSAGE);
  expect(await card.getByRole("button", { name: "Save changes" }).isEnabled()).toBe(true);
  await ui.shot(page, "no-answer-site-save-phone", { fullPage: false });

  // The held request never reached the server: the site keeps its limit (schema default 1/16 in).
  const { rows } = await pool.query<{ end_play_max_in: string }>("SELECT end_play_max_in FROM sites WHERE code = $1", [code]);
  expect(Number(rows[0].end_play_max_in)).toBe(0.0625);
  await Promise.all(held.map((r) => r.abort().catch(() => undefined)));
  await page.context().close();
}, 60_000);
