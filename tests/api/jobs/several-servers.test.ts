// Two app servers on one database, each taking jobs: a digest goes out once and each mail once,
// however the queue's jobs fall between them.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { eq, inArray } from "drizzle-orm";
import { DIGEST_KIND, digestRecipients } from "../../../lib/digest/send";
import { getBoss, stopBoss } from "../../../lib/jobs/boss";
import { QUEUES } from "../../../lib/jobs/queues";
import { startAppServer, type AppServer } from "../../support/app-server";
import { db, t } from "../../support/db";
import { mailbox } from "../../support/mail";

let second: AppServer;

beforeAll(async () => {
  second = await startAppServer();
}, 90_000);

afterAll(async () => {
  await second?.stop();
  await stopBoss();
});

async function until(ok: () => Promise<boolean>, ms = 20_000): Promise<void> {
  const end = Date.now() + ms;
  while (!(await ok()) && Date.now() < end) await new Promise((r) => setTimeout(r, 250));
}

describe("several app servers", () => {
  test("a due digest asked for eight times at once goes out once: one message to each recipient", async () => {
    await db.delete(t.mailOutbox).where(eq(t.mailOutbox.kind, DIGEST_KIND));
    const boss = await getBoss();
    // A digest queue job per ask, standard policy: the workers of both servers race for them.
    await Promise.all(Array.from({ length: 8 }, () => boss.send(QUEUES.weeklyDigest, {})));
    await until(async () => (await db.select().from(t.mailOutbox).where(eq(t.mailOutbox.kind, DIGEST_KIND))).length > 0);
    await new Promise((r) => setTimeout(r, 4000)); // time for every other ask to be taken and refused
    // One digest is one message per recipient: each of them got exactly one.
    const digests = await db.select().from(t.mailOutbox).where(eq(t.mailOutbox.kind, DIGEST_KIND));
    const recipients = await digestRecipients();
    expect(recipients.length).toBeGreaterThan(0);
    expect(digests.map((d) => d.to.join()).sort()).toEqual([...recipients].sort());
  }, 60_000);

  test("mails nudged on both servers are each delivered once", async () => {
    const stamp = `two-servers-${Date.now()}`;
    const rows = await db
      .insert(t.mailOutbox)
      .values(
        Array.from({ length: 12 }, (_, i) => ({
          kind: "test",
          to: [`reader${i}@sable-river.example`],
          subject: `${stamp} #${i}`,
          html: "<p>x</p>",
          text: "x",
        })),
      )
      .returning({ id: t.mailOutbox.id });
    const boss = await getBoss();
    await Promise.all(Array.from({ length: 6 }, () => boss.send(QUEUES.mailSend, {})));
    await until(async () =>
      (
        await db
          .select()
          .from(t.mailOutbox)
          .where(
            inArray(
              t.mailOutbox.id,
              rows.map((r) => r.id),
            ),
          )
      ).every((r) => r.status === "sent"),
    );
    await new Promise((r) => setTimeout(r, 2000));
    const received = (await mailbox()).filter((m) => m.subject.startsWith(stamp));
    expect(received).toHaveLength(12);
    expect(new Set(received.map((m) => m.subject)).size).toBe(12);
  }, 60_000);
});
