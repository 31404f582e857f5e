// Filing with an Idempotency-Key: a replayed or double-tapped filing answers the first case, never a second one.
import { randomUUID } from "node:crypto";
import { count, eq } from "drizzle-orm";
import { expect, test } from "vitest";
import { as, type ApiClient } from "../../support/api";
import { db, t } from "../../support/db";
import { fieldReport } from "./fixtures";

type Filed = { status: number; body: { case?: { id: string; number: string }; replayed?: boolean; error?: string } };

async function file(client: ApiClient, body: unknown, key?: string): Promise<Filed> {
  const res = await client.request("POST", "/api/cases", body, key === undefined ? {} : { "idempotency-key": key });
  return { status: res.status, body: await res.json() };
}

const casesForCar = async (carNumber: string) =>
  (await db.select({ n: count() }).from(t.cases).where(eq(t.cases.carNumber, carNumber)))[0].n;

test("the same key sent twice makes one case; the second answer names it and says it was a replay", async () => {
  const inspector = await as("inspector");
  const report = await fieldReport();
  const key = randomUUID();
  const first = await file(inspector, report, key);
  expect(first.status).toBe(201);
  expect(first.body.replayed).toBe(false);
  const again = await file(inspector, report, key);
  expect(again.status).toBe(200);
  expect(again.body.replayed).toBe(true);
  expect(again.body.case?.number).toBe(first.body.case?.number);
  expect(await casesForCar(report.carNumber)).toBe(1);
});

test("a burst of taps with one key, all at once, still makes exactly one case", async () => {
  const inspector = await as("inspector");
  const report = await fieldReport();
  const key = randomUUID();
  const answers = await Promise.all(Array.from({ length: 6 }, () => file(inspector, report, key)));
  expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 200, 200, 201]);
  expect(new Set(answers.map((a) => a.body.case?.id)).size).toBe(1);
  expect(await casesForCar(report.carNumber)).toBe(1);
});

test("different keys are different filings, and no key still files as before", async () => {
  const inspector = await as("inspector");
  const report = await fieldReport();
  expect((await file(inspector, report, randomUUID())).status).toBe(201);
  expect((await file(inspector, report, randomUUID())).status).toBe(201);
  expect((await file(inspector, report)).status).toBe(201);
  expect(await casesForCar(report.carNumber)).toBe(3);
});

test("a malformed key is refused with a clear message and writes nothing", async () => {
  const inspector = await as("inspector");
  const report = await fieldReport();
  for (const key of ["short", "x".repeat(101), "has spaces in it ok?!"]) {
    const r = await file(inspector, report, key);
    expect(r.status).toBe(400);
    expect(r.body.error).toMatch(/Idempotency-Key must be 16 to 100/);
  }
  expect(await casesForCar(report.carNumber)).toBe(0);
});

test("a key is scoped to the person: someone else filing with the same key gets their own case", async () => {
  const a = await as("inspector");
  const b = await as("analyst");
  const key = randomUUID();
  const ra = await file(a, await fieldReport(), key);
  const rb = await file(b, await fieldReport(), key);
  expect(ra.status).toBe(201);
  expect(rb.status).toBe(201);
  expect(rb.body.case?.id).not.toBe(ra.body.case?.id);
});
