"use client";
// The four stages as toggles: none pressed means every stage.
import { STAGES, STAGE_LABELS, type Stage } from "@/lib/cases/stages";

const dot: Record<Stage, string> = {
  field: "bg-stage-field",
  bench: "bg-stage-bench",
  signoff: "bg-stage-signoff",
  signed: "bg-stage-signed",
};

export function StageToggles({ selected, onChange }: { selected: Stage[]; onChange: (s: Stage[]) => void }) {
  return (
    <div role="group" aria-label="Stage" className="-mx-1 flex gap-1.5 overflow-x-auto px-1 pb-0.5 [scrollbar-width:none]">
      {STAGES.map((s) => {
        const on = selected.includes(s);
        return (
          <button
            key={s}
            type="button"
            aria-pressed={on}
            data-testid={`stage-${s}`}
            onClick={() => onChange(on ? selected.filter((x) => x !== s) : STAGES.filter((x) => x === s || selected.includes(x)))}
            className={`inline-flex h-11 shrink-0 items-center gap-2 rounded-full border px-3.5 text-sm font-medium transition sm:h-9 ${
              on ? "border-ink bg-ink text-surface" : "border-line-strong bg-surface text-ink-2 hover:bg-surface-2"
            } focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent`}
          >
            <span aria-hidden className={`h-2 w-2 rounded-full ${dot[s]}`} />
            {STAGE_LABELS[s]}
          </button>
        );
      })}
    </div>
  );
}
