// The reopen-then-sign-again step the roll-up recount tests share: a signed case goes back to the
// bench keeping its verdict (as lib/cases/service.ts reopens it), then is signed again with the
// teardown outcome alternating, so every roll-up must take the old cells away and add the new ones.
import { eq, inArray } from "drizzle-orm";
import { db, t } from "./db";

export async function reopenAndResign(ids: readonly string[], afterReopen: () => Promise<void>): Promise<void> {
  await db
    .update(t.cases)
    .set({ status: "bench", signedAt: null, signedBy: null })
    .where(inArray(t.cases.id, [...ids]));
  await afterReopen();
  for (const [i, id] of ids.entries()) {
    await db
      .update(t.cases)
      .set({ status: "signed", signedAt: new Date(), removalConfirmed: i % 2 ? "confirmed" : "no-defect" })
      .where(eq(t.cases.id, id));
  }
}
