// Case numbers: TL-YY-NNNNN, a sequence per year taken inside the caller's transaction.
import { sql } from "drizzle-orm";
import type { Db, Tx } from "@/db";
import { caseCounters } from "@/db/schema";

export function formatCaseNumber(year: number, seq: number): string {
  return `TL-${String(year % 100).padStart(2, "0")}-${String(seq).padStart(5, "0")}`;
}

export async function nextCaseNumber(tx: Db | Tx, year: number): Promise<string> {
  const [row] = await tx
    .insert(caseCounters)
    .values({ year, last: 1 })
    .onConflictDoUpdate({ target: caseCounters.year, set: { last: sql`${caseCounters.last} + 1` } })
    .returning({ last: caseCounters.last });
  return formatCaseNumber(year, row.last);
}
