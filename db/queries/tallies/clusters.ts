// Recurring causes: the same cause at the same site, car or bearing lot within a window of days.
// Found in SQL by the rule of findClusters (lib/stats/clusters.ts), working on removal days:
// a window starts on every day whose [day, day + W] holds at least minSize cases of its group;
// overlapping windows merge into one cluster. Only the newest clusters fetch their case numbers.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import type { ClusterKey, TallyFilters } from "@/lib/tallies/filters";
import { tallyWhere, type TallyViewer } from "./scope";

export type ClusterRow = { key: string; cause: string; firstDate: string; lastDate: string; size: number; caseNumbers: string[]; total: number };

export const defaultMinSize = (kind: ClusterKey) => (kind === "site" ? 3 : 2);

function keyOf(kind: ClusterKey): { key: SQL; present: SQL } {
  if (kind === "site") return { key: sql`${cases.siteId}::text`, present: sql`${cases.siteId} is not null` };
  if (kind === "car") return { key: sql`${cases.carMark} || ' ' || ${cases.carNumber}`, present: sql`${cases.carMark} <> '' and ${cases.carNumber} <> ''` };
  return { key: sql`${cases.lot}`, present: sql`coalesce(${cases.lot}, '') <> ''` };
}

export async function recurringClusters(filters: TallyFilters, viewer: TallyViewer, limit = 50): Promise<{ rows: ClusterRow[]; minSize: number }> {
  const minSize = defaultMinSize(filters.cluster);
  const window = sql.raw(`'${Math.trunc(filters.window)} days'::interval`);
  const { key, present } = keyOf(filters.cluster);
  const result = await db.execute<{ k: string; cause: string; first_d: string; last_d: string; size: number; total: number; numbers: string[] }>(sql`
    with ev as (
      select ${cases.number} as number, ${cases.removedOn} as d, ${key} as k, ${cases.primaryCause} as cause
      from ${cases}
      where ${tallyWhere(filters, viewer, { signedOnly: true })}
        and ${cases.removedOn} is not null and ${cases.primaryCause} is not null and ${present}
    ),
    days as (select k, cause, d, count(*)::int as n from ev group by 1, 2, 3),
    big_enough as (select k, cause from days group by 1, 2 having sum(n) >= ${minSize}),
    w as (
      select days.*, sum(n) over fwd as fwd_n, last_value(d) over fwd as reach
      from days join big_enough using (k, cause)
      window fwd as (partition by k, cause order by d range between current row and ${window} following)
    ),
    covered as (
      select *, max(case when fwd_n >= ${minSize} then reach end) over (partition by k, cause order by d rows unbounded preceding) as cover
      from w
    ),
    chained as (select *, lag(cover) over (partition by k, cause order by d) as prev_cover from covered),
    members as (
      select *, max(case when prev_cover is null or d > prev_cover then d end)
        over (partition by k, cause order by d rows unbounded preceding) as start_d
      from chained where d <= cover
    ),
    clusters as (
      select k, cause, start_d, max(d) as last_d, sum(n)::int as size, (count(*) over ())::int as total
      from members group by 1, 2, 3
      order by max(d) desc, sum(n) desc, k, cause
      limit ${limit}
    )
    select c.k, c.cause, c.start_d::text as first_d, c.last_d::text as last_d, c.size, c.total,
      (array_agg(ev.number order by ev.d, ev.number))[1:60] as numbers
    from clusters c join ev on ev.k = c.k and ev.cause = c.cause and ev.d between c.start_d and c.last_d
    group by c.k, c.cause, c.start_d, c.last_d, c.size, c.total
    order by c.last_d desc, c.size desc, c.k, c.cause`);
  return {
    minSize,
    rows: result.rows.map((r) => ({
      key: r.k,
      cause: r.cause,
      firstDate: r.first_d,
      lastDate: r.last_d,
      size: r.size,
      caseNumbers: r.numbers,
      total: r.total,
    })),
  };
}
