import type { Metadata } from "next";
import { openInvitation } from "@/lib/accounts/invite";
import { SetPasswordForm } from "@/components/auth/set-password-form";
import { ROLE_LABELS, isRole } from "@/lib/auth/permissions";

export const metadata: Metadata = { title: "Accept invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await openInvitation(token);
  if (!invitation) {
    return (
      <>
        <h1 className="text-2xl font-semibold tracking-tight">Invitation not valid</h1>
        <p role="alert" className="mt-4 rounded-lg bg-danger-soft px-3 py-3 text-sm text-danger">
          This invitation has expired, was replaced by a newer one, or was already used. Ask your Tearline administrator to invite you
          again.
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">Welcome, {invitation.name}</h1>
      <p className="mt-1 text-sm text-muted">
        You are joining as{" "}
        <strong className="text-ink-2">{isRole(invitation.role) ? ROLE_LABELS[invitation.role] : invitation.role}</strong> with{" "}
        {invitation.email}. Choose a password to finish.
      </p>
      <SetPasswordForm mode="invitation" token={token} />
    </>
  );
}
