// Account e-mails: an invitation to set a password, and a password reset.
import { renderMail } from "./layout";

export function invitationMail(p: { name: string; roleLabel: string; inviter: string; url: string; expiresDays: number }) {
  return renderMail("You are invited to Tearline", `Welcome to Tearline, ${p.name}`, [
    { kind: "p", text: `${p.inviter} has invited you to Tearline, the bearing casebook, as ${p.roleLabel}.` },
    { kind: "p", text: `Choose a password to finish setting up your account. The link works for ${p.expiresDays} days and only once.` },
    { kind: "button", label: "Set my password", url: p.url },
  ]);
}

export function passwordResetMail(p: { name: string; url: string }) {
  return renderMail("Reset your Tearline password", "Reset your password", [
    { kind: "p", text: `Hello ${p.name}, someone (hopefully you) asked to reset the password of your Tearline account.` },
    { kind: "button", label: "Choose a new password", url: p.url },
    { kind: "p", text: "The link works for one hour. If you did not ask for this, ignore this e-mail; your password stays as it is." },
  ]);
}
