// A page whose render fails partway (here: the case page's statement runs past the server's statement
// timeout because another session holds a lock on cases, while the database itself still answers)
// ends quickly with a 500 and, in the browser, Tearline's own "could not be loaded" page with a way
// to try again, not the framework's bare error; once the lock is gone "Try again" renders the case.
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack, waitUntil } from "../../support/stack";
import { browserPerFile } from "../../support/browser-fixture";
import { DESK, PHONE } from "../../support/browser";
import type { ApiClient } from "../../support/api";

const stack = new Stack("render-failure", { PG_STATEMENT_TIMEOUT_MS: "1500" });
const ui = browserPerFile();
let manager: ApiClient;
let casePath = "";

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(1);
  manager = await stack.client("manager");
  const [{ number }] = await stack.query<{ number: string }>("select number from cases order by number limit 1");
  casePath = `/cases/${number}`;
}, 240_000);

afterAll(() => stack.stop(), 60_000);

/** Holds an exclusive lock on cases for as long as `work` runs. */
async function withCasesLocked<T>(work: () => Promise<T>): Promise<T> {
  const holder = new pg.Client({ connectionString: stack.databaseUrl });
  await holder.connect();
  try {
    await holder.query("begin");
    await holder.query("lock table cases in access exclusive mode");
    return await work();
  } finally {
    await holder.query("rollback").catch(() => undefined);
    await holder.end();
  }
}

describe.skipIf(!servicesRunning)("a page that fails while rendering", () => {
  it("answers quickly with a 500, never a hang", async () => {
    expect((await manager.get(casePath)).status).toBe(200);
    await withCasesLocked(async () => {
      const started = Date.now();
      const res = await manager.get(casePath);
      await res.text();
      expect(res.status).toBe(500);
      expect(Date.now() - started).toBeLessThan(15_000);
    });
    expect(stack.appAlive()).toBe(true);
  }, 60_000);

  for (const [name, viewport] of [
    ["desk", DESK],
    ["phone", PHONE],
  ] as const) {
    it(`shows our own page with a way back on a ${name}, and the case again after "Try again"`, async () => {
      const page = await ui.signIn("manager", viewport, { baseURL: stack.appUrl() });
      await withCasesLocked(async () => {
        await page.goto(casePath);
        await page.getByRole("heading", { name: "This page could not be loaded" }).waitFor({ timeout: 20_000 });
        expect(await page.getByRole("link", { name: "Back to your home page" }).getAttribute("href")).toBe("/");
        expect(await page.getByText(/Application error|Internal Server Error/i).count()).toBe(0);
        await ui.shot(page, `render-failure-${name}`);
      });
      await waitUntil("the case page answers again", async () => (await manager.get(casePath)).status === 200, 30);
      await page.getByRole("button", { name: "Try again" }).click();
      await page.waitForURL((u) => u.pathname === casePath);
      await page.getByRole("heading", { name: "This page could not be loaded" }).waitFor({ state: "detached", timeout: 20_000 });
      expect(await page.locator("h1").first().textContent()).toContain(casePath.split("/").pop());
      await page.context().close();
    }, 90_000);
  }
});
