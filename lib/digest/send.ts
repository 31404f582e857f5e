// Sends the weekly digest to managers (and anyone else whose role offers the switch) who have not
// turned it off; used by the weekly timer and by an admin's "send now".
import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox } from "@/db/schema";
import { peopleWithRoles } from "@/db/queries/notices";
import { loadTallies } from "@/lib/tallies/tallies-service";
import { weekCounts } from "@/db/queries/tallies/week-counts";
import { env } from "@/lib/env";
import { enqueueMail } from "@/lib/mail/outbox";
import { noticeKindInfo, pickRecipients } from "@/lib/notify/notice-kinds";
import { addMonths, filtersToQuery, DEFAULT_FILTERS } from "@/lib/tallies/filters";
import { buildDigest } from "./build";

export const DIGEST_KIND = "digest";

/** Everyone whose role offers the weekly digest switch (managers first of all) and who left it on. */
export async function digestRecipients(): Promise<string[]> {
  const roles = [...noticeKindInfo("digest").roles];
  return pickRecipients(await peopleWithRoles(roles), "digest");
}

export async function lastDigestSentAt(): Promise<Date | null> {
  const [row] = await db
    .select({ at: mailOutbox.createdAt })
    .from(mailOutbox)
    .where(eq(mailOutbox.kind, DIGEST_KIND))
    .orderBy(desc(mailOutbox.createdAt))
    .limit(1);
  return row?.at ?? null;
}

const ymd = (d: Date) => d.toISOString().slice(0, 10);

export async function sendDigest(now = new Date()): Promise<{ recipients: number; subject: string }> {
  const thisMonth = ymd(now).slice(0, 7);
  const filters = { ...DEFAULT_FILTERS, from: addMonths(thisMonth, -11), to: thisMonth };
  const since = new Date(now.getTime() - 7 * 86_400_000);
  // The digest speaks for the whole fleet, as a manager sees it.
  const [tallies, week, recipients] = await Promise.all([
    loadTallies(filters, { id: "", role: "manager", siteId: null }),
    weekCounts(since),
    digestRecipients(),
  ]);
  const mail = buildDigest({
    tallies,
    week: { ...week, from: ymd(since), to: ymd(now) },
    tallyUrl: `${env().APP_URL}/tallies?${filtersToQuery(filters)}`,
  });
  // One message per manager, so no one sees the others' addresses.
  for (const to of recipients) await enqueueMail(DIGEST_KIND, [to], mail);
  return { recipients: recipients.length, subject: mail.subject };
}
