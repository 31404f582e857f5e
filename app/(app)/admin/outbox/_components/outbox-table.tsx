import { Badge } from "@/components/ui/badge";
import type { OutboxRow } from "@/lib/admin/outbox-service";
import { NOTICE_KINDS } from "@/lib/notify/notice-kinds";
import { when } from "./when";

const KIND_LABELS: Record<string, string> = {
  invitation: "Invitation",
  "password-reset": "Password reset",
  ...Object.fromEntries(NOTICE_KINDS.map((k) => [k.kind, k.label])),
};

function StatusBadge({ row }: { row: OutboxRow }) {
  if (row.status === "sent") return <Badge tone="ok">Sent</Badge>;
  if (row.status === "failed") return <Badge tone="danger">Given up</Badge>;
  return <Badge tone="warn">{row.attempts > 0 ? "Retrying" : "Queued"}</Badge>;
}

function nextTry(row: OutboxRow, now: number) {
  return row.status === "pending" ? when(row.nextAttemptAt, now) : "—";
}

export function OutboxTable({ rows, now }: { rows: OutboxRow[]; now: number }) {
  return (
    <>
      <ul className="divide-y divide-line md:hidden" data-testid="outbox-cards">
        {rows.map((r) => (
          <li key={r.id} className="py-3">
            <div className="flex items-start justify-between gap-3">
              <p className="min-w-0 font-medium leading-snug">{r.subject}</p>
              <StatusBadge row={r} />
            </div>
            <p className="mt-1 break-all text-sm text-ink-2">{r.to.join(", ")}</p>
            <p className="mt-1 text-xs text-muted">
              {KIND_LABELS[r.kind] ?? r.kind} · {r.attempts} {r.attempts === 1 ? "attempt" : "attempts"} ·{" "}
              {r.status === "sent" ? `sent ${when(r.sentAt, now)}` : `next try ${nextTry(r, now)}`}
            </p>
            {r.lastError && r.status !== "sent" ? (
              <p className="mt-1 rounded-md bg-danger-soft px-2 py-1 text-xs text-danger">{r.lastError}</p>
            ) : null}
          </li>
        ))}
      </ul>
      <div className="-mx-5 hidden overflow-x-auto md:block">
        <table className="w-full text-left text-sm" data-testid="outbox-table">
          <thead className="border-b border-line text-xs uppercase tracking-wide text-muted">
            <tr>
              {["Kind", "To", "Subject", "Status", "Attempts", "Last error", "Next attempt", "Sent"].map((h) => (
                <th key={h} scope="col" className="whitespace-nowrap px-3 py-2 font-medium first:pl-5 last:pr-5">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {rows.map((r) => (
              <tr key={r.id} className="align-top">
                <td className="whitespace-nowrap py-2.5 pl-5 pr-3 text-ink-2">{KIND_LABELS[r.kind] ?? r.kind}</td>
                <td className="max-w-56 break-words px-3 py-2.5">{r.to.join(", ")}</td>
                <td className="max-w-72 px-3 py-2.5 font-medium">{r.subject}</td>
                <td className="px-3 py-2.5">
                  <StatusBadge row={r} />
                </td>
                <td className="px-3 py-2.5 text-center tabular">{r.attempts}</td>
                <td className="max-w-64 px-3 py-2.5 text-xs text-danger">{r.status !== "sent" ? (r.lastError ?? "") : ""}</td>
                <td className="whitespace-nowrap px-3 py-2.5 text-ink-2 tabular">{nextTry(r, now)}</td>
                <td className="whitespace-nowrap py-2.5 pl-3 pr-5 text-ink-2 tabular">{when(r.sentAt, now)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
