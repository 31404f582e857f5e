// The week's activity for the digest: removals logged and verdicts signed in the last seven days.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";

export async function weekCounts(since: Date): Promise<{ removals: number; signed: number }> {
  const [row] = await db
    .select({
      removals: sql<number>`count(*) filter (where ${cases.createdAt} >= ${since.toISOString()})::int`,
      signed: sql<number>`count(*) filter (where ${cases.signedAt} >= ${since.toISOString()} and ${cases.status} = 'signed')::int`,
    })
    .from(cases)
    .where(sql`${cases.createdAt} >= ${since.toISOString()} or ${cases.signedAt} >= ${since.toISOString()}`);
  return { removals: row?.removals ?? 0, signed: row?.signed ?? 0 };
}
