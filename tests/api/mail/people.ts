// People of our own for mail tests, so no test changes a demo person's password or notice switches.
import { randomUUID } from "node:crypto";
import { expect } from "vitest";
import { ApiClient, as } from "../../support/api";
import { db, t } from "../../support/db";
import { linkIn, waitForMail, type FakeMail } from "../../support/mail";

export const uniqueEmail = (prefix: string) => `${prefix}-${randomUUID().slice(0, 8)}@sable-river.example`;

/** A person straight in the database (no password): enough to receive notices. */
export async function recipient(role: string, noticePrefs: Record<string, boolean> = {}) {
  const id = randomUUID();
  const email = uniqueEmail(role);
  await db.insert(t.user).values({ id, name: `Test ${role}`, email, emailVerified: true, role, noticePrefs });
  return { id, email, name: `Test ${role}` };
}

export const mailTo = (email: string, subject?: string) => (m: FakeMail) =>
  m.to.includes(email) && (!subject || m.subject.includes(subject));

/** An admin invites; returns the invitation e-mail as the fake received it, and its link. */
export async function inviteByMail(role: string, name: string) {
  const email = uniqueEmail(`invited-${role}`);
  const res = await (await as("admin")).post("/api/admin/invitations", { email, name, role });
  expect(res.status).toBe(201);
  const mail = await waitForMail(mailTo(email, "You are invited to Tearline"));
  const link = linkIn(mail, "/invitation/");
  return { email, name, mail, link, token: new URL(link).pathname.split("/").pop()! };
}

/** Sets the password through the invitation link's token and signs in with it. */
export async function acceptAndSignIn(invite: { email: string; token: string }) {
  const password = `pw-${randomUUID()}`;
  const accepted = await new ApiClient().post("/api/invitations/accept", { token: invite.token, password });
  expect(accepted.status).toBe(201);
  return { password, client: await new ApiClient(invite.email).signIn(invite.email, password) };
}

/** The real way in: invited by e-mail, password set from the link, signed in. */
export async function invitedPerson(role: string, name = "Mirela Sandu") {
  const invite = await inviteByMail(role, name);
  return { ...invite, ...(await acceptAndSignIn(invite)) };
}
