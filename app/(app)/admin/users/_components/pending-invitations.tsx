"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { quietDangerClass } from "@/components/admin/quiet-danger";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/card";
import { ROLE_LABELS, isRole } from "@/lib/auth/permissions";
import type { PendingInvitation, SiteChoice } from "./types";

const day = 86_400_000;

function expiresIn(iso: string, now: number) {
  const days = Math.ceil((new Date(iso).getTime() - now) / day);
  return days <= 1 ? "expires within a day" : `expires in ${days} days`;
}

/** Invitations not yet used: withdraw one, or send a fresh link (which replaces the old one). */
export function PendingInvitations({ invitations, sites, now }: { invitations: PendingInvitation[]; sites: SiteChoice[]; now: number }) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [note, setNote] = useState<Note>(null);

  async function act(inv: PendingInvitation, action: "withdraw" | "resend") {
    setBusy(inv.id);
    setNote(null);
    const res =
      action === "withdraw"
        ? await sendJson("DELETE", `/api/admin/invitations/${inv.id}`)
        : await sendJson("POST", "/api/admin/invitations", { name: inv.name, email: inv.email, role: inv.role, siteId: inv.siteId });
    setBusy(null);
    setNote(
      res.ok
        ? {
            tone: "ok",
            text:
              action === "withdraw"
                ? `Invitation to ${inv.email} withdrawn; its link no longer works.`
                : `A new link went to ${inv.email}; the old one no longer works.`,
          }
        : { tone: "danger", text: res.message },
    );
    if (res.ok) router.refresh();
  }

  if (!invitations.length) return <EmptyState title="No invitations waiting">Everyone invited has joined.</EmptyState>;
  const siteCode = (id: string | null) => sites.find((s) => s.id === id)?.code;
  return (
    <>
      <ul className="-my-2 divide-y divide-line">
        {invitations.map((inv) => (
          <li
            key={inv.id}
            className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between"
            data-testid={`invitation-${inv.email}`}
          >
            <div className="min-w-0">
              <p className="font-medium text-ink">{inv.name}</p>
              <p className="truncate text-sm text-muted">{inv.email}</p>
              <p className="mt-0.5 text-xs text-muted">
                {isRole(inv.role) ? ROLE_LABELS[inv.role] : inv.role}
                {siteCode(inv.siteId) ? ` · ${siteCode(inv.siteId)}` : ""} · {expiresIn(inv.expiresAt, now)}
              </p>
            </div>
            <div className="flex shrink-0 gap-2">
              <Button size="sm" variant="secondary" disabled={busy === inv.id} onClick={() => act(inv, "resend")}>
                Send again
              </Button>
              <button type="button" className={quietDangerClass} disabled={busy === inv.id} onClick={() => act(inv, "withdraw")}>
                Withdraw
              </button>
            </div>
          </li>
        ))}
      </ul>
      <StatusNote note={note} className="mt-3" />
    </>
  );
}
