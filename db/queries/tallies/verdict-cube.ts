// Signed verdicts counted by removal site, trigger, root cause and teardown outcome in one
// GROUP BY; the Pareto, trigger x verdict, confirmation rates and cause x site are sums over it.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { VerdictCell } from "@/lib/tallies/types";
import { tallyWhere, type TallyViewer } from "./scope";

export async function verdictCube(filters: TallyFilters, viewer: TallyViewer): Promise<VerdictCell[]> {
  const rows = await db
    .select({
      siteId: cases.siteId,
      trigger: cases.trigger,
      cause: cases.primaryCause,
      outcome: cases.removalConfirmed,
      count: sql<number>`count(*)::int`,
    })
    .from(cases)
    .where(tallyWhere(filters, viewer, { signedOnly: true }))
    .groupBy(cases.siteId, cases.trigger, cases.primaryCause, cases.removalConfirmed);
  return rows.map((r) => ({ ...r, outcome: r.outcome ?? null }));
}
