import "server-only";
import { eq, inArray, like, sql } from "drizzle-orm";
import { db } from "@/db";
import { signInFailures } from "@/db/schema";
import type { Counter } from "@/lib/security/sign-in-rules";

export async function readCounters(keys: string[]): Promise<Map<string, Counter>> {
  const rows = await db.select().from(signInFailures).where(inArray(signInFailures.key, keys));
  return new Map(rows.map((r) => [r.key, r]));
}

/**
 * Adds one failure in a single statement (so parallel app processes never lose a count); a window
 * that has run out starts again at one. Locks the key for lockMinutes once it reaches lockAt.
 */
export async function addFailure(key: string, windowSeconds: number, lockAt: number | null, lockMinutes: number): Promise<Counter> {
  const lockClause =
    lockAt === null
      ? sql`null`
      : sql`case when (case when ${signInFailures.windowStart} < now() - make_interval(secs => ${windowSeconds}) then 1 else ${signInFailures.failures} + 1 end) >= ${lockAt} then now() + make_interval(mins => ${lockMinutes}) else ${signInFailures.lockedUntil} end`;
  const [row] = await db
    .insert(signInFailures)
    .values({ key, failures: 1, lockedUntil: lockAt !== null && lockAt <= 1 ? sql`now() + make_interval(mins => ${lockMinutes})` : null })
    .onConflictDoUpdate({
      target: signInFailures.key,
      set: {
        lockedUntil: lockClause,
        failures: sql`case when ${signInFailures.windowStart} < now() - make_interval(secs => ${windowSeconds}) then 1 else ${signInFailures.failures} + 1 end`,
        windowStart: sql`case when ${signInFailures.windowStart} < now() - make_interval(secs => ${windowSeconds}) then now() else ${signInFailures.windowStart} end`,
      },
    })
    .returning();
  return row;
}

export async function clearCounter(key: string) {
  await db.delete(signInFailures).where(eq(signInFailures.key, key));
}

export async function lockedAccountKeys(): Promise<string[]> {
  const rows = await db
    .select({ key: signInFailures.key })
    .from(signInFailures)
    .where(sql`${like(signInFailures.key, "account:%")} and ${signInFailures.lockedUntil} > now()`);
  return rows.map((r) => r.key);
}
