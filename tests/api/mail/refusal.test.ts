// A mail server that refuses does not stop the action; the outbox shows the failure and the retry delivers.
import { eq, sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { mailbox, refuseMail, waitForMail } from "../../support/mail";
import { mailTo, uniqueEmail } from "./people";

async function rowFor(email: string) {
  const [row] = await db
    .select()
    .from(t.mailOutbox)
    .where(sql`${email} = any(${t.mailOutbox.to})`);
  return row;
}

async function until<T>(read: () => Promise<T>, ok: (v: T) => boolean, ms = 15_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await read();
    if (ok(v) || Date.now() > end) return v;
    await new Promise((r) => setTimeout(r, 200));
  }
}

afterAll(() => refuseMail(false));

describe("when the mail server refuses", () => {
  it("still invites, shows the failed attempt to admins, and delivers once the server accepts again", async () => {
    const admin = await as("admin");
    await refuseMail(true);
    const email = uniqueEmail("refused");
    const started = Date.now();
    const res = await admin.post("/api/admin/invitations", { email, name: "Rui Tavares", role: "inspector" });
    expect(res.status).toBe(201);
    expect(Date.now() - started).toBeLessThan(5_000);

    const failed = await until(
      () => rowFor(email),
      (r) => Boolean(r?.lastError),
    );
    expect(failed.status).toBe("pending");
    expect(failed.attempts).toBeGreaterThanOrEqual(1);
    expect(failed.lastError).toMatch(/451|refus/i);
    expect((await mailbox()).some(mailTo(email))).toBe(false);

    const page = await admin.get("/admin/outbox?status=pending");
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(email);
    expect(html).toContain("Mail fake is refusing mail");

    // The server's retry timer (MAIL_RETRY_MS) picks it up without anyone pressing a button.
    await refuseMail(false);
    const mail = await waitForMail(mailTo(email, "You are invited to Tearline"), 20_000);
    expect(mail.to).toEqual([email]);
    const sent = await until(
      () => rowFor(email),
      (r) => r?.status === "sent",
      5_000,
    );
    expect(sent.status).toBe("sent");
    expect(sent.sentAt).not.toBeNull();
  });

  it("lets an admin send everything unsent at once", async () => {
    const admin = await as("admin");
    await refuseMail(true);
    const email = uniqueEmail("retry-now");
    expect((await admin.post("/api/admin/invitations", { email, name: "Noor Haddad", role: "analyst" })).status).toBe(201);
    await until(
      () => rowFor(email),
      (r) => Boolean(r?.lastError),
    );
    // Push the next attempt far out, so only "Retry now" can send it during this test.
    await db
      .update(t.mailOutbox)
      .set({ nextAttemptAt: new Date(Date.now() + 3_600_000) })
      .where(eq(t.mailOutbox.id, (await rowFor(email)).id));
    await refuseMail(false);

    expect((await (await as("engineer")).post("/api/admin/outbox/retry")).status).toBe(403);
    const retried = await admin.json<{ sent: number; failed: number }>("POST", "/api/admin/outbox/retry");
    expect(retried.status).toBe(200);
    expect(typeof retried.body.sent).toBe("number");
    // Sent by this call (or by the timer, which the call made it due for): without it, an hour's wait.
    expect(
      (
        await until(
          () => rowFor(email),
          (r) => r?.status === "sent",
          5_000,
        )
      ).status,
    ).toBe("sent");
    await waitForMail(mailTo(email, "You are invited to Tearline"));
  });
});
