// Mail goes through the outbox: stored first (in the caller's transaction when it gives one), then
// sent by the mail jobs (lib/jobs), retried with back-off on failure. Sending never blocks the action.
// Each send claims its row first, so two servers never send one mail twice.
import "server-only";
import { and, eq, lte, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { mailOutbox, type OutboxMail } from "@/db/schema";
import { env } from "@/lib/env";
import { ONE_TIME_LINK_KINDS, redactOneTimeLinks } from "./redact-links";
import { mailRetryIntervalMs } from "./retry-interval";
import { mailTransport } from "./transport";
import { nudgeMail, retryMailAt } from "@/lib/jobs/nudge";
import type { RenderedMail } from "./templates/layout";

const MAX_ATTEMPTS = 8;
// Back-off: one retry interval (MAIL_RETRY_MS, 30 s by default), doubling after each failure, capped at one hour.
export function nextDelayMs(attempts: number, baseMs = mailRetryIntervalMs()): number {
  return Math.min(baseMs * 2 ** Math.max(0, attempts - 1), 3_600_000);
}

/** Stores a mail; `into` a transaction, it is sent once that commits (the caller calls nudgeMail after). */
export async function enqueueMail(kind: string, to: string[], mail: RenderedMail, into?: Tx): Promise<string | null> {
  const recipients = [...new Set(to.filter(Boolean))];
  if (recipients.length === 0) return null;
  const [row] = await (into ?? db)
    .insert(mailOutbox)
    .values({ kind, to: recipients, subject: mail.subject, html: mail.html, text: mail.text })
    .returning({ id: mailOutbox.id });
  if (!into) nudgeMail();
  return row.id;
}

export async function deliver(id: string): Promise<boolean> {
  // Claim the row so two workers never send the same mail twice.
  const [mail] = await db
    .update(mailOutbox)
    .set({ attempts: sql`${mailOutbox.attempts} + 1`, nextAttemptAt: sql`now() + interval '5 minutes'` })
    .where(and(eq(mailOutbox.id, id), sql`${mailOutbox.status} <> 'sent'`, lte(mailOutbox.nextAttemptAt, sql`now()`)))
    .returning();
  if (!mail) return false;
  return send(mail);
}

async function send(mail: OutboxMail): Promise<boolean> {
  try {
    await mailTransport().sendMail({ from: env().MAIL_FROM, to: mail.to, subject: mail.subject, html: mail.html, text: mail.text });
    const redact = ONE_TIME_LINK_KINDS.has(mail.kind) ? { html: redactOneTimeLinks(mail.html), text: redactOneTimeLinks(mail.text) } : {};
    await db
      .update(mailOutbox)
      .set({ status: "sent", sentAt: new Date(), lastError: null, ...redact })
      .where(eq(mailOutbox.id, mail.id));
    return true;
  } catch (err) {
    const failed = mail.attempts >= MAX_ATTEMPTS;
    await db
      .update(mailOutbox)
      .set({
        status: failed ? "failed" : "pending",
        lastError: err instanceof Error ? err.message : String(err),
        nextAttemptAt: new Date(Date.now() + nextDelayMs(mail.attempts)),
      })
      .where(eq(mailOutbox.id, mail.id));
    return false;
  }
}

/** Sends every pending mail that is due; `force` ignores the back-off (admin "retry now"). */
export async function deliverDue(force = false): Promise<{ sent: number; failed: number }> {
  if (force) {
    await db
      .update(mailOutbox)
      .set({ nextAttemptAt: sql`now()`, status: "pending" })
      .where(sql`${mailOutbox.status} <> 'sent'`);
  }
  const due = await db
    .select({ id: mailOutbox.id })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.status, "pending"), lte(mailOutbox.nextAttemptAt, sql`now()`)))
    .limit(50);
  let sent = 0;
  let failed = 0;
  for (const { id } of due) {
    if (await deliver(id)) sent++;
    else failed++;
  }
  // The next attempt is a job of its own, due when the earliest waiting mail is.
  const [next] = await db
    .select({ at: mailOutbox.nextAttemptAt })
    .from(mailOutbox)
    .where(eq(mailOutbox.status, "pending"))
    .orderBy(mailOutbox.nextAttemptAt)
    .limit(1);
  if (next) retryMailAt(next.at);
  return { sent, failed };
}
