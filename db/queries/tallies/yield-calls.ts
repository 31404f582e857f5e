// Field calls against teardown: remove calls per shop, per inspector and per quarter, and keep calls
// followed by a removal of the same car and position within a window (missed calls).
// Inspectors count only their own calls at their own shop.
import "server-only";
import { and, eq, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { keepGaps, sites, user, yieldCells } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { CallCell, KeepCell, OutcomeCell } from "@/lib/tallies/yield-counts";
import { viewerSiteLimit, type TallyViewer } from "@/lib/tallies/site-limit";
import { cellWhere } from "./yield-scope";

export type CallViewer = TallyViewer & { id: string };

type Row = {
  by: "shop" | "person" | "quarter" | "name";
  name: string | null;
  site_id: string | null;
  person: string | null;
  quarter: string | null;
  n: number;
  confirmed: number;
  no_defect: number;
  cost_usd: number;
  uncosted: number;
};

/**
 * Display names of the people in the `person` column of subquery `m`, as rows of `by`, `person` and
 * `name` (the other columns null or 0), when `withNames`; nothing otherwise. They come with the counts
 * so the page needs no second round trip once it knows who made the calls.
 */
const nameRows = (withNames: boolean, columns: SQL) =>
  withNames
    ? sql`union all select 'name', ${user.id}, ${user.name}, ${columns} from ${user} where ${user.id} in (select m.person from m)`
    : sql``;

/** Remove calls, summed from the signed-outcome roll-up (db/schema/yield-cells.ts), with the inspectors' names when `withNames`. */
export async function removeCalls(
  filters: TallyFilters,
  viewer: CallViewer,
  withNames: boolean,
): Promise<{ byShop: OutcomeCell[]; byInspector: OutcomeCell[]; byQuarter: CallCell[]; names: Map<string, string> }> {
  const c = yieldCells;
  const own = viewerSiteLimit(viewer).limited ? eq(c.createdBy, viewer.id) : undefined;
  // Summed per shop, person and month first; the quarter and the money are worked out on those few rows.
  const { rows } = await db.execute<Row>(sql`
    with m as (
      select ${c.siteId} as site_id, ${c.createdBy} as person, ${c.month} as month, ${c.outcome} as outcome, sum(${c.n})::int as n
      from ${c}
      where ${and(cellWhere(c, filters, viewer), own)} and ${c.removeCall}
      group by 1, 2, 3, 4
    )
    select case when grouping(m.person) = 0 then 'person' when grouping(to_char(m.month, 'YYYY-"Q"Q')) = 0 then 'quarter' else 'shop' end as by,
      m.person, null as name, m.site_id, to_char(m.month, 'YYYY-"Q"Q') as quarter,
      sum(m.n)::int as n,
      coalesce(sum(m.n) filter (where m.outcome = 'confirmed'), 0)::int as confirmed,
      coalesce(sum(m.n) filter (where m.outcome = 'no-defect'), 0)::int as no_defect,
      coalesce(sum(m.n * ${sites.removalCostUsd}) filter (where m.outcome = 'no-defect'), 0)::float8 as cost_usd,
      coalesce(sum(m.n) filter (where m.outcome = 'no-defect' and ${sites.removalCostUsd} is null), 0)::int as uncosted
    from m left join ${sites} on ${sites.id} = m.site_id
    group by grouping sets ((m.site_id), (m.person), (m.site_id, to_char(m.month, 'YYYY-"Q"Q')))
    ${nameRows(withNames, sql`null, null, 0, 0, 0, 0, 0`)}`);
  const cell = (key: string, r: Row): OutcomeCell => ({
    key,
    n: r.n,
    confirmed: r.confirmed,
    noDefect: r.no_defect,
    costUsd: r.cost_usd,
    uncosted: r.uncosted,
  });
  return {
    byShop: rows.filter((r) => r.by === "shop" && r.site_id).map((r) => cell(r.site_id!, r)),
    byInspector: rows.filter((r) => r.by === "person" && r.person).map((r) => cell(r.person!, r)),
    byQuarter: rows
      .filter((r) => r.by === "quarter" && r.site_id && r.quarter)
      .map((r) => ({ ...cell(`${r.site_id}|${r.quarter}`, r), siteId: r.site_id, quarter: r.quarter })),
    names: namesOf(rows),
  };
}

/**
 * Keep calls and how many were followed, within `windowDays`, by a removal of the same car, axle and
 * side, from the keep-call roll-up (db/schema/yield-cells.ts). The later removal counts only if the
 * viewer may see it too: an inspector counts only later removals at their own shop, which is the
 * keep call's shop. With the inspectors' names when `withNames`.
 */
export async function keepCalls(
  filters: TallyFilters,
  viewer: CallViewer,
  windowDays: number,
  withNames: boolean,
): Promise<{ byShop: KeepCell[]; byInspector: KeepCell[]; names: Map<string, string> }> {
  const k = keepGaps;
  const limit = viewerSiteLimit(viewer);
  const next = limit.limited ? k.nextSameSite : k.nextAny;
  const own = limit.limited ? eq(k.createdBy, viewer.id) : undefined;
  const { rows } = await db.execute<{
    by: "shop" | "person" | "name";
    person: string | null;
    name: string | null;
    site_id: string | null;
    keeps: number;
    missed: number;
  }>(sql`
    with m as (
      select case when grouping(${k.createdBy}) = 0 then 'person' else 'shop' end as by, ${k.createdBy} as person, ${k.siteId} as site_id,
        count(*)::int as keeps,
        count(*) filter (where ${next} <= ${k.removedOn} + ${windowDays}::int)::int as missed
      from ${k}
      where ${and(cellWhere(k, filters, viewer), own)}
      group by grouping sets ((${k.siteId}), (${k.createdBy}))
    )
    select m.by, m.person, null as name, m.site_id, m.keeps, m.missed from m
    ${nameRows(withNames, sql`null, 0, 0`)}`);
  return {
    byShop: rows.filter((r) => r.by === "shop" && r.site_id).map((r) => ({ key: r.site_id!, keeps: r.keeps, missed: r.missed })),
    byInspector: rows.filter((r) => r.by === "person" && r.person).map((r) => ({ key: r.person!, keeps: r.keeps, missed: r.missed })),
    names: namesOf(rows),
  };
}

function namesOf(rows: readonly { by: string; person: string | null; name: string | null }[]): Map<string, string> {
  return new Map(rows.filter((r) => r.by === "name" && r.person).map((r) => [r.person!, r.name ?? ""]));
}
