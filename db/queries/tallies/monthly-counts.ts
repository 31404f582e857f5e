// Removals per month (every stage) and signed verdicts per month and cause, counted in PostgreSQL.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { MonthCell } from "@/lib/tallies/types";
import { tallyWhere, type TallyViewer } from "./scope";

export async function monthlyCounts(filters: TallyFilters, viewer: TallyViewer): Promise<MonthCell[]> {
  const month = sql<string>`to_char(${cases.removedOn}, 'YYYY-MM')`;
  // The cause counts only once a verdict is signed; before that the removal has no cause yet.
  const signed = sql<boolean>`${cases.status} = 'signed'`;
  const cause = sql<string | null>`case when ${cases.status} = 'signed' then ${cases.primaryCause} end`;
  return db
    .select({ month, signed, cause, count: sql<number>`count(*)::int` })
    .from(cases)
    .where(sql`${tallyWhere(filters, viewer)} and ${cases.removedOn} is not null`)
    .groupBy(sql`1`, sql`2`, sql`3`);
}
