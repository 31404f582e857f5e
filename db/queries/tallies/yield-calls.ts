// Field calls against teardown: remove calls per shop, per inspector and per quarter, and keep calls
// followed by a removal of the same car and position within a window (missed calls).
// Inspectors count only their own calls at their own shop.
import "server-only";
import { and, eq, inArray, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { cases, sites, user } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { CallCell, KeepCell, OutcomeCell } from "@/lib/tallies/yield-counts";
import { tallyWhere, viewerSiteLimit, type TallyViewer } from "./scope";

export type CallViewer = TallyViewer & { id: string };

/** An inspector's own calls only; every other role reads all. */
export function ownCallsOnly(viewer: CallViewer): SQL | undefined {
  return viewerSiteLimit(viewer).limited ? eq(cases.createdBy, viewer.id) : undefined;
}

const callWhere = (filters: TallyFilters, viewer: CallViewer, signedOnly: boolean) =>
  and(tallyWhere(filters, viewer, { signedOnly }), ownCallsOnly(viewer)) ?? sql`true`;

type Row = { by: "shop" | "person" | "quarter"; site_id: string | null; person: string | null; quarter: string | null; n: number; confirmed: number; no_defect: number; cost_usd: number; uncosted: number };

export async function removeCalls(filters: TallyFilters, viewer: CallViewer): Promise<{ byShop: OutcomeCell[]; byInspector: OutcomeCell[]; byQuarter: CallCell[] }> {
  const quarter = sql`to_char(${cases.removedOn}, 'YYYY-"Q"Q')`;
  const { rows } = await db.execute<Row>(sql`
    select case when grouping(${cases.createdBy}) = 0 then 'person' when grouping(${quarter}) = 0 then 'quarter' else 'shop' end as by,
      ${cases.siteId} as site_id, ${cases.createdBy} as person, ${quarter} as quarter,
      count(*)::int as n,
      count(*) filter (where ${cases.removalConfirmed} = 'confirmed')::int as confirmed,
      count(*) filter (where ${cases.removalConfirmed} = 'no-defect')::int as no_defect,
      coalesce(sum(${sites.removalCostUsd}) filter (where ${cases.removalConfirmed} = 'no-defect'), 0)::float8 as cost_usd,
      count(*) filter (where ${cases.removalConfirmed} = 'no-defect' and ${sites.removalCostUsd} is null)::int as uncosted
    from ${cases} left join ${sites} on ${sites.id} = ${cases.siteId}
    where ${callWhere(filters, viewer, true)} and ${cases.fieldCall} = 'remove' and ${cases.removalConfirmed} is not null
    group by grouping sets ((${cases.siteId}), (${cases.createdBy}), (${cases.siteId}, ${quarter}))`);
  const cell = (key: string, r: Row): OutcomeCell => ({ key, n: r.n, confirmed: r.confirmed, noDefect: r.no_defect, costUsd: r.cost_usd, uncosted: r.uncosted });
  return {
    byShop: rows.filter((r) => r.by === "shop" && r.site_id).map((r) => cell(r.site_id!, r)),
    byInspector: rows.filter((r) => r.by === "person" && r.person).map((r) => cell(r.person!, r)),
    byQuarter: rows.filter((r) => r.by === "quarter" && r.site_id && r.quarter).map((r) => ({ ...cell(`${r.site_id}|${r.quarter}`, r), siteId: r.site_id, quarter: r.quarter })),
  };
}

/**
 * Keep calls and how many were followed, within `windowDays`, by a removal of the same car, axle and
 * side. The later removal counts only if the viewer may see it too.
 */
export async function keepCalls(filters: TallyFilters, viewer: CallViewer, windowDays: number): Promise<{ byShop: KeepCell[]; byInspector: KeepCell[] }> {
  const limit = viewerSiteLimit(viewer);
  const laterScope = limit.limited ? (limit.siteId ? sql`and later.site_id = ${limit.siteId}` : sql`and false`) : sql``;
  const { rows } = await db.execute<{ by_person: boolean; site_id: string | null; person: string | null; keeps: number; missed: number }>(sql`
    select grouping(${cases.createdBy}) = 0 as by_person, ${cases.siteId} as site_id, ${cases.createdBy} as person,
      count(*)::int as keeps,
      count(*) filter (where exists (
        select 1 from ${cases} later
        where later.car_mark = ${cases.carMark} and later.car_number = ${cases.carNumber}
          and later.axle = ${cases.axle} and later.side = ${cases.side}
          and later.removed_on > ${cases.removedOn} and later.removed_on <= ${cases.removedOn} + ${windowDays}::int
          and later.id <> ${cases.id} ${laterScope}
      ))::int as missed
    from ${cases}
    where ${callWhere(filters, viewer, false)} and ${cases.fieldCall} = 'keep'
      and ${cases.axle} is not null and ${cases.side} is not null and ${cases.removedOn} is not null
    group by grouping sets ((${cases.siteId}), (${cases.createdBy}))`);
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
