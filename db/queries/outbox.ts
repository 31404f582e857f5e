// The outbox as the admin page shows it: newest first, optionally one status.
import "server-only";
import { desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox } from "@/db/schema";

export const OUTBOX_STATUSES = ["pending", "failed", "sent"] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

export async function listOutbox(status?: OutboxStatus, limit = 100) {
  return db
    .select({
      id: mailOutbox.id,
      kind: mailOutbox.kind,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      status: mailOutbox.status,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      nextAttemptAt: mailOutbox.nextAttemptAt,
      sentAt: mailOutbox.sentAt,
      createdAt: mailOutbox.createdAt,
    })
    .from(mailOutbox)
    .where(status ? eq(mailOutbox.status, status) : undefined)
    .orderBy(desc(mailOutbox.createdAt))
    .limit(limit);
}
export type OutboxRow = Awaited<ReturnType<typeof listOutbox>>[number];

export async function outboxCounts(): Promise<Record<OutboxStatus, number>> {
  const rows = await db
    .select({ status: mailOutbox.status, n: sql<number>`count(*)::int` })
    .from(mailOutbox)
    .groupBy(mailOutbox.status);
  const out: Record<OutboxStatus, number> = { pending: 0, failed: 0, sent: 0 };
  for (const r of rows) out[r.status] = r.n;
  return out;
}
