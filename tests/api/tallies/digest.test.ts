// The weekly digest: admins may send it at once; it reaches managers who left it on, with the
// headline figures and a link to the tallies.
import { describe, expect, it } from "vitest";
import { and, eq, gte } from "drizzle-orm";
import { as, ApiClient, demoUser } from "../../support/api";
import { db, t } from "../../support/db";
import { waitForMail } from "../../support/mail";

const manager = demoUser("manager").email;

describe("weekly digest", () => {
  it("can be sent now by admins only", async () => {
    expect((await new ApiClient().json("POST", "/api/digest")).status).toBe(401);
    for (const role of ["inspector", "analyst", "engineer", "manager"] as const) {
      expect((await (await as(role)).json("POST", "/api/digest")).status, role).toBe(403);
    }
  });

  it("reaches the manager with the headline figures and a link to the tallies", async () => {
    const since = new Date();
    const res = await (await as("admin")).json<{ recipients: number; subject: string }>("POST", "/api/digest");
    expect(res.status).toBe(202);
    expect(res.body.recipients).toBeGreaterThanOrEqual(1);
    const mail = await waitForMail(
      (m) => m.to.includes(manager) && m.subject === res.body.subject && new Date(m.receivedAt) >= new Date(since.getTime() - 1000),
    );
    expect(mail.subject).toMatch(/^Tearline weekly digest: /);
    expect(mail.text).toMatch(/This week \(\d{4}-\d{2}-\d{2} to \d{4}-\d{2}-\d{2}\): \d+ removals? logged/);
    expect(mail.text).toContain("Removal confirmed by teardown");
    expect(mail.text).toMatch(/Open the tallies: http\S+\/tallies\?from=\d{4}-\d{2}&to=\d{4}-\d{2}/);
    const rows = await db
      .select()
      .from(t.mailOutbox)
      .where(and(eq(t.mailOutbox.kind, "digest"), gte(t.mailOutbox.createdAt, since)));
    expect(rows.some((r) => r.to.includes(manager))).toBe(true);
    // one message per person
    expect(rows.every((r) => r.to.length === 1)).toBe(true);
  });

  it("skips a manager who switched the digest off", async () => {
    const [me] = await db.select({ id: t.user.id, prefs: t.user.noticePrefs }).from(t.user).where(eq(t.user.email, manager));
    await db
      .update(t.user)
      .set({ noticePrefs: { ...me.prefs, digest: false } })
      .where(eq(t.user.id, me.id));
    try {
      const since = new Date();
      expect((await (await as("admin")).json("POST", "/api/digest")).status).toBe(202);
      const rows = await db
        .select()
        .from(t.mailOutbox)
        .where(and(eq(t.mailOutbox.kind, "digest"), gte(t.mailOutbox.createdAt, since)));
      expect(rows.some((r) => r.to.includes(manager))).toBe(false);
    } finally {
      await db.update(t.user).set({ noticePrefs: me.prefs }).where(eq(t.user.id, me.id));
    }
  });
});
