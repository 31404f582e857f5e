// A workflow step and the notice it causes are saved in one transaction: both or neither.
import { afterAll, describe, expect, test } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { waitForMail } from "../../support/mail";
import { caseAwaitingSignoff } from "../cases/fixtures";
import { signVerdict } from "../../support/sign";

const dropRefusal = () =>
  db.execute(sql`drop trigger if exists test_refuse_mail on mail_outbox; drop function if exists test_refuse_mail()`);
afterAll(dropRefusal);

describe("transactional outbox", () => {
  test("when the notice cannot be stored the sign-off is not saved either; once it can, both are", async () => {
    const [inspector, analyst, engineer] = [await as("inspector"), await as("analyst"), await as("engineer")];
    const c = await caseAwaitingSignoff(inspector, analyst);
    // The database itself refuses the outbox row, as a full disk or a broken constraint would.
    await db.execute(
      sql`create function test_refuse_mail() returns trigger language plpgsql as $$ begin raise exception 'outbox refused for the test'; end $$`,
    );
    await db.execute(sql`create trigger test_refuse_mail before insert on mail_outbox for each row execute function test_refuse_mail()`);

    const refused = await signVerdict<{ error: string }>(engineer, c.id, { version: c.version });
    expect(refused.status).toBe(500);
    expect(refused.body.error).toMatch(/nothing was changed/);
    const [still] = await db.select().from(t.cases).where(eq(t.cases.id, c.id));
    expect(still.status).toBe("signoff");
    expect(still.version).toBe(c.version);
    expect(
      await db
        .select()
        .from(t.caseEvents)
        .where(and(eq(t.caseEvents.caseId, c.id), eq(t.caseEvents.action, "sign"))),
    ).toHaveLength(0);

    await dropRefusal();
    const signed = await signVerdict<{ case: { status: string } }>(engineer, c.id, { version: c.version });
    expect(signed.status).toBe(200);
    // The outbox row is there the moment the answer is: it was committed with the step.
    const rows = await db
      .select()
      .from(t.mailOutbox)
      .where(and(eq(t.mailOutbox.kind, "verdict-signed"), sql`${t.mailOutbox.subject} like ${`%${c.number}%`}`));
    expect(rows).toHaveLength(1);
    await waitForMail((m) => m.subject.includes(c.number) && /signed/i.test(m.subject));
  });
});
