// Generates a large invented casebook for load and search testing: cases plus findings,
// inserted in multi-row batches. Numbers use a high sequence per year (from 50001) so they never
// meet the demo's, and the year counters are moved past them so new cases continue after.
import { sql } from "drizzle-orm";
import type { Db } from "../../db";
import { caseCounters } from "../../db/schema";
import { formatCaseNumber } from "../../db/queries/case-number";
import type { Stage } from "../../lib/cases/stages";
import { addDays, DAY_MS, DEMO_NOW, isoDay } from "./calendar";
import { bulkInsert } from "./bulk-insert";
import { buildCase, type BuiltCase } from "./case-builder";
import type { CaseSpec, RemovalSite } from "./case-spec";
import { CAUSE_BY_TRIGGER, SITE_MIX, TRIGGER_MIX, WHEEL_SHOP_MIX } from "./large-mix";
import { createRng, type Rng } from "./prng";
import { loadSeedContext } from "./seed-context";

export const LARGE_SEQUENCE_FLOOR = 50000;
const BATCH = 2000;

export type LargeSeedOptions = { cases: number; seed?: number; years?: number; onProgress?: (done: number, total: number) => void };
export type LargeSeedResult = { cases: number; findings: number; ms: number; caseIds: string[] };

/** Removal days spread evenly over the years before the demo's end date, oldest first. */
function removalDays(rng: Rng, count: number, years: number): string[] {
  const span = Math.round(years * 365.25);
  const start = addDays(isoDay(DEMO_NOW), -span);
  return Array.from({ length: count }, () => rng.int(0, span - 1))
    .sort((a, b) => a - b)
    .map((d) => addDays(start, d));
}

function stageFor(rng: Rng, removedOn: string): Stage {
  const age = (DEMO_NOW.getTime() - Date.parse(`${removedOn}T00:00:00Z`)) / DAY_MS;
  if (age < 12) return "field";
  if (age < 35) return rng.chance(0.8) ? "bench" : "signoff";
  if (age < 60)
    return rng.weighted([
      ["bench", 15],
      ["signoff", 35],
      ["signed", 50],
    ]);
  return "signed";
}

function specFor(rng: Rng, removedOn: string): CaseSpec {
  const trigger = rng.weighted(TRIGGER_MIX);
  let cause = rng.weighted(CAUSE_BY_TRIGGER[trigger]);
  // Water gets in after the wet months: fewer water cases outside spring.
  const month = Number(removedOn.slice(5, 7));
  if (cause === "water-ingress" && (month < 3 || month > 6) && rng.chance(0.5)) cause = "undetermined";
  const site: RemovalSite = rng.weighted(trigger === "wheel-removal" || trigger === "scheduled" ? WHEEL_SHOP_MIX : SITE_MIX);
  return { key: "", trigger, cause, site, removedOn, status: stageFor(rng, removedOn) };
}

async function sequenceStarts(db: Db): Promise<Map<number, number>> {
  const rows = await db.select().from(caseCounters);
  return new Map(rows.map((r) => [r.year, r.last]));
}

export async function seedLargeCases(db: Db, opts: LargeSeedOptions): Promise<LargeSeedResult> {
  const started = Date.now();
  const rng = createRng(opts.seed ?? 1_000_003);
  const ctx = await loadSeedContext(db);
  const counters = await sequenceStarts(db);
  const seq = new Map<number, number>();
  const next = (year: number) => {
    const n = (seq.get(year) ?? Math.max(counters.get(year) ?? 0, LARGE_SEQUENCE_FLOOR)) + 1;
    seq.set(year, n);
    return formatCaseNumber(year, n);
  };

  const days = removalDays(rng, opts.cases, opts.years ?? 10);
  const caseIds: string[] = [];
  let findingCount = 0;
  const insert = async (built: BuiltCase[]) => {
    const rows = built.flatMap((b) =>
      b.findings.map((f) => ({ ...f, caseId: b.values.id, createdBy: ctx.analyst, createdAt: b.values.receivedAt ?? b.values.createdAt })),
    );
    await db.transaction(async (tx) => {
      // Generated data can be made again: no need to wait for each batch to reach the disk.
      await tx.execute(sql`set local synchronous_commit to off`);
      await bulkInsert(
        tx,
        "cases",
        built.map((b) => b.values),
      );
      await bulkInsert(tx, "findings", rows);
    });
    findingCount += rows.length;
    for (const b of built) caseIds.push(b.values.id);
    opts.onProgress?.(caseIds.length, days.length);
  };
  // The next batch is drawn while PostgreSQL stores the last one.
  let storing: Promise<void> = Promise.resolve();
  for (let from = 0; from < days.length; from += BATCH) {
    const built: BuiltCase[] = [];
    for (const day of days.slice(from, from + BATCH)) {
      const b = buildCase(rng, specFor(rng, day), ctx, rng.chance(0.5));
      b.values.number = next(Number(day.slice(0, 4)));
      built.push(b);
      if (built.length % 250 === 0) await new Promise((r) => setImmediate(r));
    }
    await storing;
    storing = insert(built);
  }
  await storing;

  // New cases in these years continue after the generated numbers.
  for (const [year, last] of seq) {
    await db
      .insert(caseCounters)
      .values({ year, last })
      .onConflictDoUpdate({ target: caseCounters.year, set: { last: sql`greatest(${caseCounters.last}, ${last})` } });
  }
  await db.execute(sql`analyze cases`);
  await db.execute(sql`analyze findings`);
  return { cases: caseIds.length, findings: findingCount, ms: Date.now() - started, caseIds };
}
