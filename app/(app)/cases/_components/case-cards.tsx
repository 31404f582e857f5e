// The phone view: one card per case, the whole card a link to the case.
import Link from "next/link";
import { StageBadge } from "@/components/ui/badge";
import { formatCar, formatDay, formatPosition, type CaseListRow } from "@/lib/cases/list-columns";
import { CallBadge } from "./value-badges";

export function CaseCards({ rows, busy }: { rows: CaseListRow[]; busy: boolean }) {
  return (
    <ul className={`divide-y divide-line transition-opacity ${busy ? "opacity-60" : ""}`} data-testid="case-cards" aria-busy={busy}>
      {rows.map((r) => (
        <li key={r.id}>
          <Link href={`/cases/${r.number}`} data-testid="case-card" className="block px-4 py-3.5 active:bg-surface-2">
            <div className="flex items-center justify-between gap-3">
              <span className="font-semibold text-ink tabular">{r.number}</span>
              <StageBadge stage={r.status} />
            </div>
            <p className="mt-1.5 text-[15px] text-ink">
              <span className="font-medium">{formatCar(r) || "Car not recorded"}</span>
              {r.axle || r.side ? <span className="text-ink-2"> · {formatPosition(r.axle, r.side)}</span> : null}
            </p>
            <p className="mt-0.5 truncate text-sm text-ink-2">
              {r.triggerLabel}
              {r.serial ? <span className="font-mono text-[13px] text-muted"> · {r.serial}</span> : null}
            </p>
            <div className="mt-2 flex flex-wrap items-center gap-x-2 gap-y-1.5 text-xs text-muted">
              {r.fieldCall ? <CallBadge call={r.fieldCall} /> : null}
              {r.causeLabel ? (
                <span className="rounded-md bg-surface-2 px-2 py-0.5 font-medium text-ink-2 ring-1 ring-inset ring-line">
                  {r.causeLabel}
                </span>
              ) : null}
              <span className="tabular">{[r.siteName, formatDay(r.removedOn)].filter(Boolean).join(" · ")}</span>
            </div>
          </Link>
        </li>
      ))}
    </ul>
  );
}
