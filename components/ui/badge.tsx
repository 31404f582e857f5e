import type { ReactNode } from "react";
import { STAGE_LABELS, type Stage } from "@/lib/cases/stages";

const tones = {
  neutral: "bg-surface-2 text-ink-2 ring-line-strong",
  ok: "bg-ok-soft text-ok ring-ok/30",
  warn: "bg-warn-soft text-warn ring-warn/30",
  danger: "bg-danger-soft text-danger ring-danger/30",
  accent: "bg-accent-soft text-accent ring-accent/30",
} as const;

export function Badge({ tone = "neutral", children }: { tone?: keyof typeof tones; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-md px-2 py-0.5 text-xs font-medium ring-1 ring-inset ${tones[tone]}`}>
      {children}
    </span>
  );
}

const stageTone: Record<Stage, string> = {
  field: "bg-stage-field-soft text-stage-field ring-stage-field/30",
  bench: "bg-stage-bench-soft text-stage-bench ring-stage-bench/30",
  signoff: "bg-stage-signoff-soft text-stage-signoff ring-stage-signoff/30",
  signed: "bg-stage-signed-soft text-stage-signed ring-stage-signed/30",
};
const stageMark: Record<Stage, string> = { field: "○", bench: "◐", signoff: "◕", signed: "●" };

export function StageBadge({ stage }: { stage: Stage }) {
  return (
    <span
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded-full px-2.5 py-0.5 text-xs font-semibold ring-1 ring-inset ${stageTone[stage]}`}
    >
      <span aria-hidden>{stageMark[stage]}</span>
      {STAGE_LABELS[stage]}
    </span>
  );
}
