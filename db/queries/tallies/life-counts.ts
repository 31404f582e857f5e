// Service life at removal, counted by cause and life in PostgreSQL, plus the newest fleet list
// of units still in service (the suspensions a life analysis needs).
import "server-only";
import { and, desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, fleetUnits, user } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { FleetCountRow, LifeMeasure, LifeTotals } from "@/lib/tallies/life";
import type { FleetBatch } from "@/lib/tallies/life-data";
import { tallyWhere, type TallyViewer } from "./scope";

const lifeOf = (measure: LifeMeasure) => (measure === "months" ? sql`${cases.serviceMonths}::float8` : sql`${cases.serviceMiles}::float8`);

type TotalsRow = {
  kind: "c" | "t" | "o" | "w";
  cause: string | null;
  t: number | null;
  n: number;
  sum_log: number | null;
  first: number | null;
  last: number | null;
};

/**
 * The life section's counts in one pass over the signed cases in view: lives by service life, per
 * cause its failures, sum of log lives, first and last, the lives without a service life, and the
 * lives of one cause: `wanted` when it can fail a bearing, else the cause the table lists first
 * among those that can be fitted (the service checks the pick and asks again for another).
 */
export async function lifeTotals(
  filters: TallyFilters,
  viewer: TallyViewer,
  measure: LifeMeasure,
  wanted: string | undefined,
  notFailures: readonly string[],
): Promise<LifeTotals> {
  const life = lifeOf(measure);
  const where = tallyWhere(filters, viewer, { signedOnly: true });
  const excluded = sql`array[${sql.join(
    [...notFailures, ""].map((c) => sql`${c}`),
    sql`, `,
  )}]::text[]`;
  const { rows } = await db.execute<TotalsRow>(sql`
    with g as materialized (
      select ${cases.primaryCause} as cause, ${life} as t, count(*)::int as n from ${cases} where ${where} group by 1, 2
    ),
    c as (
      select cause, sum(n)::int as failures, sum(n * ln(t)) as sum_log, min(t) as first, max(t) as last
      from g where t > 0 and cause is not null and cause <> all(${excluded}) group by cause
    ),
    pick as (
      select coalesce(
        (select cause from c where cause = ${wanted ?? null}::text),
        (select cause from c where failures >= 2 and first < last order by failures desc, cause limit 1)
      ) as cause
    )
    select 'c' as kind, cause, null::float8 as t, failures as n, sum_log, first, last from c
    union all select 't', null, t, sum(n)::int, null, null, null from g where t > 0 group by t
    union all select 'o', g.cause, t, n, null, null, null from g join pick on pick.cause = g.cause where t > 0
    union all select 'w', null, null, coalesce(sum(n), 0)::int, null, null, null from g where t is null or t <= 0`);
  const totals = {
    byTime: [] as FleetCountRow[],
    causes: [] as LifeTotals["causes"][number][],
    ownTimes: [] as FleetCountRow[],
    ownCause: null as string | null,
    withoutLife: 0,
  };
  for (const r of rows) {
    if (r.kind === "c" && r.cause)
      totals.causes.push({ cause: r.cause, failures: r.n, sumLog: Number(r.sum_log), first: Number(r.first), last: Number(r.last) });
    else if (r.kind === "t") totals.byTime.push({ time: Number(r.t), count: r.n });
    else if (r.kind === "o") {
      totals.ownCause = r.cause;
      totals.ownTimes.push({ time: Number(r.t), count: r.n });
    } else if (r.kind === "w") totals.withoutLife = r.n;
  }
  const { ownCause, ownTimes, ...rest } = totals;
  return { ...rest, own: ownCause ? { cause: ownCause, times: ownTimes } : null };
}

/** One cause's signed lives by service life (when the service picks another cause than lifeTotals did). */
export async function causeLives(
  filters: TallyFilters,
  viewer: TallyViewer,
  measure: LifeMeasure,
  cause: string,
): Promise<FleetCountRow[]> {
  const life = lifeOf(measure);
  const where = tallyWhere(filters, viewer, { signedOnly: true });
  const rows = await db
    .select({ time: sql<number>`${life}`, count: sql<number>`count(*)::int` })
    .from(cases)
    .where(sql`${where} and ${cases.primaryCause} = ${cause} and ${life} > 0`)
    .groupBy(sql`1`);
  return rows.map((r) => ({ time: Number(r.time), count: r.count }));
}

export async function latestFleetBatch(): Promise<FleetBatch | null> {
  const [row] = await db
    .select({
      batchId: fleetUnits.batchId,
      uploadedAt: sql<string>`max(${fleetUnits.uploadedAt})::text`,
      uploadedBy: sql<string | null>`min(${user.name})`,
      units: sql<number>`count(*)::int`,
    })
    .from(fleetUnits)
    .leftJoin(user, eq(user.id, fleetUnits.uploadedBy))
    .groupBy(fleetUnits.batchId)
    .orderBy(desc(sql`max(${fleetUnits.uploadedAt})`))
    .limit(1);
  return row ?? null;
}

export async function fleetCounts(batchId: string, measure: LifeMeasure, bearingClass?: string): Promise<FleetCountRow[]> {
  const life = measure === "months" ? sql`${fleetUnits.serviceMonths}::float8` : sql`${fleetUnits.serviceMiles}::float8`;
  const rows = await db
    .select({ time: sql<number>`${life}`, count: sql<number>`count(*)::int` })
    .from(fleetUnits)
    .where(and(eq(fleetUnits.batchId, batchId), bearingClass ? eq(fleetUnits.bearingClass, bearingClass) : undefined, sql`${life} > 0`))
    .groupBy(sql`1`);
  return rows.map((r) => ({ time: Number(r.time), count: r.count }));
}
