// One pass over the filtered cells of tally_cells (the cases counted by the columns below, kept by
// triggers), two groupings (GROUPING SETS): signed verdicts by removal site, trigger, root cause and
// teardown outcome, and removals per month and cause. The Pareto, trigger x verdict, confirmation
// rates, cause x site and the monthly trend are all sums over these.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { tallyCells } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { MonthCell, Outcome, VerdictCell } from "@/lib/tallies/types";
import { tallyCellWhere, type TallyViewer } from "./scope";

type Row = {
  by_month: number;
  signed: boolean;
  site_id: string | null;
  trigger: string | null;
  cause: string | null;
  outcome: Outcome;
  month: string | null;
  count: number;
};

export async function tallyCounts(filters: TallyFilters, viewer: TallyViewer): Promise<{ cube: VerdictCell[]; months: MonthCell[] }> {
  const c = tallyCells;
  const { rows } = await db.execute<Row>(sql`
    select grouping(${c.month}) = 0 as by_month,
      ${c.signed} as signed, ${c.siteId} as site_id, ${c.trigger} as trigger,
      ${c.primaryCause} as cause, ${c.outcome} as outcome, left(${c.month}::text, 7) as month,
      sum(${c.n})::int as count
    from ${c}
    where ${tallyCellWhere(filters, viewer)}
    group by grouping sets (
      (${c.signed}, ${c.siteId}, ${c.trigger}, ${c.primaryCause}, ${c.outcome}),
      (${c.month}, ${c.signed}, ${c.primaryCause})
    )`);
  const cube: VerdictCell[] = [];
  const months: MonthCell[] = [];
  for (const r of rows) {
    if (!r.by_month) {
      if (r.signed)
        cube.push({ siteId: r.site_id, trigger: r.trigger ?? "other", cause: r.cause, outcome: r.outcome ?? null, count: r.count });
    } else if (r.month) {
      // before a verdict is signed the removal has no cause yet
      months.push({ month: r.month, signed: r.signed, cause: r.signed ? r.cause : null, count: r.count });
    }
  }
  return { cube, months };
}
