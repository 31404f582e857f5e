// Service life at removal, counted by cause and life in PostgreSQL, plus the newest fleet list
// of units still in service (the suspensions a life analysis needs).
import "server-only";
import { and, desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, fleetUnits, user } from "@/db/schema";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { FleetCountRow, LifeCountRow, LifeMeasure } from "@/lib/tallies/life";
import type { FleetBatch } from "@/lib/tallies/life-data";
import { tallyWhere, type TallyViewer } from "./scope";

export async function lifeCounts(filters: TallyFilters, viewer: TallyViewer, measure: LifeMeasure): Promise<{ rows: LifeCountRow[]; withoutLife: number }> {
  const life = measure === "months" ? sql`${cases.serviceMonths}::float8` : sql`${cases.serviceMiles}::float8`;
  const where = tallyWhere(filters, viewer, { signedOnly: true });
  const [rows, missing] = await Promise.all([
    db
      .select({ cause: cases.primaryCause, time: sql<number>`${life}`, count: sql<number>`count(*)::int` })
      .from(cases)
      .where(sql`${where} and ${life} > 0`)
      .groupBy(sql`1`, sql`2`),
    db.select({ n: sql<number>`count(*)::int` }).from(cases).where(sql`${where} and (${life} is null or ${life} <= 0)`),
  ]);
  return { rows: rows.map((r) => ({ ...r, time: Number(r.time) })), withoutLife: missing[0]?.n ?? 0 };
}

export async function latestFleetBatch(): Promise<FleetBatch | null> {
  const [row] = await db
    .select({ batchId: fleetUnits.batchId, uploadedAt: sql<string>`max(${fleetUnits.uploadedAt})::text`, uploadedBy: sql<string | null>`min(${user.name})`, units: sql<number>`count(*)::int` })
    .from(fleetUnits)
    .leftJoin(user, eq(user.id, fleetUnits.uploadedBy))
    .groupBy(fleetUnits.batchId)
    .orderBy(desc(sql`max(${fleetUnits.uploadedAt})`))
    .limit(1);
  return row ?? null;
}

export async function fleetCounts(batchId: string, measure: LifeMeasure, bearingClass?: string): Promise<FleetCountRow[]> {
  const life = measure === "months" ? sql`${fleetUnits.serviceMonths}::float8` : sql`${fleetUnits.serviceMiles}::float8`;
  const rows = await db
    .select({ time: sql<number>`${life}`, count: sql<number>`count(*)::int` })
    .from(fleetUnits)
    .where(and(eq(fleetUnits.batchId, batchId), bearingClass ? eq(fleetUnits.bearingClass, bearingClass) : undefined, sql`${life} > 0`))
    .groupBy(sql`1`);
  return rows.map((r) => ({ time: Number(r.time), count: r.count }));
}
