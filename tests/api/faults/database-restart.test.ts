// PostgreSQL stopped and started again under a running app server: while it is away every request
// gets a quick 503 with a plain message (no hang, no 500), the server keeps running, and once the
// database is back the same server answers and saves again without being restarted.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack, waitUntil } from "../../support/stack";
import type { ApiClient } from "../../support/api";
import { fieldReport } from "../cases/fixtures";

const stack = new Stack("db-restart");
let inspector: ApiClient;

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(1);
  inspector = await stack.client("inspector");
}, 240_000);

afterAll(() => stack.stop(), 60_000);

/** A request that must answer within the time a person would wait, or the test fails as a hang. */
async function timed(client: ApiClient, method: string, path: string, body?: unknown) {
  const started = Date.now();
  const res = await Promise.race([
    client.json<{ error?: string; code?: string }>(method, path, body),
    new Promise<never>((_, reject) => setTimeout(() => reject(new Error(`${method} ${path} hung for 20 s`)), 20_000)),
  ]);
  return { ...res, ms: Date.now() - started };
}

describe.skipIf(!servicesRunning)("database restarted under the running app", () => {
  it("answers 503 while the database is away and recovers by itself when it is back", async () => {
    const report = await fieldReport({ siteId: await stack.siteId("MJC") });
    expect((await timed(inspector, "GET", "/api/cases")).status).toBe(200);

    await stack.stopPostgres();
    try {
      for (const [method, path, body] of [
        ["GET", "/api/cases", undefined],
        ["GET", "/api/cases?q=spall", undefined],
        ["POST", "/api/cases", report],
      ] as const) {
        const res = await timed(inspector, method, path, body);
        expect(res.status, `${method} ${path}: ${JSON.stringify(res.body)}`).toBe(503);
        expect(res.body.code).toBe("unavailable");
        expect(res.body.error).toMatch(/database/i);
        expect(res.ms).toBeLessThan(15_000);
      }
      // The health check says so too.
      expect((await fetch(`${stack.appUrl()}/api/health`)).status).toBe(503);
    } finally {
      await stack.startPostgres();
    }

    // Same process, no restart: the pool lost its connections and must not have taken the server down.
    expect(stack.appAlive()).toBe(true);
    await waitUntil("the app answered 200 again", async () => (await inspector.get("/api/cases")).status === 200, 30);
    const saved = await inspector.json<{ case: { id: string } }>("POST", "/api/cases", report);
    expect(saved.status).toBe(201);
    expect((await stack.query("select 1 from cases where id = $1", [saved.body.case.id])).length).toBe(1);
  }, 120_000);
});
