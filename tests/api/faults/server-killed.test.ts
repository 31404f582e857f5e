// The app server killed with SIGKILL in the middle of a large photo upload and in the middle of a
// sign-off, then started again: nothing is half-written, no photo row lacks its objects, objects
// left without a row are removed by the sweep, and the person can simply do it again. A doubled
// sign-off (two requests at the same version) signs once.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFile } from "node:child_process";
import http from "node:http";
import path from "node:path";
import { promisify } from "node:util";
import pg from "pg";
import { servicesRunning } from "../../support/env";
import { PROJECT, Stack, waitUntil } from "../../support/stack";
import type { ApiClient } from "../../support/api";
import { noisyJpeg } from "../../support/photo-files";
import { upload } from "../photos/helpers";
import { caseAwaitingSignoff, fieldReport } from "../cases/fixtures";
import { sha256Hex } from "@/lib/photos/process";
import { signVerdict } from "../../support/sign";

const run = promisify(execFile);
const stack = new Stack("killed");
let inspector: ApiClient;
let analyst: ApiClient;
let engineer: ApiClient;
let big: Buffer;

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(1);
  [inspector, analyst, engineer] = await Promise.all([stack.client("inspector"), stack.client("analyst"), stack.client("engineer")]);
  big = await noisyJpeg(); // a 12 MP photograph, several MB
}, 240_000);

afterAll(() => stack.stop(), 60_000);

async function fileCase() {
  const filed = await inspector.json<{ case: { id: string } }>(
    "POST",
    "/api/cases",
    await fieldReport({ siteId: await stack.siteId("MJC") }),
  );
  expect(filed.status).toBe(201);
  return filed.body.case.id;
}

/** Holds the case row locked from outside, so the app's write waits inside its transaction. */
async function lockCase(caseId: string) {
  const c = new pg.Client({ connectionString: stack.databaseUrl });
  await c.connect();
  await c.query("begin");
  await c.query("select id from cases where id = $1 for update", [caseId]);
  return { release: async () => (await c.query("rollback"), await c.end()) };
}

const waitingOnLock = async () =>
  (await stack.query("select 1 from pg_stat_activity where datname = 'tearline' and wait_event_type = 'Lock'")).length > 0;

/** Sends the first part of a multipart upload and keeps the rest back, as a slow phone link would. */
function startSlowUpload(caseId: string, file: Buffer, sentBytes: number): Promise<void> {
  const boundary = "----tearline-slow-upload";
  const head = Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="slow.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
  );
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  const url = new URL(`${stack.appUrl()}/api/cases/${caseId}/photos`);
  return new Promise((resolve) => {
    const req = http.request(url, {
      method: "POST",
      headers: {
        origin: stack.appUrl(),
        cookie: inspector.cookie,
        "content-type": `multipart/form-data; boundary=${boundary}`,
        "content-length": head.length + file.length + tail.length,
      },
    });
    req.on("error", () => resolve()); // the server goes away mid-body
    req.on("response", () => resolve());
    req.write(head);
    req.write(file.subarray(0, sentBytes), () => setTimeout(resolve, 500));
  });
}

const photoRows = async (caseId: string) =>
  stack.query<{ sha256: string; original_key: string }>("select sha256, original_key from photos where case_id = $1", [caseId]);

async function sweep() {
  const { stdout } = await run(
    path.join(PROJECT, "node_modules/.bin/tsx"),
    ["--conditions=react-server", "scripts/sweep-photos.ts", "--older-than=0"],
    { cwd: PROJECT, env: stack.env() },
  );
  return stdout;
}

async function restart() {
  await stack.startApp(0);
}

describe.skipIf(!servicesRunning)("app server killed mid-action", () => {
  it("killed while a large photo is arriving: nothing is stored, and the upload can be redone", async () => {
    const caseId = await fileCase();
    await startSlowUpload(caseId, big, Math.floor(big.length / 2));
    await stack.killApp(0, "SIGKILL");
    expect(await photoRows(caseId)).toEqual([]);
    expect(await stack.listKeys(`cases/${caseId}/`)).toEqual([]);
    await restart();
    const again = await upload(inspector, caseId, big, "slow.jpg");
    expect(again.status, JSON.stringify(again.body)).toBe(201);
    expect(again.body.photo!.sha256).toBe(sha256Hex(big));
  }, 180_000);

  it("killed after the objects are stored but before the row: no row, the sweep removes the objects, the redo stores it once", async () => {
    const caseId = await fileCase();
    const lock = await lockCase(caseId);
    let lockHeld = true;
    try {
      void upload(inspector, caseId, big, "interrupted.jpg").catch(() => undefined);
      await waitUntil("the upload reached its row transaction", waitingOnLock, 60);
      const folder = `cases/${caseId}/${sha256Hex(big)}/`;
      expect((await stack.listKeys(folder)).map((k) => k.split("/").pop())).toEqual(["original", "screen.webp", "thumb.webp"]);
      await stack.killApp(0, "SIGKILL");
      await lock.release();
      lockHeld = false;
      // The dead server's transaction is rolled back by PostgreSQL: no row, no history line, version unchanged.
      await waitUntil("the dead server's transaction ended", async () => !(await waitingOnLock()), 30);
      expect(await photoRows(caseId)).toEqual([]);
      expect(
        (await stack.query<{ action: string }>("select action from case_events where case_id = $1", [caseId])).map((e) => e.action),
      ).toEqual(["created"]);
      expect(await stack.listKeys(folder)).toHaveLength(3);

      expect(await sweep()).toMatch(/removed 3 objects/);
      expect(await stack.listKeys(`cases/${caseId}/`)).toEqual([]);
    } finally {
      if (lockHeld) await lock.release();
    }

    await restart();
    const again = await upload(inspector, caseId, big, "interrupted.jpg");
    expect(again.status, JSON.stringify(again.body)).toBe(201);
    const rows = await photoRows(caseId);
    expect(rows).toHaveLength(1);
    expect(await stack.listKeys(`cases/${caseId}/`)).toHaveLength(3);
    // A sweep now finds nothing to remove: every object has its row.
    expect(await sweep()).toMatch(/removed 0 objects/);
  }, 240_000);

  it("killed in the middle of a sign-off: the case is not signed, and the engineer signs again", async () => {
    const { id, version } = await caseAwaitingSignoff(inspector, analyst, { siteId: await stack.siteId("MJC") });
    const lock = await lockCase(id);
    try {
      void signVerdict(engineer, id, { version }).catch(() => undefined);
      await waitUntil("the sign-off reached its transaction", waitingOnLock, 30);
      await stack.killApp(0, "SIGKILL");
    } finally {
      await lock.release();
    }
    await waitUntil("the dead server's transaction ended", async () => !(await waitingOnLock()), 30);
    const [half] = await stack.query<{ status: string; signed_by: string | null; version: number }>(
      "select status, signed_by, version from cases where id = $1",
      [id],
    );
    expect(half).toEqual({ status: "signoff", signed_by: null, version });
    expect(await stack.query("select 1 from case_events where case_id = $1 and action = 'sign'", [id])).toEqual([]);

    await restart();
    const signed = await signVerdict<{ case: { status: string } }>(engineer, id, { version });
    expect(signed.status, JSON.stringify(signed.body)).toBe(200);
    expect(signed.body.case.status).toBe("signed");
    expect(await stack.query("select 1 from case_events where case_id = $1 and action = 'sign'", [id])).toHaveLength(1);
  }, 180_000);

  it("a doubled sign-off at the same version gives one signature and one history line", async () => {
    const { id, version } = await caseAwaitingSignoff(inspector, analyst, { siteId: await stack.siteId("MJC") });
    // The second answers with the signature the first made (the version is the step's key).
    const answers = await Promise.all([1, 2].map(() => signVerdict<{ code?: string }>(engineer, id, { version })));
    expect(answers.map((a) => a.status)).toEqual([200, 200]);
    expect(await stack.query("select 1 from case_events where case_id = $1 and action = 'sign'", [id])).toHaveLength(1);
    const [row] = await stack.query<{ status: string; version: number }>("select status, version from cases where id = $1", [id]);
    expect(row).toEqual({ status: "signed", version: version + 1 });
  }, 60_000);
});
