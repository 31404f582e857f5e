// Alarm readings, acoustic levels, detectors and triggers against the teardown outcome, summed in
// PostgreSQL from the yield roll-ups (db/schema/yield-cells.ts) within the viewer's reach and the
// Tallies filters. The money on no-defect removals is each cell's count at its removal site's cost.
// Each grouping is its own statement, so the page's statements run side by side; none should grow
// much past the others, as the slowest one sets the page's time on a busy machine.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { sites, yieldAlarmCells as a, yieldCells as c } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { DetectorCell, HotCell, OutcomeCell } from "@/lib/tallies/yield-counts";
import type { TallyViewer } from "./scope";
import { cellWhere } from "./yield-scope";

/**
 * The outcome sums every grouping shares, over the rows of subquery `g` (already summed per shop and
 * outcome: `n`, `outcome`, `site_id`) joined to their site, for rows matching `where`. Summing the
 * cells before pricing them leaves a few hundred rows to multiply instead of every cell.
 */
const pricedSums = (where = sql`true`) => sql`
  coalesce(sum(g.n) filter (where ${where} and g.outcome is not null), 0)::int as n,
  coalesce(sum(g.n) filter (where ${where} and g.outcome = 'confirmed'), 0)::int as confirmed,
  coalesce(sum(g.n) filter (where ${where} and g.outcome = 'no-defect'), 0)::int as no_defect,
  coalesce(sum(g.n * ${sites.removalCostUsd}) filter (where ${where} and g.outcome = 'no-defect'), 0)::float8 as cost_usd,
  coalesce(sum(g.n) filter (where ${where} and g.outcome = 'no-defect' and ${sites.removalCostUsd} is null), 0)::int as uncosted`;

type OutcomeRow = { key: string | null; n: number; confirmed: number; no_defect: number; cost_usd: number; uncosted: number };
const toCell = (r: OutcomeRow): OutcomeCell => ({
  key: r.key ?? "",
  n: r.n,
  confirmed: r.confirmed,
  noDefect: r.no_defect,
  costUsd: r.cost_usd,
  uncosted: r.uncosted,
});

export async function hotReadings(filters: TallyFilters, viewer: TallyViewer): Promise<{ cells: HotCell[]; withoutReading: number }> {
  const { rows } = await db.execute<{ margin: number | null; reading: number | null; confirmed: number; n: number }>(sql`
    select ${a.margin} as margin, ${a.reading} as reading,
      coalesce(sum(${a.n}) filter (where ${a.outcome} = 'confirmed'), 0)::int as confirmed, sum(${a.n})::int as n
    from ${a}
    where ${cellWhere(a, filters, viewer)} and ${a.signed} and ${a.trigger} = 'wayside-hot' and ${a.outcome} is not null
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
  // Summed per level, shop and outcome first, then priced at each shop's cost.
  const { rows } = await db.execute<OutcomeRow>(sql`
    with g as (
      select ${a.alarmLevel} as key, ${a.siteId} as site_id, ${a.outcome} as outcome, sum(${a.n})::int as n
      from ${a}
      where ${cellWhere(a, filters, viewer)} and ${a.signed} and ${a.trigger} = 'wayside-acoustic'
      group by 1, 2, 3
    )
    select g.key, ${pricedSums()}
    from g left join ${sites} on ${sites.id} = g.site_id
    group by 1 order by 1`);
  return rows.map(toCell);
}

/** Every wayside detector named on an alarm: removals at any stage, outcomes of the signed ones. */
export async function detectorCounts(filters: TallyFilters, viewer: TallyViewer): Promise<DetectorCell[]> {
  // Summed per detector, trigger, signature, outcome and shop first, then priced at each shop's cost.
  const { rows } = await db.execute<OutcomeRow & { trigger: string; location: string | null; alarms: number }>(sql`
    with g as (
      select ${a.detectorId} as key, ${a.trigger} as trigger, ${a.signed} as signed, ${a.outcome} as outcome, ${a.siteId} as site_id,
        min(${a.detectorLocation}) as location, sum(${a.n})::int as n
      from ${a}
      where ${cellWhere(a, filters, viewer)} and ${a.detectorId} is not null
      group by 1, 2, 3, 4, 5
    )
    select g.key, g.trigger, min(g.location) as location, sum(g.n)::int as alarms, ${pricedSums(sql`g.signed`)}
    from g left join ${sites} on ${sites.id} = g.site_id
    group by 1, 2`);
  return rows.map((r) => ({ ...toCell(r), trigger: r.trigger, location: r.location, alarms: r.alarms }));
}

export async function triggerCosts(filters: TallyFilters, viewer: TallyViewer): Promise<OutcomeCell[]> {
  // Summed per trigger, shop and outcome first, then priced at each shop's cost.
  const { rows } = await db.execute<OutcomeRow>(sql`
    with g as (
      select ${c.trigger} as key, ${c.siteId} as site_id, ${c.outcome} as outcome, sum(${c.n})::int as n
      from ${c} where ${cellWhere(c, filters, viewer)} group by 1, 2, 3
    )
    select g.key, ${pricedSums()}
    from g left join ${sites} on ${sites.id} = g.site_id
    group by 1`);
  return rows.map(toCell);
}
