// Inviting a person: the e-mail arrives with a one-time link that sets a password and signs them in.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { DEMO_USERS } from "../../../scripts/seed/demo-people";
import { ApiClient, as, type DemoRole } from "../../support/api";
import { db, t } from "../../support/db";
import { siteId } from "../../support/factories";
import { linkIn, waitForMail, type FakeMail } from "../../support/mail";
import { uniqueEmail } from "./fresh-person";

const invitationRows = async (email?: string) =>
  (
    await db
      .select({ n: count() })
      .from(t.invitations)
      .where(email ? eq(t.invitations.email, email) : undefined)
  )[0].n;

async function invite(body: Record<string, unknown>) {
  return (await as("admin")).json<{ invitation?: { id: string }; error?: string; fields?: Record<string, string> }>(
    "POST",
    "/api/admin/invitations",
    body,
  );
}

const tokenIn = (mail: FakeMail) => new URL(linkIn(mail, "/invitation/")).pathname.split("/").pop()!;

/** The invitation token mailed to an address; `not` skips a link already seen. */
async function tokenFromMail(email: string, not?: string): Promise<string> {
  return tokenIn(await waitForMail((m) => m.to.includes(email) && /invited/i.test(m.subject) && tokenIn(m) !== not));
}

describe("invitations", () => {
  it("invites, mails a working link, sets the password once, and the new person signs in", async () => {
    const email = uniqueEmail("invitee");
    const lab = await siteId("CFL");
    const res = await invite({ name: "Noor Haddad", email, role: "analyst", siteId: lab });
    expect(res.status).toBe(201);

    const token = await tokenFromMail(email);
    const page = await new ApiClient().get(`/invitation/${token}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Noor Haddad");

    const password = "a-long-new-password";
    const accepted = await new ApiClient().json("POST", "/api/invitations/accept", { token, password });
    expect(accepted.status).toBe(201);

    const [person] = await db.select().from(t.user).where(eq(t.user.email, email));
    expect(person.role).toBe("analyst");
    expect(person.siteId).toBe(lab);

    const newcomer = await new ApiClient().signIn(email, password);
    expect(await (await newcomer.get("/")).text()).toContain("Noor Haddad");

    const again = await new ApiClient().json("POST", "/api/invitations/accept", { token, password: "another-long-password" });
    expect(again.status).toBe(410);
    expect(await (await new ApiClient().get(`/invitation/${token}`)).text()).toContain("Invitation not valid");
  });

  it("a withdrawn invitation's link no longer works", async () => {
    const email = uniqueEmail("withdrawn");
    const res = await invite({ name: "Otto Lindqvist", email, role: "inspector" });
    const token = await tokenFromMail(email);
    expect((await (await as("admin")).del(`/api/admin/invitations/${res.body.invitation!.id}`)).status).toBe(200);
    expect((await new ApiClient().json("POST", "/api/invitations/accept", { token, password: "a-long-new-password" })).status).toBe(410);
  });

  it("sending again replaces the old link with a new one", async () => {
    const email = uniqueEmail("resent");
    await invite({ name: "Mira Solberg", email, role: "engineer" });
    const first = await tokenFromMail(email);
    expect((await invite({ name: "Mira Solberg", email, role: "engineer" })).status).toBe(201);
    const second = await tokenFromMail(email, first);
    expect(second).not.toBe(first);
    expect((await new ApiClient().json("POST", "/api/invitations/accept", { token: first, password: "a-long-new-password" })).status).toBe(
      410,
    );
    expect((await new ApiClient().json("POST", "/api/invitations/accept", { token: second, password: "a-long-new-password" })).status).toBe(
      201,
    );
  });

  const bad: { name: string; body: Record<string, unknown>; field: string }[] = [
    { name: "a malformed e-mail", body: { name: "Kai Brennan", email: "kai-at-sable-river", role: "analyst" }, field: "email" },
    { name: "an unknown role", body: { name: "Kai Brennan", email: "kai@sable-river.example", role: "superuser" }, field: "role" },
    { name: "a one-letter name", body: { name: "K", email: "kai@sable-river.example", role: "analyst" }, field: "name" },
    {
      name: "a site that is not a site id",
      body: { name: "Kai Brennan", email: "kai@sable-river.example", role: "analyst", siteId: "MJC" },
      field: "siteId",
    },
  ];
  for (const attempt of bad) {
    it(`refuses ${attempt.name} with a field message and writes nothing`, async () => {
      const before = await invitationRows();
      const res = await invite(attempt.body);
      expect(res.status).toBe(400);
      expect(res.body.fields?.[attempt.field]).toMatch(/\w{4,}/);
      expect(await invitationRows()).toBe(before);
    });
  }

  it("refuses every role but admin, and writes nothing", async () => {
    const email = uniqueEmail("not-by-you");
    for (const role of ["inspector", "analyst", "engineer", "manager"] as DemoRole[]) {
      const res = await (await as(role)).json("POST", "/api/admin/invitations", { name: "Pia Kettunen", email, role: "inspector" });
      expect(res.status, role).toBe(403);
    }
    expect(await invitationRows(email)).toBe(0);
  });

  it("refuses to invite someone who already has an account", async () => {
    const existing = DEMO_USERS[0].email;
    const before = await invitationRows(existing);
    const res = await invite({ name: "Dana Okafor", email: existing.toUpperCase(), role: "analyst" });
    expect(res.status).toBe(409);
    expect(res.body.error).toContain(existing);
    expect(await invitationRows(existing)).toBe(before);
  });
});
