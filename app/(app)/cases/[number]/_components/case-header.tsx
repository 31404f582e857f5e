import Link from "next/link";
import { StageBadge, Badge } from "@/components/ui/badge";
import { triggerLabel } from "@/lib/classification/labels";
import type { CaseDetail } from "@/lib/cases/types";
import { formatDay } from "@/lib/cases/list-columns";
import { safetyFlagOf } from "@/lib/cases/safety-flag";
import { SafetyFlagNote } from "./safety-flag-note";

const callTone = { remove: "danger", keep: "ok", undecided: "warn" } as const;

export function CaseHeader({ c }: { c: CaseDetail }) {
  const flag = safetyFlagOf(c.fieldChecks, c.trigger);
  return (
    <header className="mb-5 flex flex-col gap-3">
      <nav className="text-sm text-muted no-print">
        <Link href="/cases" className="hover:text-ink">
          Cases
        </Link>{" "}
        <span aria-hidden>/</span> <span className="text-ink-2">{c.number}</span>
      </nav>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold tracking-tight tabular sm:text-3xl">{c.number}</h1>
        <StageBadge stage={c.status} />
        {c.fieldCall ? <Badge tone={callTone[c.fieldCall]}>Field call: {c.fieldCall}</Badge> : null}
        {flag.length ? <Badge tone="warn">Safety flag</Badge> : null}
        {/* the outcome is the engineer's to state: no badge until the verdict is signed */}
        {c.status !== "signed" ? null : c.removalConfirmed === "no-defect" ? (
          <Badge tone="warn">No defect found</Badge>
        ) : c.removalConfirmed === "confirmed" ? (
          <Badge tone="ok">Removal confirmed</Badge>
        ) : null}
      </div>
      <p className="text-sm text-ink-2">
        {[
          c.carMark && `${c.carMark} ${c.carNumber}`,
          c.axle && c.side ? `position ${c.axle}${c.side}` : null,
          triggerLabel(c.trigger),
          c.siteName,
          c.removedOn && `removed ${formatDay(c.removedOn)}`,
          c.serial && `serial ${c.serial}`,
        ]
          .filter(Boolean)
          .join(" · ")}
      </p>
      <SafetyFlagNote flag={flag} />
      {c.status === "signed" ? (
        <p className="rounded-lg border border-ok/30 bg-ok-soft px-3 py-2 text-sm text-ok">
          Signed by <strong>{c.signedByName ?? "an engineer"}</strong> on {c.signedAt ? formatDay(c.signedAt.toISOString()) : "—"}. This
          case is read-only; an engineer can reopen it with a reason.
        </p>
      ) : null}
      {c.status === "bench" && c.returnReason ? (
        <p className="rounded-lg border border-warn/40 bg-warn-soft px-3 py-2 text-sm">
          <strong>Returned to the bench:</strong> {c.returnReason}
        </p>
      ) : null}
    </header>
  );
}
