// The week's activity for the digest: removals logged and verdicts signed in the last seven days,
// and the verdicts waiting for sign-off now.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";

export type WeekCounts = { removals: number; signed: number; awaitingSignoff: number };

export async function weekCounts(since: Date): Promise<WeekCounts> {
  const at = since.toISOString();
  const { rows } = await db.execute<WeekCounts>(sql`
    select
      (select count(*) from ${cases} where ${cases.createdAt} >= ${at})::int as "removals",
      (select count(*) from ${cases} where ${cases.status} = 'signed' and ${cases.signedAt} >= ${at})::int as "signed",
      (select count(*) from ${cases} where ${cases.status} = 'signoff')::int as "awaitingSignoff"`);
  return rows[0] ?? { removals: 0, signed: 0, awaitingSignoff: 0 };
}
