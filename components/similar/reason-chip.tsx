// A reason two cases matched, coloured by kind, with its share of the score in points.
import type { SimilarityReason } from "@/lib/similarity";

const tone: Record<SimilarityReason["kind"], string> = {
  "same-finding": "bg-accent-soft text-ink ring-accent/40",
  "same-code": "bg-accent-soft/60 text-ink ring-accent/25",
  "same-family": "bg-surface-2 text-ink ring-line-strong",
  "same-cause": "bg-ok-soft text-ink ring-ok/30",
  "same-trigger": "bg-stage-field-soft text-ink ring-stage-field/25",
  "same-bearing-class": "bg-surface-2 text-ink-2 ring-line",
  "shared-words": "bg-surface-2 text-ink-2 ring-line",
};

export function ReasonChip({ reason }: { reason: SimilarityReason }) {
  const points = Math.round(reason.weight * 100);
  return (
    <li
      className={`inline-flex max-w-full items-baseline gap-1.5 rounded-md px-2 py-0.5 text-xs ring-1 ring-inset ${tone[reason.kind]}`}
      data-kind={reason.kind}
    >
      <span className="min-w-0 break-words">{reason.text}</span>
      <span className="shrink-0 font-semibold tabular text-muted" title="Points this reason adds to the score (of 100)">
        +{points}
      </span>
    </li>
  );
}

/** Score out of 100 with a bar, so ten neighbours can be compared at a glance. */
export function ScoreBar({ score }: { score: number }) {
  const pct = Math.round(score * 100);
  return (
    <div className="flex w-full items-center gap-2 sm:w-28 sm:flex-col sm:items-end sm:gap-1" aria-label={`Similarity ${pct} of 100`}>
      <span className="text-lg font-semibold tabular text-ink sm:text-xl">
        {pct}
        <span className="text-xs font-normal text-muted">/100</span>
      </span>
      <span className="h-1.5 flex-1 overflow-hidden rounded-full bg-surface-2 ring-1 ring-inset ring-line sm:w-full sm:flex-none">
        <span className="block h-full rounded-full bg-accent" style={{ width: `${pct}%` }} />
      </span>
    </div>
  );
}
