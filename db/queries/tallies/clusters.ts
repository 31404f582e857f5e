// Recurring causes: the same cause at the same site, car or bearing lot within a window of days.
// Found in SQL by the rule of findClusters (lib/stats/clusters.ts), working on removal days:
// a window starts on every day whose [day, day + W] holds at least minSize cases of its group;
// overlapping windows merge into one cluster. Only the newest clusters fetch case numbers.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import type { ClusterKey, TallyFilters } from "@/lib/tallies/filters";
import { tallyWhere, type TallyViewer } from "./scope";

export type ClusterRow = { key: string; cause: string; firstDate: string; lastDate: string; size: number; caseNumbers: string[]; total: number };

/** Each cluster lists its newest cases; the size says how many there are in all. */
export const NUMBERS_SHOWN = 24;

export const defaultMinSize = (kind: ClusterKey) => (kind === "site" ? 3 : 2);

function keyOf(kind: ClusterKey): { key: SQL; present: SQL } {
  if (kind === "site") return { key: sql`${cases.siteId}`, present: sql`${cases.siteId} is not null` };
  if (kind === "car") return { key: sql`${cases.carMark} || ' ' || ${cases.carNumber}`, present: sql`${cases.carMark} <> '' and ${cases.carNumber} <> ''` };
  return { key: sql`${cases.lot}`, present: sql`coalesce(${cases.lot}, '') <> ''` };
}

export async function recurringClusters(filters: TallyFilters, viewer: TallyViewer, limit = 50): Promise<{ rows: ClusterRow[]; minSize: number }> {
  const minSize = defaultMinSize(filters.cluster);
  const window = sql.raw(`'${Math.trunc(filters.window)} days'::interval`);
  const { key, present } = keyOf(filters.cluster);
  const where = sql`${tallyWhere(filters, viewer, { signedOnly: true })} and ${cases.removedOn} is not null and ${cases.primaryCause} is not null and ${present}`;
  // Sites are few and busy: every group is big enough, so the pre-filter would only cost time.
  const bigEnough = filters.cluster === "site" ? sql`` : sql`join (select k, cause from days group by 1, 2 having sum(n) >= ${minSize}) big using (k, cause)`;
  const result = await db.execute<{ k: string; cause: string; first_d: string; last_d: string; size: number; total: number; numbers: string[] }>(sql`
    with days as (
      select ${key} as k, ${cases.primaryCause} as cause, ${cases.removedOn} as d, count(*)::int as n
      from ${cases} where ${where}
      group by 1, 2, 3
    ),
    w as (
      select days.*, sum(n) over (partition by k, cause order by d range between current row and ${window} following) as fwd_n
      from days ${bigEnough}
    ),
    -- a day is in a cluster when some earlier qualifying window reaches it (or its own window qualifies);
    -- a window starting on day s reaches every day up to s + W
    chained as (
      select *, max(case when fwd_n >= ${minSize} then d + ${window} end)
        over (partition by k, cause order by d rows between unbounded preceding and 1 preceding) as prev_cover
      from w
    ),
    members as (
      select *, max(case when prev_cover is null or d > prev_cover then d end)
        over (partition by k, cause order by d rows unbounded preceding) as start_d
      from chained where fwd_n >= ${minSize} or d <= prev_cover
    ),
    clusters as (
      select k, cause, start_d, max(d) as last_d, sum(n)::int as size, (count(*) over ())::int as total
      from members group by 1, 2, 3
      order by max(d) desc, sum(n) desc, k, cause
      limit ${limit}
    )
    select c.k::text as k, c.cause, c.start_d::text as first_d, c.last_d::text as last_d, c.size, c.total,
      array(
        select ${cases.number} from ${cases}
        where ${where} and ${key} = c.k and ${cases.primaryCause} = c.cause and ${cases.removedOn} between c.start_d and c.last_d
        order by ${cases.removedOn} desc, ${cases.number} desc limit ${NUMBERS_SHOWN}
      ) as numbers
    from clusters c
    order by c.last_d desc, c.size desc, c.k, c.cause`);
  return {
    minSize,
    rows: result.rows.map((r) => ({ key: r.k, cause: r.cause, firstDate: r.first_d, lastDate: r.last_d, size: r.size, caseNumbers: r.numbers, total: r.total })),
  };
}
