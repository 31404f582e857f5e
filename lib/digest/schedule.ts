// Checks once an hour whether the weekly digest is due and sends it. Started once per server
// process from instrumentation.ts; an advisory lock keeps two processes from both sending.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { startBackgroundTimer } from "@/lib/background-timer";
import { digestDue } from "./schedule-time";
import { lastDigestSentAt, sendDigest } from "./send";

const HOUR_MS = 3_600_000;

export async function sendDigestIfDue(now = new Date()): Promise<boolean> {
  return db.transaction(async (tx) => {
    const { rows } = await tx.execute<{ locked: boolean }>(sql`select pg_try_advisory_xact_lock(hashtext('tearline.weekly-digest')) as locked`);
    if (!rows[0]?.locked) return false;
    if (!digestDue(now, await lastDigestSentAt())) return false;
    await sendDigest(now);
    return true;
  });
}

export function startDigestSchedule(intervalMs = HOUR_MS): boolean {
  return startBackgroundTimer("weekly digest", intervalMs, () => sendDigestIfDue());
}
