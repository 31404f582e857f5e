// Why a fit's figures should be read with care, beside the figures themselves.
import type { LifeCaution } from "@/lib/tallies/life-cautions";

export function LifeCautions({ cautions }: { cautions: readonly LifeCaution[] }) {
  if (!cautions.length) return null;
  return (
    <aside
      role="note"
      aria-label="Read these figures with care"
      data-life-cautions
      className="rounded-lg border border-warn/40 bg-warn-soft px-3.5 py-3 text-sm text-ink-2"
    >
      <p className="flex items-center gap-2 font-semibold text-ink">
        <span aria-hidden className="text-warn">
          ⚠
        </span>
        Read these figures with care
      </p>
      <ul className="mt-1.5 list-disc space-y-1 pl-5 leading-relaxed">
        {cautions.map((c) => (
          <li key={c.kind}>{c.text}</li>
        ))}
      </ul>
    </aside>
  );
}
