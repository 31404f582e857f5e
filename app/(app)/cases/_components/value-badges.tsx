// The field call and the teardown outcome as small coloured labels.
import { Badge } from "@/components/ui/badge";
import { fieldCallLabel, outcomeLabel, type FieldCall, type RemovalOutcome } from "@/lib/cases/list-columns";

const callTone = { keep: "ok", remove: "danger", undecided: "warn" } as const;

export function CallBadge({ call }: { call: FieldCall | null }) {
  if (!call) return <span className="text-muted">—</span>;
  return <Badge tone={callTone[call]}>{fieldCallLabel(call)}</Badge>;
}

export function OutcomeBadge({ outcome }: { outcome: RemovalOutcome | null }) {
  if (!outcome) return <span className="text-muted">—</span>;
  return <Badge tone={outcome === "confirmed" ? "accent" : "neutral"}>{outcomeLabel(outcome)}</Badge>;
}
