import "server-only";
import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, sites } from "@/db/schema";
import type { Stage } from "@/lib/cases/stages";
import { readableCases, type CaseViewer } from "./case-scope";

export type CaseCard = {
  id: string;
  number: string;
  status: Stage;
  carMark: string;
  carNumber: string;
  trigger: string;
  removedOn: string | null;
  siteName: string | null;
  updatedAt: Date;
};

const cardColumns = {
  id: cases.id,
  number: cases.number,
  status: cases.status,
  carMark: cases.carMark,
  carNumber: cases.carNumber,
  trigger: cases.trigger,
  removedOn: cases.removedOn,
  siteName: sites.name,
  updatedAt: cases.updatedAt,
};

/** Cases per stage among those the viewer may read. */
export async function stageCounts(viewer: CaseViewer): Promise<Record<Stage, number>> {
  const rows = await db
    .select({ status: cases.status, n: sql<number>`count(*)::int` })
    .from(cases)
    .where(readableCases(viewer))
    .groupBy(cases.status);
  const out: Record<Stage, number> = { field: 0, bench: 0, signoff: 0, signed: 0 };
  for (const r of rows) out[r.status] = r.n;
  return out;
}

/** The most recently updated cases the viewer may read, in the given stages (all when none). */
export async function caseCards(viewer: CaseViewer, stages?: Stage[], limit = 8): Promise<CaseCard[]> {
  const where = and(readableCases(viewer), stages ? inArray(cases.status, stages) : undefined);
  return db
    .select(cardColumns)
    .from(cases)
    .leftJoin(sites, eq(sites.id, cases.siteId))
    .where(where)
    .orderBy(desc(cases.updatedAt))
    .limit(limit);
}
