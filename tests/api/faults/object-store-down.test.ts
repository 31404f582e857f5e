// The object store stuck, then down, under a running app server: the upload sends its bytes before
// it opens a database transaction (a stuck store holds no connection or lock), a store that is
// down gets a plain 503 and nothing is written anywhere, and uploads work again once it is back.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack, waitUntil } from "../../support/stack";
import type { ApiClient } from "../../support/api";
import { twoToneJpeg } from "../../support/photo-files";
import { upload } from "../photos/helpers";
import { fieldReport } from "../cases/fixtures";

const stack = new Stack("s3-down");
let inspector: ApiClient;
let caseId: string;

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(1);
  inspector = await stack.client("inspector");
  const filed = await inspector.json<{ case: { id: string } }>(
    "POST",
    "/api/cases",
    await fieldReport({ siteId: await stack.siteId("MJC") }),
  );
  caseId = filed.body.case.id;
}, 240_000);

afterAll(() => stack.stop(), 60_000);

const caseState = async () => ({
  photos: (await stack.query("select id from photos where case_id = $1", [caseId])).length,
  events: (await stack.query<{ action: string }>("select action from case_events where case_id = $1 order by at", [caseId])).map(
    (e) => e.action,
  ),
  version: (await stack.query<{ version: number }>("select version from cases where id = $1", [caseId]))[0].version,
});

describe.skipIf(!servicesRunning)("object store stuck or down under the running app", () => {
  it("holds no database lock or transaction while the store is stuck", async () => {
    stack.pauseObjectStore();
    let pending: ReturnType<typeof upload> | undefined;
    try {
      pending = upload(inspector, caseId, await twoToneJpeg({ seed: 41 }), "stuck.jpg");
      // The app reads the form and makes the derivatives in well under a second; then it waits on the store.
      await new Promise((r) => setTimeout(r, 3000));
      const held = await stack.query<{ state: string; locks: number }>(
        `select a.state, (select count(*)::int from pg_locks l where l.pid = a.pid and l.locktype = 'advisory') as locks
           from pg_stat_activity a where a.datname = 'tearline' and a.pid <> pg_backend_pid() and a.backend_type = 'client backend'`,
      );
      expect(held.filter((h) => h.state === "idle in transaction" || h.locks > 0)).toEqual([]);
    } finally {
      stack.resumeObjectStore();
    }
    const done = await pending!;
    expect(done.status).toBe(201);
  }, 90_000);

  it("answers 503 with a plain message and writes nothing while the store is down", async () => {
    const before = await caseState();
    const keysBefore = await stack.listKeys(`cases/${caseId}/`);
    await stack.killObjectStore();
    try {
      const started = Date.now();
      const res = await upload(inspector, caseId, await twoToneJpeg({ seed: 42 }), "down.jpg");
      expect(res.status, JSON.stringify(res.body)).toBe(503);
      expect(res.body.code).toBe("unavailable");
      expect(res.body.error).toMatch(/photo store/i);
      expect(Date.now() - started).toBeLessThan(20_000);
      expect(await caseState()).toEqual(before);
    } finally {
      await stack.startObjectStore();
    }
    expect(await stack.listKeys(`cases/${caseId}/`)).toEqual(keysBefore);

    // Back on the same port: the same server stores the photo without a restart.
    expect(stack.appAlive()).toBe(true);
    let again: Awaited<ReturnType<typeof upload>> | undefined;
    await waitUntil(
      "the upload was accepted again",
      async () => (again = await upload(inspector, caseId, await twoToneJpeg({ seed: 42 }), "down.jpg")).status === 201,
      30,
    );
    const keys = await stack.listKeys(`cases/${caseId}/${again!.body.photo!.sha256}/`);
    expect(keys.map((k) => k.split("/").pop())).toEqual(["original", "screen.webp", "thumb.webp"]);
    expect((await caseState()).photos).toBe(before.photos + 1);
  }, 120_000);
});
