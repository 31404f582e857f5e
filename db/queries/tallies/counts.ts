// One pass over the filtered cases, two groupings (GROUPING SETS): signed verdicts by removal site,
// trigger, root cause and teardown outcome, and removals per month and cause. The Pareto, trigger x
// verdict, confirmation rates, cause x site and the monthly trend are all sums over these.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { MonthCell, Outcome, VerdictCell } from "@/lib/tallies/types";
import { tallyWhere, type TallyViewer } from "./scope";

type Row = { by_month: number; signed: boolean; site_id: string | null; trigger: string | null; cause: string | null; outcome: Outcome; month: string | null; count: number };

export async function tallyCounts(filters: TallyFilters, viewer: TallyViewer): Promise<{ cube: VerdictCell[]; months: MonthCell[] }> {
  const { rows } = await db.execute<Row>(sql`
    select grouping(left(${cases.removedOn}::text, 7)) = 0 as by_month,
      ${cases.status} = 'signed' as signed, ${cases.siteId} as site_id, ${cases.trigger} as trigger,
      ${cases.primaryCause} as cause, ${cases.removalConfirmed} as outcome, left(${cases.removedOn}::text, 7) as month,
      count(*)::int as count
    from ${cases}
    where ${tallyWhere(filters, viewer)}
    group by grouping sets (
      (${cases.status} = 'signed', ${cases.siteId}, ${cases.trigger}, ${cases.primaryCause}, ${cases.removalConfirmed}),
      (left(${cases.removedOn}::text, 7), ${cases.status} = 'signed', ${cases.primaryCause})
    )`);
  const cube: VerdictCell[] = [];
  const months: MonthCell[] = [];
  for (const r of rows) {
    if (!r.by_month) {
      if (r.signed) cube.push({ siteId: r.site_id, trigger: r.trigger ?? "other", cause: r.cause, outcome: r.outcome ?? null, count: r.count });
    } else if (r.month) {
      // before a verdict is signed the removal has no cause yet
      months.push({ month: r.month, signed: r.signed, cause: r.signed ? r.cause : null, count: r.count });
    }
  }
  return { cube, months };
}
