"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ROLE_SUMMARIES } from "@/components/admin/role-summaries";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { isRole } from "@/lib/auth/permissions";
import { inviteSchema } from "@/lib/validation/account";
import { RoleSelect } from "./role-select";
import { SiteSelect } from "./site-select";
import type { SiteChoice } from "./types";
import { ErrorSummary } from "@/components/ui/error-summary";

/** Invites a person by e-mail; the server's field messages appear under the fields. */
export function InviteForm({ sites }: { sites: SiteChoice[] }) {
  const router = useRouter();
  const [role, setRole] = useState("inspector");
  const [siteId, setSiteId] = useState<string | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<Note>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    const input = { name: String(data.get("name") ?? ""), email: String(data.get("email") ?? ""), role, siteId };
    const local = inviteSchema.safeParse(input);
    if (!local.success) {
      const next: Record<string, string> = {};
      for (const issue of local.error.issues) next[String(issue.path[0])] ??= issue.message;
      setErrors(next);
      setNote(null);
      return;
    }
    setBusy(true);
    setErrors({});
    const res = await sendJson<{ invitation: { email: string } }>("POST", "/api/admin/invitations", input);
    setBusy(false);
    if (!res.ok) {
      setErrors(res.fields);
      setNote({ tone: "danger", text: res.message });
      return;
    }
    form.reset();
    setSiteId(null);
    setNote({ tone: "ok", text: `Invitation sent to ${res.data.invitation.email}. The link works for 7 days.` });
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Invite someone">
      <ErrorSummary errors={errors} idPrefix="invite-" />
      <Field label="Name" htmlFor="invite-name" error={errors.name}>
        <Input id="invite-name" name="name" autoComplete="off" aria-invalid={!!errors.name} placeholder="Full name" />
      </Field>
      <Field label="E-mail" htmlFor="invite-email" error={errors.email}>
        <Input
          id="invite-email"
          name="email"
          type="email"
          inputMode="email"
          autoComplete="off"
          aria-invalid={!!errors.email}
          placeholder="name@railway.example"
        />
      </Field>
      <Field label="Role" htmlFor="invite-role" error={errors.role} hint={isRole(role) ? ROLE_SUMMARIES[role] : undefined}>
        <RoleSelect id="invite-role" name="role" value={role} onChange={(e) => setRole(e.target.value)} aria-invalid={!!errors.role} />
      </Field>
      <Field label="Home site" htmlFor="invite-site" error={errors.siteId} hint="Inspectors see their own shop's cases.">
        <SiteSelect id="invite-site" name="siteId" sites={sites} value={siteId} onChange={(e) => setSiteId(e.target.value || null)} />
      </Field>
      <Button type="submit" disabled={busy}>
        {busy ? "Sending…" : "Send invitation"}
      </Button>
      <StatusNote note={note} />
    </form>
  );
}
