// One search hit: the case at a glance, its findings (those the search named stand out),
// and the lines of narrative where the search words were found.
import Link from "next/link";
import { StageBadge } from "@/components/ui/badge";
import { MarkedText } from "@/components/search/marked-text";
import type { SearchHit } from "@/lib/search/search-service";

const severityTone = (s: number) =>
  s >= 4
    ? "bg-danger-soft text-danger ring-danger/30"
    : s >= 3
      ? "bg-warn-soft text-warn ring-warn/30"
      : "bg-surface-2 text-ink-2 ring-line-strong";

function FindingChip({ f }: { f: SearchHit["findings"][number] }) {
  return (
    <li
      className={`inline-flex items-center gap-1.5 rounded-md px-2 py-0.5 text-xs ring-1 ring-inset ${f.matched ? "bg-accent-soft text-ink ring-accent/40" : "bg-surface-2 text-ink-2 ring-line"}`}
      data-matched={f.matched || undefined}
    >
      <span className="font-medium">{f.label}</span>
      <span className="text-muted">· {f.componentLabel}</span>
      {f.code !== "none" ? (
        <span
          className={`rounded px-1 text-[11px] font-semibold tabular ring-1 ring-inset ${severityTone(f.severity)}`}
          title={`Severity ${f.severity} of 4`}
        >
          {f.severity}
        </span>
      ) : null}
    </li>
  );
}

export function HitCard({ hit }: { hit: SearchHit }) {
  const meta = [
    hit.triggerLabel,
    hit.causeLabel ? `Cause: ${hit.causeLabel}` : "No verdict yet",
    hit.bearingClass ? `Class ${hit.bearingClass}` : null,
  ].filter(Boolean);
  return (
    <li
      className="group relative rounded-xl border border-line bg-surface p-4 shadow-[0_1px_2px_rgba(15,23,42,0.04)] transition hover:border-line-strong sm:p-5"
      data-testid="search-hit"
    >
      <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
        <div className="min-w-0">
          <Link
            href={`/cases/${hit.caseNumber}`}
            className="text-base font-semibold tabular text-ink after:absolute after:inset-0 hover:text-accent"
          >
            <MarkedText segments={hit.number} />
          </Link>
          <p className="mt-0.5 text-sm text-ink-2">
            <span className="tabular">
              Car <MarkedText segments={hit.car} />
            </span>
            {hit.serial.length ? (
              <span className="tabular">
                {" "}
                · Serial <MarkedText segments={hit.serial} />
              </span>
            ) : null}
          </p>
        </div>
        <div className="flex items-center gap-2">
          <StageBadge stage={hit.status} />
        </div>
      </div>
      <p className="mt-1.5 text-xs text-muted">
        {meta.join(" · ")}
        {hit.removedOn ? ` · removed ${hit.removedOn}` : ""}
        {hit.siteName ? ` · ${hit.siteName}` : ""}
      </p>
      {hit.findings.length ? (
        <ul className="mt-3 flex flex-wrap gap-1.5">
          {hit.findings.slice(0, 6).map((f) => (
            <FindingChip key={`${f.component}|${f.code}`} f={f} />
          ))}
        </ul>
      ) : null}
      {hit.snippets.length ? (
        <div className="mt-3 space-y-1.5 border-l-2 border-line pl-3">
          {hit.snippets.map((s) => (
            <p key={s.field} className="text-sm leading-relaxed text-ink-2" data-testid="hit-snippet">
              <span className="mr-1.5 text-xs font-semibold uppercase tracking-wide text-muted">{s.field}</span>
              <MarkedText segments={s.segments} />
            </p>
          ))}
        </div>
      ) : null}
    </li>
  );
}
