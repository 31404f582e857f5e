// Sends the weekly digest when it is due. The weekly-digest job (lib/jobs) calls it once an hour;
// an advisory lock and the stored "last sent" keep two workers from both sending.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { digestDue } from "./schedule-time";
import { lastDigestSentAt, sendDigest } from "./send";

export async function sendDigestIfDue(now = new Date()): Promise<boolean> {
  return db.transaction(async (tx) => {
    const { rows } = await tx.execute<{ locked: boolean }>(
      sql`select pg_try_advisory_xact_lock(hashtext('tearline.weekly-digest')) as locked`,
    );
    if (!rows[0]?.locked) return false;
    if (!digestDue(now, await lastDigestSentAt())) return false;
    await sendDigest(now);
    return true;
  });
}
