// Alarm readings, acoustic levels, detectors and triggers against the teardown outcome, counted in
// PostgreSQL over signed verdicts within the viewer's reach and the Tallies filters.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, sites } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { DetectorCell, HotCell, OutcomeCell } from "@/lib/tallies/yield-counts";
import { tallyWhere, type TallyViewer } from "./scope";

const num = (key: string) => sql`(${cases.triggerDetail}->>${key})::numeric`;
const isNum = (key: string) => sql`jsonb_typeof(${cases.triggerDetail}->${key}) = 'number'`;
const recorded = sql`${cases.removalConfirmed} is not null`;

/** The outcome sums every grouping shares; cost comes from the removal site's policy. */
const outcomeColumns = sql`
  count(*) filter (where ${recorded})::int as n,
  count(*) filter (where ${cases.removalConfirmed} = 'confirmed')::int as confirmed,
  count(*) filter (where ${cases.removalConfirmed} = 'no-defect')::int as no_defect,
  coalesce(sum(${sites.removalCostUsd}) filter (where ${cases.removalConfirmed} = 'no-defect'), 0)::float8 as cost_usd,
  count(*) filter (where ${cases.removalConfirmed} = 'no-defect' and ${sites.removalCostUsd} is null)::int as uncosted`;

type OutcomeRow = { key: string | null; n: number; confirmed: number; no_defect: number; cost_usd: number; uncosted: number };
const toCell = (r: OutcomeRow): OutcomeCell => ({ key: r.key ?? "", n: r.n, confirmed: r.confirmed, noDefect: r.no_defect, costUsd: r.cost_usd, uncosted: r.uncosted });

export async function hotReadings(filters: TallyFilters, viewer: TallyViewer): Promise<{ cells: HotCell[]; withoutReading: number }> {
  const { rows } = await db.execute<{ margin: number | null; reading: number | null; confirmed: number; n: number }>(sql`
    select case when ${isNum("readingF")} and ${isNum("thresholdF")} then round(${num("readingF")} - ${num("thresholdF")})::int end as margin,
      case when ${isNum("readingF")} then round(${num("readingF")})::int end as reading,
      count(*) filter (where ${cases.removalConfirmed} = 'confirmed')::int as confirmed, count(*)::int as n
    from ${cases}
    where ${tallyWhere(filters, viewer, { signedOnly: true })} and ${cases.trigger} = 'wayside-hot' and ${recorded}
    group by 1, 2`);
  const cells: HotCell[] = [];
  let withoutReading = 0;
  for (const r of rows) {
    if (r.margin === null || r.reading === null) withoutReading += r.n;
    else cells.push({ margin: r.margin, reading: r.reading, confirmed: r.confirmed, n: r.n });
  }
  return { cells, withoutReading };
}

export async function acousticLevels(filters: TallyFilters, viewer: TallyViewer): Promise<OutcomeCell[]> {
  const { rows } = await db.execute<OutcomeRow>(sql`
    select coalesce(nullif(trim(${cases.triggerDetail}->>'alarmLevel'), ''), 'not recorded') as key, ${outcomeColumns}
    from ${cases} left join ${sites} on ${sites.id} = ${cases.siteId}
    where ${tallyWhere(filters, viewer, { signedOnly: true })} and ${cases.trigger} = 'wayside-acoustic'
    group by 1 order by 1`);
  return rows.map(toCell);
}

/** Every wayside detector named on an alarm: removals at any stage, outcomes of the signed ones. */
export async function detectorCounts(filters: TallyFilters, viewer: TallyViewer): Promise<DetectorCell[]> {
  const signed = sql`${cases.status} = 'signed'`;
  const { rows } = await db.execute<OutcomeRow & { trigger: string; location: string | null; alarms: number }>(sql`
    select trim(${cases.triggerDetail}->>'detectorId') as key, ${cases.trigger} as trigger,
      min(nullif(trim(${cases.triggerDetail}->>'detectorLocation'), '')) as location,
      count(*)::int as alarms,
      count(*) filter (where ${signed} and ${recorded})::int as n,
      count(*) filter (where ${signed} and ${cases.removalConfirmed} = 'confirmed')::int as confirmed,
      count(*) filter (where ${signed} and ${cases.removalConfirmed} = 'no-defect')::int as no_defect,
      coalesce(sum(${sites.removalCostUsd}) filter (where ${signed} and ${cases.removalConfirmed} = 'no-defect'), 0)::float8 as cost_usd,
      count(*) filter (where ${signed} and ${cases.removalConfirmed} = 'no-defect' and ${sites.removalCostUsd} is null)::int as uncosted
    from ${cases} left join ${sites} on ${sites.id} = ${cases.siteId}
    where ${tallyWhere(filters, viewer)} and ${cases.trigger} in ('wayside-hot', 'wayside-acoustic')
      and coalesce(trim(${cases.triggerDetail}->>'detectorId'), '') <> ''
    group by 1, 2`);
  return rows.map((r) => ({ ...toCell(r), trigger: r.trigger, location: r.location, alarms: r.alarms }));
}

export async function triggerCosts(filters: TallyFilters, viewer: TallyViewer): Promise<OutcomeCell[]> {
  const { rows } = await db.execute<OutcomeRow>(sql`
    select ${cases.trigger} as key, ${outcomeColumns}
    from ${cases} left join ${sites} on ${sites.id} = ${cases.siteId}
    where ${tallyWhere(filters, viewer, { signedOnly: true })}
    group by 1`);
  return rows.map(toCell);
}
