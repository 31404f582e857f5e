// The large generator on a small run: cases and findings land, numbers are unique and above the
// demo's, and the year counters move past them. Its rows are removed again afterwards.
import { count, eq, inArray, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { nextCaseNumber } from "../../../db/queries/case-number";
import { LARGE_SEQUENCE_FLOOR, seedLargeCases, type LargeSeedResult } from "../../../scripts/seed/large-cases";
import { db, t } from "../../support/db";

const COUNT = 500;
let before: { year: number; last: number }[];
let result: LargeSeedResult;

beforeAll(async () => {
  before = await db.select().from(t.caseCounters);
  result = await seedLargeCases(db, { cases: COUNT, seed: 4242 });
}, 120_000);

afterAll(async () => {
  if (result?.caseIds.length) await db.delete(t.cases).where(inArray(t.cases.id, result.caseIds));
  // Put the year counters back so numbers other tests take are as they would have been.
  // eslint-disable-next-line drizzle/enforce-delete-with-where -- every counter goes; the saved ones are put back next
  await db.delete(t.caseCounters);
  if (before.length) await db.insert(t.caseCounters).values(before);
});

describe("seed:large", () => {
  it("inserts the cases asked for, with one to four findings on those torn down", async () => {
    expect(result.cases).toBe(COUNT);
    const mine = inArray(t.cases.id, result.caseIds);
    const [{ n }] = await db.select({ n: count() }).from(t.cases).where(mine);
    expect(n).toBe(COUNT);
    const perCase = await db
      .select({ status: t.cases.status, n: sql<number>`count(${t.findings.id})::int` })
      .from(t.cases)
      .leftJoin(t.findings, eq(t.findings.caseId, t.cases.id))
      .where(mine)
      .groupBy(t.cases.id);
    expect(perCase.reduce((s, r) => s + r.n, 0)).toBe(result.findings);
    for (const r of perCase) {
      if (r.status === "signed" || r.status === "signoff") expect(r.n).toBeGreaterThanOrEqual(1);
      expect(r.n).toBeLessThanOrEqual(4);
    }
  });

  it("spreads removals over ten years and many triggers and causes", async () => {
    const rows = await db
      .select({ removedOn: t.cases.removedOn, trigger: t.cases.trigger, cause: t.cases.primaryCause })
      .from(t.cases)
      .where(inArray(t.cases.id, result.caseIds));
    const years = new Set(rows.map((r) => r.removedOn!.slice(0, 4)));
    expect(years.size).toBeGreaterThanOrEqual(10); // ten years of removals
    expect(new Set(rows.map((r) => r.trigger)).size).toBeGreaterThanOrEqual(12);
    expect(new Set(rows.map((r) => r.cause).filter(Boolean)).size).toBeGreaterThanOrEqual(11);
  });

  it("gives unique numbers above the demo range and moves the counters past them", async () => {
    const rows = await db
      .select({ number: t.cases.number, removedOn: t.cases.removedOn })
      .from(t.cases)
      .where(inArray(t.cases.id, result.caseIds));
    expect(new Set(rows.map((r) => r.number)).size).toBe(COUNT);
    const maxByYear = new Map<number, number>();
    for (const r of rows) {
      expect(r.number.slice(3, 5)).toBe(r.removedOn!.slice(2, 4));
      const seq = Number(r.number.split("-")[2]);
      expect(seq).toBeGreaterThan(LARGE_SEQUENCE_FLOOR);
      const year = Number(r.removedOn!.slice(0, 4));
      maxByYear.set(year, Math.max(maxByYear.get(year) ?? 0, seq));
    }
    const [year, max] = [...maxByYear].at(-1)!;
    const following = await nextCaseNumber(db, year);
    expect(Number(following.split("-")[2])).toBe(max + 1);
  });
});
