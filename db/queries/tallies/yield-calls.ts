// Field calls against teardown: remove calls per shop, per inspector and per quarter, and keep calls
// followed by a removal of the same car and position within a window (missed calls).
// Inspectors count only their own calls at their own shop.
import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { keepGaps, sites, user, yieldCells } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { CallCell, KeepCell, OutcomeCell } from "@/lib/tallies/yield-counts";
import { viewerSiteLimit, type TallyViewer } from "@/lib/tallies/site-limit";
import { cellWhere } from "./yield-scope";

export type CallViewer = TallyViewer & { id: string };

type Row = { by: "shop" | "person" | "quarter"; site_id: string | null; person: string | null; quarter: string | null; n: number; confirmed: number; no_defect: number; cost_usd: number; uncosted: number };

/** Remove calls, summed from the signed-outcome roll-up (db/schema/yield-cells.ts). */
export async function removeCalls(filters: TallyFilters, viewer: CallViewer): Promise<{ byShop: OutcomeCell[]; byInspector: OutcomeCell[]; byQuarter: CallCell[] }> {
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
      m.site_id, m.person, to_char(m.month, 'YYYY-"Q"Q') as quarter,
      sum(m.n)::int as n,
      coalesce(sum(m.n) filter (where m.outcome = 'confirmed'), 0)::int as confirmed,
      coalesce(sum(m.n) filter (where m.outcome = 'no-defect'), 0)::int as no_defect,
      coalesce(sum(m.n * ${sites.removalCostUsd}) filter (where m.outcome = 'no-defect'), 0)::float8 as cost_usd,
      coalesce(sum(m.n) filter (where m.outcome = 'no-defect' and ${sites.removalCostUsd} is null), 0)::int as uncosted
    from m left join ${sites} on ${sites.id} = m.site_id
    group by grouping sets ((m.site_id), (m.person), (m.site_id, to_char(m.month, 'YYYY-"Q"Q')))`);
  const cell = (key: string, r: Row): OutcomeCell => ({ key, n: r.n, confirmed: r.confirmed, noDefect: r.no_defect, costUsd: r.cost_usd, uncosted: r.uncosted });
  return {
    byShop: rows.filter((r) => r.by === "shop" && r.site_id).map((r) => cell(r.site_id!, r)),
    byInspector: rows.filter((r) => r.by === "person" && r.person).map((r) => cell(r.person!, r)),
    byQuarter: rows.filter((r) => r.by === "quarter" && r.site_id && r.quarter).map((r) => ({ ...cell(`${r.site_id}|${r.quarter}`, r), siteId: r.site_id, quarter: r.quarter })),
  };
}

/**
 * Keep calls and how many were followed, within `windowDays`, by a removal of the same car, axle and
 * side, from the keep-call roll-up (db/schema/yield-cells.ts). The later removal counts only if the
 * viewer may see it too: an inspector counts only later removals at their own shop, which is the
 * keep call's shop.
 */
export async function keepCalls(filters: TallyFilters, viewer: CallViewer, windowDays: number): Promise<{ byShop: KeepCell[]; byInspector: KeepCell[] }> {
  const k = keepGaps;
  const limit = viewerSiteLimit(viewer);
  const next = limit.limited ? k.nextSameSite : k.nextAny;
  const own = limit.limited ? eq(k.createdBy, viewer.id) : undefined;
  const { rows } = await db.execute<{ by_person: boolean; site_id: string | null; person: string | null; keeps: number; missed: number }>(sql`
    select grouping(${k.createdBy}) = 0 as by_person, ${k.siteId} as site_id, ${k.createdBy} as person,
      count(*)::int as keeps,
      count(*) filter (where ${next} <= ${k.removedOn} + ${windowDays}::int)::int as missed
    from ${k}
    where ${and(cellWhere(k, filters, viewer), own)}
    group by grouping sets ((${k.siteId}), (${k.createdBy}))`);
  return {
    byShop: rows.filter((r) => !r.by_person && r.site_id).map((r) => ({ key: r.site_id!, keeps: r.keeps, missed: r.missed })),
    byInspector: rows.filter((r) => r.by_person && r.person).map((r) => ({ key: r.person!, keeps: r.keeps, missed: r.missed })),
  };
}

/** Display names for the people behind the calls (only asked for when the viewer may see names). */
export async function peopleNames(ids: readonly string[]): Promise<Map<string, string>> {
  if (!ids.length) return new Map();
  const rows = await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, [...ids]));
  return new Map(rows.map((r) => [r.id, r.name]));
}
