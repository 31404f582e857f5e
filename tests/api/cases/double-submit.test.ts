// A doubled or retried workflow step (a double tap, a retry after a lost answer) is taken once:
// one signature, one history line, one notice; the repeat answers with the step already taken.
import { describe, expect, test } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { caseAwaitingSignoff } from "./fixtures";
import { signVerdict } from "../../support/sign";

type Answer = { case?: { status: string; version: number; signedAt: string }; error?: string };

describe("double submit of a step", () => {
  test("two sign-offs sent at once at the same version give one signature, and both answer with it", async () => {
    const [inspector, analyst, engineer] = [await as("inspector"), await as("analyst"), await as("engineer")];
    const c = await caseAwaitingSignoff(inspector, analyst);
    const [a, b] = await Promise.all([
      signVerdict<Answer>(engineer, c.id, { version: c.version }),
      signVerdict<Answer>(engineer, c.id, { version: c.version }),
    ]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(a.body.case?.signedAt).toBe(b.body.case?.signedAt);
    expect(a.body.case?.version).toBe(c.version + 1);

    const signs = await db
      .select()
      .from(t.caseEvents)
      .where(and(eq(t.caseEvents.caseId, c.id), eq(t.caseEvents.action, "sign")));
    expect(signs).toHaveLength(1);
    const notices = await db
      .select()
      .from(t.mailOutbox)
      .where(and(eq(t.mailOutbox.kind, "verdict-signed"), sql`${t.mailOutbox.subject} like ${`${c.number} %`}`));
    expect(notices).toHaveLength(1);

    // A retry long after, at the same version, is the same answer, not a 409.
    const again = await signVerdict<Answer>(engineer, c.id, { version: c.version });
    expect(again.status).toBe(200);
    expect(again.body.case?.signedAt).toBe(a.body.case?.signedAt);
  });

  test("the same version after someone else's change is still refused as stale", async () => {
    const [inspector, analyst, engineer, admin] = [await as("inspector"), await as("analyst"), await as("engineer"), await as("admin")];
    const c = await caseAwaitingSignoff(inspector, analyst);
    expect(
      (
        await admin.json<Answer>("POST", `/api/cases/${c.id}/transitions`, {
          version: c.version,
          action: "return",
          reason: "Photos of the cone are missing.",
        })
      ).status,
    ).toBe(200);
    const stale = await signVerdict<Answer>(engineer, c.id, { version: c.version });
    expect(stale.status).toBe(409);
  });
});
