// Case notices: who receives each one, each person's switches, and that a notice never breaks its caller.
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { stopBoss } from "@/lib/jobs/boss";
import { notifyCaseReopened, notifySignoffRequested, notifyVerdictReturned, notifyVerdictSigned } from "@/lib/notify/case-notices";
import { ApiClient, demoUser } from "../../support/api";
import { db, t } from "../../support/db";
import { createCase, userId } from "../../support/factories";
import { linkIn, mailbox, waitForMail } from "../../support/mail";
import { invitedPerson, mailTo, recipient } from "./people";

// Notices called from the test nudge the job queue from this process too.
afterAll(() => stopBoss());

async function outboxRow(id: string | null) {
  expect(id).not.toBeNull();
  const [row] = await db.select().from(t.mailOutbox).where(eq(t.mailOutbox.id, id!));
  return row;
}

describe("PATCH /api/me/notices", () => {
  it("switches the caller's own notices and refuses unknown ones", async () => {
    const person = await invitedPerson("engineer", "Oskar Brandt");
    const changed = await person.client.json<{ notices: { kind: string; on: boolean }[] }>("PATCH", "/api/me/notices", {
      "signoff-requested": false,
    });
    expect(changed.status).toBe(200);
    expect(changed.body.notices.find((n) => n.kind === "signoff-requested")?.on).toBe(false);
    expect(changed.body.notices.find((n) => n.kind === "digest")?.on).toBe(true);
    const read = await person.client.json<{ notices: { kind: string; on: boolean }[] }>("GET", "/api/me/notices");
    expect(read.body.notices.map((n) => [n.kind, n.on])).toEqual([
      ["signoff-requested", false],
      ["case-reopened", true],
      ["digest", true],
    ]);

    expect((await person.client.patch("/api/me/notices", { "no-such-notice": false })).status).toBe(400);
    expect((await person.client.patch("/api/me/notices", { digest: "off" })).status).toBe(400);
    expect((await person.client.patch("/api/me/notices", {})).status).toBe(400);
    expect((await new ApiClient().patch("/api/me/notices", { digest: false })).status).toBe(401);
  });
});

describe("sign-off requested", () => {
  it("goes to every engineer who wants it, with a link that opens the case, and not to one who switched it off", async () => {
    const wants = await invitedPerson("engineer", "Ada Okonkwo");
    const declines = await invitedPerson("engineer", "Bram de Wit");
    expect((await declines.client.patch("/api/me/notices", { "signoff-requested": false })).status).toBe(200);
    const analyst = await userId("analyst");
    const c = await createCase({ status: "signoff", primaryCause: "water-ingress", proposedBy: analyst, proposedAt: new Date() });

    const row = await outboxRow(await notifySignoffRequested(c));
    expect(row.kind).toBe("signoff-requested");
    expect(row.to).toContain(wants.email);
    expect(row.to).toContain(demoUser("engineer").email);
    expect(row.to).not.toContain(declines.email);
    expect(row.to).not.toContain(demoUser("analyst").email);

    const mail = await waitForMail(mailTo(wants.email, c.number));
    expect(mail.subject).toBe(`${c.number} waits for your sign-off`);
    expect(mail.text).toContain("Water ingress");
    expect(mail.text).toContain("Priya Raman");
    const link = linkIn(mail, `/cases/${c.number}`);
    expect((await wants.client.get(new URL(link).pathname)).status).toBe(200);
    expect((await mailbox()).some(mailTo(declines.email, c.number))).toBe(false);
  });
});

describe("verdict signed, returned and reopened", () => {
  it("tell the analyst who proposed and the inspector who filed, each as their switches say", async () => {
    const analyst = await recipient("analyst");
    const inspector = await recipient("inspector", { "verdict-signed": false });
    const engineer = await recipient("engineer");
    const c = await createCase({
      status: "signed",
      primaryCause: "seal",
      confidence: "probable",
      proposedBy: analyst.id,
      createdBy: inspector.id,
      signedBy: engineer.id,
      signedAt: new Date(),
    });
    const signer = { id: engineer.id, name: "Test engineer" };

    const signed = await outboxRow(await notifyVerdictSigned(c, signer));
    expect(signed.to).toEqual([analyst.email]);
    expect(signed.subject).toBe(`${c.number} signed: Seal`);
    expect(signed.text).toContain("Probable");

    const reason = "Photograph the inboard seal lip before deciding.";
    const returned = await outboxRow(await notifyVerdictReturned(c, signer, reason));
    expect([...returned.to].sort()).toEqual([analyst.email, inspector.email].sort());
    expect(returned.text).toContain(reason);
    const arrived = await waitForMail(mailTo(inspector.email, `${c.number} returned to the bench`));
    expect(arrived.text).toContain(reason);

    const admin = { id: await userId("admin"), name: "Sam Adeyemi" };
    const reopened = await outboxRow(await notifyCaseReopened(c, admin, "New lab result on the grease sample."));
    expect([...reopened.to].sort()).toEqual([analyst.email, inspector.email, engineer.email].sort());
  });

  it("leaves out the person who acted, queues nothing when nobody is left, and never throws", async () => {
    const analyst = await recipient("analyst");
    const c = await createCase({ status: "signed", primaryCause: "seal", proposedBy: analyst.id, createdBy: analyst.id });
    expect(await notifyVerdictSigned(c, { id: analyst.id, name: "Self" })).toBeNull();
    // A broken call is logged, not thrown into the workflow that made it.
    await expect(notifyVerdictSigned(null as never, { id: "x", name: "x" })).resolves.toBeNull();
  });
});
