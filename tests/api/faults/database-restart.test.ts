// PostgreSQL stopped and started again under a running app server: while it is away every request
// gets a quick 503 with a plain message (no hang, no 500), the server keeps running, and once the
// database is back the same server answers and saves again without being restarted. A page (not the
// API) gets Tearline's own "cannot be reached" page with 503, and the real page again afterwards.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack, waitUntil } from "../../support/stack";
import { ApiClient } from "../../support/api";
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

  it("shows Tearline's own 503 page for a page while the database is away, and the page again when it is back", async () => {
    const anonymous = new ApiClient("anonymous", stack.appUrl());
    expect((await inspector.get("/cases")).status).toBe(200);
    // Asked for directly while the database answers, the outage page sends the visitor home.
    expect((await anonymous.get("/unavailable")).status).toBe(307);

    await stack.stopPostgres();
    try {
      for (const [who, client, path] of [
        ["signed in", inspector, "/cases"],
        ["signed in", inspector, "/cases?stage=bench"],
        ["anonymous", anonymous, "/sign-in"],
      ] as const) {
        const started = Date.now();
        const res = await client.get(path);
        const html = await res.text();
        const where = `GET ${path} ${who}: ${html.slice(0, 600)}`;
        expect(res.status, where).toBe(503);
        expect(Date.now() - started, where).toBeLessThan(15_000);
        expect(res.headers.get("content-type"), where).toMatch(/text\/html/);
        expect(res.headers.get("retry-after"), where).toBe("30");
        // Our page in the product's shell (its stylesheet, its mark), not the framework's error page.
        expect(html, where).toContain("The casebook cannot be reached right now");
        expect(html, where).toContain("Nothing you typed is lost");
        expect(html, where).toMatch(/keeps its draft on this device/);
        expect(html, where).toMatch(/<link[^>]+rel="stylesheet"/);
        expect(html, where).not.toMatch(/Internal Server Error|Application error|This page couldn/i);
        // "Try again" leads back to the very page asked for.
        const retry = html.match(/<a[^>]*href="([^"]*)"[^>]*>\s*Try again/);
        expect(retry?.[1].replace(/&amp;/g, "&"), where).toBe(path);
      }
    } finally {
      await stack.startPostgres();
    }

    expect(stack.appAlive()).toBe(true);
    await waitUntil("the case list page answered 200 again", async () => (await inspector.get("/cases")).status === 200, 30);
    const list = await (await inspector.get("/cases")).text();
    expect(list).not.toContain("The casebook cannot be reached right now");
    expect((await anonymous.get("/sign-in")).status).toBe(200);
  }, 120_000);
});
