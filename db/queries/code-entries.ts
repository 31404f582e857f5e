// The classification lists as stored (seeded from lib/classification, extended by admins).
import "server-only";
import { and, asc, count, countDistinct, eq, isNull, max, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, codeEntries, findings, type CodeListName } from "@/db/schema";

export async function listCodeEntries(list?: CodeListName, opts: { includeRetired?: boolean } = {}) {
  const conditions = [list ? eq(codeEntries.list, list) : undefined, opts.includeRetired ? undefined : isNull(codeEntries.retiredAt)];
  return db
    .select()
    .from(codeEntries)
    .where(and(...conditions))
    .orderBy(asc(codeEntries.list), asc(codeEntries.sortOrder), asc(codeEntries.code));
}

export async function getCodeEntry(list: CodeListName, code: string) {
  const [row] = await db
    .select()
    .from(codeEntries)
    .where(and(eq(codeEntries.list, list), eq(codeEntries.code, code)));
  return row ?? null;
}

/** A new code goes to the end of its list. */
export async function insertCodeEntry(values: Omit<typeof codeEntries.$inferInsert, "sortOrder">) {
  return db.transaction(async (tx) => {
    const [{ last }] = await tx
      .select({ last: max(codeEntries.sortOrder) })
      .from(codeEntries)
      .where(eq(codeEntries.list, values.list));
    const [row] = await tx
      .insert(codeEntries)
      .values({ ...values, sortOrder: (last ?? -1) + 1 })
      .onConflictDoNothing()
      .returning();
    return row ?? null;
  });
}

export async function updateCodeEntry(list: CodeListName, code: string, values: Partial<typeof codeEntries.$inferInsert>) {
  const [row] = await db
    .update(codeEntries)
    .set(values)
    .where(and(eq(codeEntries.list, list), eq(codeEntries.code, code)))
    .returning();
  return row ?? null;
}

/** How many cases use a code: damage codes through findings, causes and triggers on the case. */
export async function casesUsingCode(list: CodeListName, code: string): Promise<number> {
  if (list === "damage") {
    const [row] = await db
      .select({ n: countDistinct(findings.caseId) })
      .from(findings)
      .where(eq(findings.damageCode, code));
    return row.n;
  }
  const where =
    list === "cause" ? or(eq(cases.primaryCause, code), sql`${code} = any(${cases.contributingCauses})`) : eq(cases.trigger, code);
  const [row] = await db.select({ n: count() }).from(cases).where(where);
  return row.n;
}

/** Cases per code for one list, for the admin table. */
export async function codeUsageCounts(list: CodeListName): Promise<Map<string, number>> {
  const rows =
    list === "damage"
      ? await db
          .select({ code: findings.damageCode, n: countDistinct(findings.caseId) })
          .from(findings)
          .groupBy(findings.damageCode)
      : list === "trigger"
        ? await db.select({ code: cases.trigger, n: count() }).from(cases).groupBy(cases.trigger)
        : (
            await db.execute<{ code: string; n: string }>(sql`
              select code, count(distinct id) as n from (
                select id, primary_cause as code from cases where primary_cause is not null
                union all
                select id, unnest(contributing_causes) as code from cases
              ) used group by code`)
          ).rows.map((r) => ({ code: r.code, n: Number(r.n) }));
  return new Map(rows.map((r) => [r.code as string, Number(r.n)]));
}

/** Deletes a code only while nothing uses it, in one statement so a case saved meanwhile cannot slip past. */
export async function deleteUnusedCodeEntry(list: CodeListName, code: string): Promise<boolean> {
  const inUse =
    list === "damage"
      ? sql`exists (select 1 from ${findings} where ${findings.damageCode} = ${code})`
      : list === "cause"
        ? sql`exists (select 1 from ${cases} where ${cases.primaryCause} = ${code} or ${code} = any(${cases.contributingCauses}))`
        : sql`exists (select 1 from ${cases} where ${cases.trigger} = ${code})`;
  const rows = await db
    .delete(codeEntries)
    .where(and(eq(codeEntries.list, list), eq(codeEntries.code, code), sql`not ${inUse}`))
    .returning({ code: codeEntries.code });
  return rows.length > 0;
}
