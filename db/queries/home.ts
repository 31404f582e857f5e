import "server-only";
import { desc, eq, inArray, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { cases, sites } from "@/db/schema";
import type { Stage } from "@/lib/cases/stages";

export type CaseCard = { id: string; number: string; status: Stage; carMark: string; carNumber: string; trigger: string; removedOn: string | null; siteName: string | null; updatedAt: Date };

const cardColumns = {
  id: cases.id, number: cases.number, status: cases.status, carMark: cases.carMark, carNumber: cases.carNumber,
  trigger: cases.trigger, removedOn: cases.removedOn, siteName: sites.name, updatedAt: cases.updatedAt,
};

export async function stageCounts(scope?: SQL): Promise<Record<Stage, number>> {
  const rows = await db.select({ status: cases.status, n: sql<number>`count(*)::int` }).from(cases).where(scope).groupBy(cases.status);
  const out: Record<Stage, number> = { field: 0, bench: 0, signoff: 0, signed: 0 };
  for (const r of rows) out[r.status] = r.n;
  return out;
}

export async function caseCards(where: SQL | undefined, limit = 8): Promise<CaseCard[]> {
  return db.select(cardColumns).from(cases).leftJoin(sites, eq(sites.id, cases.siteId)).where(where).orderBy(desc(cases.updatedAt)).limit(limit);
}

export const inStages = (stages: Stage[]) => inArray(cases.status, stages);
