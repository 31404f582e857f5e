// Inviting a person: a pending invitation and an e-mail with a one-time link to set a password.
import "server-only";
import {
  findOpenInvitation,
  findUserByEmail,
  insertInvitation,
  listPendingInvitations,
  markInvitationAccepted,
  revokeInvitation,
} from "@/db/queries/invitations";
import { setUserSite } from "@/db/queries/users";
import { auth } from "@/lib/auth/auth";
import { ROLE_LABELS, type Role } from "@/lib/auth/permissions";
import { env } from "@/lib/env";
import { HttpError, notFound } from "@/lib/http/errors";
import { enqueueMail } from "@/lib/mail/outbox";
import { invitationMail } from "@/lib/mail/templates/account";
import { hashToken, INVITATION_DAYS, newToken } from "./tokens";

type InviteInput = { email: string; name: string; role: Role; siteId?: string | null };

export async function inviteUser(input: InviteInput, inviter: { id: string; name: string }) {
  if (await findUserByEmail(input.email)) {
    throw new HttpError(409, "conflict", `${input.email} already has an account; change its role instead.`);
  }
  const { token, hash } = newToken();
  const invitation = await insertInvitation({
    email: input.email,
    name: input.name,
    role: input.role,
    siteId: input.siteId ?? null,
    tokenHash: hash,
    invitedBy: inviter.id,
    expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
  });
  const url = `${env().APP_URL}/invitation/${token}`;
  await enqueueMail(
    "invitation",
    [input.email],
    invitationMail({ name: input.name, roleLabel: ROLE_LABELS[input.role], inviter: inviter.name, url, expiresDays: INVITATION_DAYS }),
  );
  return { id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt };
}

export async function acceptInvitation(token: string, password: string) {
  const invitation = await findOpenInvitation(hashToken(token));
  if (!invitation)
    throw new HttpError(
      410,
      "gone",
      "This invitation has expired, was replaced or was already used. Ask your administrator for a new one.",
    );
  if (await findUserByEmail(invitation.email))
    throw new HttpError(409, "conflict", "An account with this e-mail already exists. Sign in instead.");
  // Called on the server without request headers, better-auth's admin endpoint creates the account directly.
  const created = await auth.api.createUser({
    body: { email: invitation.email, password, name: invitation.name, role: invitation.role as Role },
  });
  if (invitation.siteId) await setUserSite(created.user.id, invitation.siteId);
  await markInvitationAccepted(invitation.id);
  return { email: invitation.email };
}

/** The open invitation a link's token names, or null (a short token is never looked up). */
export async function openInvitation(token: string) {
  return token.length >= 20 ? findOpenInvitation(hashToken(token)) : null;
}

export async function pendingInvitations() {
  return listPendingInvitations();
}

/** Withdraws a pending invitation; 404 when none is pending under that id. */
export async function withdrawInvitation(id: string) {
  if (!(await revokeInvitation(id))) throw notFound("A pending invitation with that id");
}
