// A page whose render fails partway (here: the case list's statement runs past the server's statement
// timeout because another session holds a lock on cases, while the database itself still answers) is
// shown as Tearline's own "could not be loaded" page with a way to try again, not the framework's bare
// error page; once the lock is gone the same address renders again.
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack, waitUntil } from "../../support/stack";
import type { ApiClient } from "../../support/api";

const stack = new Stack("render-failure", { PG_STATEMENT_TIMEOUT_MS: "1500" });
let inspector: ApiClient;

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(1);
  inspector = await stack.client("inspector");
}, 240_000);

afterAll(() => stack.stop(), 60_000);

describe.skipIf(!servicesRunning)("a page that fails while rendering", () => {
  it("shows our own page with a reference and a way back, and renders again afterwards", async () => {
    expect((await inspector.get("/cases")).status).toBe(200);
    const holder = new pg.Client({ connectionString: stack.databaseUrl });
    await holder.connect();
    try {
      await holder.query("begin");
      await holder.query("lock table cases in access exclusive mode");
      const res = await inspector.get("/cases");
      const html = await res.text();
      const where = `GET /cases under a held lock: ${res.status} ${html.slice(0, 400)}`;
      expect(res.status, where).toBeGreaterThanOrEqual(500);
      expect(html, where).toContain("This page could not be loaded");
      expect(html, where).toContain("Back to your home page");
      expect(html, where).not.toMatch(/Internal Server Error|Application error: a server-side exception/i);
    } finally {
      await holder.query("rollback").catch(() => undefined);
      await holder.end();
    }
    expect(stack.appAlive()).toBe(true);
    await waitUntil("the case list rendered again", async () => (await inspector.get("/cases")).status === 200, 30);
  }, 120_000);
});
