// Two app servers on one database and one bucket, as behind a load balancer: a save through one
// server at a version the other has already moved is refused, and what one server stores the
// other serves.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack } from "../../support/stack";
import type { ApiClient } from "../../support/api";
import { twoToneJpeg } from "../../support/photo-files";
import { upload } from "../photos/helpers";
import { fieldReport } from "../cases/fixtures";

const stack = new Stack("two-servers");
let onA: ApiClient;
let onB: ApiClient;
let caseId: string;
let version: number;

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(2);
  [onA, onB] = await Promise.all([stack.client("analyst", 0), stack.client("analyst", 1)]);
  const inspector = await stack.client("inspector", 0);
  const filed = await inspector.json<{ case: { id: string } }>(
    "POST",
    "/api/cases",
    await fieldReport({ siteId: await stack.siteId("MJC") }),
  );
  caseId = filed.body.case.id;
  const received = await onA.json<{ case: { version: number } }>("POST", `/api/cases/${caseId}/transitions`, {
    version: 1,
    action: "receive",
  });
  expect(received.status).toBe(200);
  version = received.body.case.version;
}, 300_000);

afterAll(() => stack.stop(), 60_000);

const events = async (action: string) =>
  (await stack.query("select 1 from case_events where case_id = $1 and action = $2", [caseId, action])).length;

describe.skipIf(!servicesRunning)("two app servers on one database", () => {
  it("refuses a stale save on one server when the other saved first", async () => {
    const first = await onA.json<{ case: { version: number } }>("PATCH", `/api/cases/${caseId}`, {
      version,
      section: "teardown",
      data: { teardownNotes: "Saved through server A." },
    });
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    const stale = await onB.json<{ code?: string; error?: string }>("PATCH", `/api/cases/${caseId}`, {
      version,
      section: "teardown",
      data: { teardownNotes: "Saved through server B." },
    });
    expect(stale.status).toBe(409);
    const [row] = await stack.query<{ teardown_notes: string; version: number }>(
      "select teardown_notes, version from cases where id = $1",
      [caseId],
    );
    expect(row).toEqual({ teardown_notes: "Saved through server A.", version: first.body.case.version });
    expect(await events("teardown-saved")).toBe(1);

    // At the version server A answered, server B saves.
    const fresh = await onB.json("PATCH", `/api/cases/${caseId}`, {
      version: first.body.case.version,
      section: "teardown",
      data: { teardownNotes: "Then through server B." },
    });
    expect(fresh.status).toBe(200);
    expect(await events("teardown-saved")).toBe(2);
  });

  it("serves through one server the photo stored through the other", async () => {
    const up = await upload(onA, caseId, await twoToneJpeg({ seed: 77 }), "shared.jpg");
    expect(up.status).toBe(201);
    const thumb = await onB.get(up.body.photo!.urls.thumb);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get("content-type")).toMatch(/image\/webp/);
    // The photo moved the case version on A: a save through B at the older version is refused.
    const [{ version: now }] = await stack.query<{ version: number }>("select version from cases where id = $1", [caseId]);
    const stale = await onB.json("PATCH", `/api/cases/${caseId}`, {
      version: now - 1,
      section: "teardown",
      data: { teardownNotes: "Late." },
    });
    expect(stale.status).toBe(409);
  });
});
