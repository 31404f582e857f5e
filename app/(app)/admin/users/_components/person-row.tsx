"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { Badge } from "@/components/ui/badge";
import { quietDangerClass } from "@/components/admin/quiet-danger";
import { Button } from "@/components/ui/button";
import { ROLE_LABELS, isRole } from "@/lib/auth/permissions";
import { RoleSelect } from "./role-select";
import { SiteSelect } from "./site-select";
import { PEOPLE_COLUMNS, type Person, type SiteChoice } from "./types";

/** One person: role and home site save as soon as they change; suspending asks once more. */
export function PersonRow({ person, sites, isSelf }: { person: Person; sites: SiteChoice[]; isSelf: boolean }) {
  const router = useRouter();
  const [role, setRole] = useState(person.role);
  const [siteId, setSiteId] = useState(person.siteId);
  const [busy, setBusy] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [note, setNote] = useState<Note>(null);
  const suspended = Boolean(person.banned);

  async function unlock() {
    setBusy(true);
    const res = await sendJson("POST", `/api/admin/users/${person.id}/unlock`, {});
    setBusy(false);
    setNote(res.ok ? { tone: "ok", text: "Unlocked; they can sign in again now." } : { tone: "danger", text: res.message });
    if (res.ok) router.refresh();
  }

  async function save(change: { role?: string; siteId?: string | null }, undo: () => void, done: string) {
    setBusy(true);
    setNote(null);
    const res = await sendJson("PATCH", `/api/admin/users/${person.id}`, change);
    setBusy(false);
    if (!res.ok) {
      undo();
      setNote({ tone: "danger", text: res.message });
      return;
    }
    setNote({ tone: "ok", text: done });
    router.refresh();
  }

  async function setSuspended(next: boolean) {
    setBusy(true);
    setConfirming(false);
    const res = await sendJson(next ? "POST" : "DELETE", `/api/admin/users/${person.id}/suspend`, next ? {} : undefined);
    setBusy(false);
    setNote(
      res.ok
        ? { tone: "ok", text: next ? "Suspended and signed out everywhere." : "Restored; they can sign in again." }
        : { tone: "danger", text: res.message },
    );
    if (res.ok) router.refresh();
  }

  return (
    <li
      className={`grid grid-cols-2 items-center gap-x-3 gap-y-2 py-4 ${PEOPLE_COLUMNS} md:gap-4 ${suspended ? "opacity-75" : ""}`}
      data-testid={`person-${person.email}`}
    >
      <div className="min-w-0 self-start">
        <p className="flex flex-wrap items-center gap-2 font-medium text-ink">
          {person.name}
          {isSelf ? <Badge tone="accent">You</Badge> : null}
          {suspended ? <Badge tone="danger">Suspended</Badge> : null}
          {person.locked ? (
            <span title="Locked after repeated failed sign-ins">
              <Badge tone="danger">Sign-in locked</Badge>
            </span>
          ) : null}
        </p>
        <p className="truncate text-sm text-muted">{person.email}</p>
      </div>
      <label className="order-3 flex flex-col gap-1 text-xs text-muted md:order-none md:block">
        <span className="md:sr-only">Role</span>
        <RoleSelect
          aria-label={`Role of ${person.name}`}
          value={role}
          disabled={busy || isSelf}
          className="disabled:cursor-not-allowed disabled:bg-surface-2 disabled:text-muted"
          title={isSelf ? "Another admin must change your role." : undefined}
          onChange={(e) => {
            const before = role;
            setRole(e.target.value);
            void save(
              { role: e.target.value },
              () => setRole(before),
              `Role is now ${isRole(e.target.value) ? ROLE_LABELS[e.target.value] : e.target.value}.`,
            );
          }}
        />
      </label>
      <label className="order-4 flex flex-col gap-1 text-xs text-muted md:order-none md:block">
        <span className="md:sr-only">Home site</span>
        <SiteSelect
          aria-label={`Home site of ${person.name}`}
          sites={sites}
          value={siteId}
          disabled={busy}
          onChange={(e) => {
            const before = siteId;
            const next = e.target.value || null;
            setSiteId(next);
            void save({ siteId: next }, () => setSiteId(before), next ? "Home site saved." : "No home site: works across all sites.");
          }}
        />
      </label>
      <div className="order-2 flex flex-wrap items-center justify-end gap-2 self-start md:order-none md:self-center">
        {person.locked ? (
          <Button size="sm" variant="secondary" onClick={unlock} disabled={busy}>
            Unlock
          </Button>
        ) : null}
        {isSelf ? (
          <span className="text-xs text-muted">Your account</span>
        ) : confirming ? (
          <>
            <Button size="sm" variant="danger" onClick={() => setSuspended(true)} disabled={busy}>
              Yes, suspend
            </Button>
            <Button size="sm" variant="ghost" onClick={() => setConfirming(false)}>
              Keep
            </Button>
          </>
        ) : suspended ? (
          <Button size="sm" variant="secondary" onClick={() => setSuspended(false)} disabled={busy}>
            Restore
          </Button>
        ) : (
          <button type="button" className={quietDangerClass} onClick={() => setConfirming(true)} disabled={busy}>
            Suspend
          </button>
        )}
      </div>
      {note ? <StatusNote note={note} className="order-5 col-span-2 md:order-none md:col-span-4 md:-mt-2" /> : null}
    </li>
  );
}
