// Recurring causes: the same cause at the same site, car or bearing lot within a window of days.
// Found in SQL by the rule of findClusters (lib/stats/clusters.ts), working on removal days:
// a window starts on every day whose [day, day + W] holds at least minSize cases of its group;
// overlapping windows merge into one cluster. Only the newest clusters fetch case numbers.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { cases, recurrenceCarCounts, recurrenceLotCounts } from "@/db/schema";
import type { ClusterKey, TallyFilters } from "@/lib/tallies/filters";
import { tallyWhere, type TallyViewer } from "./scope";

export type ClusterRow = {
  key: string;
  cause: string;
  firstDate: string;
  lastDate: string;
  size: number;
  caseNumbers: string[];
  total: number;
};

/** Each cluster lists its newest cases; the size says how many there are in all. */
export const NUMBERS_SHOWN = 24;

export const defaultMinSize = (kind: ClusterKey) => (kind === "site" ? 3 : 2);

/** The columns that make a group's key, and the words shown for it. */
function keyOf(kind: ClusterKey): { cols: SQL; label: SQL; match: SQL; present: SQL } {
  if (kind === "site") {
    return {
      cols: sql`${cases.siteId}`,
      label: sql`c.site_id::text`,
      match: sql`${cases.siteId} = c.site_id`,
      present: sql`${cases.siteId} is not null`,
    };
  }
  if (kind === "car") {
    return {
      cols: sql`${cases.carMark}, ${cases.carNumber}`,
      label: sql`c.car_mark || ' ' || c.car_number`,
      match: sql`${cases.carMark} = c.car_mark and ${cases.carNumber} = c.car_number`,
      present: sql`${cases.carMark} <> '' and ${cases.carNumber} <> ''`,
    };
  }
  return { cols: sql`${cases.lot}`, label: sql`c.lot`, match: sql`${cases.lot} = c.lot`, present: sql`coalesce(${cases.lot}, '') <> ''` };
}

const KEY_NAMES: Record<ClusterKey, SQL> = {
  site: sql.raw("site_id"),
  car: sql.raw("car_mark, car_number"),
  lot: sql.raw("lot"),
};

export async function recurringClusters(
  filters: TallyFilters,
  viewer: TallyViewer,
  limit = 50,
): Promise<{ rows: ClusterRow[]; minSize: number }> {
  const minSize = defaultMinSize(filters.cluster);
  const window = sql.raw(`'${Math.trunc(filters.window)} days'::interval`);
  const { cols, label, match, present } = keyOf(filters.cluster);
  const k = KEY_NAMES[filters.cluster];
  const where = sql`${tallyWhere(filters, viewer, { signedOnly: true })} and ${cases.removedOn} is not null and ${cases.primaryCause} is not null and ${present}`;
  // Cars and lots are many and mostly seen once: only keys with enough signed removals in all (the
  // counts kept by triggers, whatever the filters) can hold a cluster within the filters, so the window
  // work sees only their cases. Sites are few and busy, so there the pre-filter would only cost time.
  const repeated =
    filters.cluster === "car"
      ? sql`(select car_mark, car_number, primary_cause from ${recurrenceCarCounts} where n >= ${sql.raw(String(minSize))})`
      : sql`(select lot, primary_cause from ${recurrenceLotCounts} where n >= ${sql.raw(String(minSize))})`;
  const source =
    filters.cluster === "site"
      ? sql`select ${cols}, ${cases.primaryCause} as cause, ${cases.removedOn} as d from ${cases} where ${where}`
      : sql`select ${cols}, ${cases.primaryCause} as cause, ${cases.removedOn} as d from ${cases} join ${repeated} big using (${k}, primary_cause) where ${where}`;
  const result = await db.execute<{
    k: string;
    cause: string;
    first_d: string;
    last_d: string;
    size: number;
    total: number;
    numbers: string[];
  }>(sql`
    with days as (
      select ${k}, cause, d, count(*)::int as n from (${source}) src group by ${k}, cause, d
    ),
    w as (
      select days.*, sum(n) over (partition by ${k}, cause order by d range between current row and ${window} following) as fwd_n
      from days
    ),
    -- a day is in a cluster when some earlier qualifying window reaches it (or its own window qualifies);
    -- a window starting on day s reaches every day up to s + W
    chained as (
      select *, max(case when fwd_n >= ${minSize} then d + ${window} end)
        over (partition by ${k}, cause order by d rows between unbounded preceding and 1 preceding) as prev_cover
      from w
    ),
    members as (
      select *, max(case when prev_cover is null or d > prev_cover then d end)
        over (partition by ${k}, cause order by d rows unbounded preceding) as start_d
      from chained where fwd_n >= ${minSize} or d <= prev_cover
    ),
    clusters as (
      select ${k}, cause, start_d, max(d) as last_d, sum(n)::int as size, (count(*) over ())::int as total
      from members group by ${k}, cause, start_d
      order by max(d) desc, sum(n) desc, ${k}, cause
      limit ${limit}
    )
    select ${label} as k, c.cause, c.start_d::text as first_d, c.last_d::text as last_d, c.size, c.total,
      array(
        select ${cases.number} from ${cases}
        where ${where} and ${match} and ${cases.primaryCause} = c.cause and ${cases.removedOn} between c.start_d and c.last_d
        order by ${cases.removedOn} desc, ${cases.number} desc limit ${NUMBERS_SHOWN}
      ) as numbers
    from clusters c
    order by c.last_d desc, c.size desc, 1, c.cause`);
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
