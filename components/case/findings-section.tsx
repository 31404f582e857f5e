"use client";
// Teardown findings, component by component, with add / change / remove for the analyst.
import dynamic from "next/dynamic";
import { useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/card";
import type { Finding } from "@/lib/cases/types";
import { COMPONENTS } from "@/lib/classification/bearing-parts";
import type { FindingInput } from "@/lib/cases/schemas";
import type { PickerEntry } from "./code-picker";
import { clockWords } from "@/lib/damage-map/geometry";
import { componentLabel, damageLabel, zoneLabel } from "@/lib/classification/labels";
import { ActionError, useCaseAction } from "./use-case-action";

// The form, its code picker and the search behind it load when a finding is added or changed, not with every case page.
const FindingForm = dynamic(() => import("./finding-form").then((m) => m.FindingForm), {
  loading: () => <div className="h-64 w-full animate-pulse rounded-lg border border-line bg-surface-2" aria-hidden="true" />,
});

const sevTone = ["neutral", "neutral", "warn", "danger", "danger"] as const;

export function FindingsSection({
  caseId,
  version,
  findings,
  codes,
  editable,
}: {
  caseId: string;
  version: number;
  findings: Finding[];
  codes: PickerEntry[];
  editable: boolean;
}) {
  const { run, error, busy } = useCaseAction();
  const [editing, setEditing] = useState<string | "new" | null>(null);
  const order = (c: string) => COMPONENTS.findIndex((x) => x.code === c);
  const sorted = [...findings].sort((a, b) => order(a.component) - order(b.component));
  const save = async (f: FindingInput, id?: string) => {
    const ok = id
      ? await run("PATCH", `/api/cases/${caseId}/findings/${id}`, { version, finding: f })
      : await run("POST", `/api/cases/${caseId}/findings`, { version, finding: f });
    if (ok) setEditing(null);
  };
  return (
    <div className="flex flex-col gap-3">
      {sorted.length === 0 && editing !== "new" ? (
        <EmptyState title="No findings yet">
          {editable
            ? "Add what you see on each part, with where and how big."
            : "The analyst records findings once the bearing is on the bench."}
        </EmptyState>
      ) : null}
      <ul className="flex flex-col gap-2">
        {sorted.map((f) =>
          editing === f.id ? (
            <li key={f.id}>
              <FindingForm
                initial={{ ...f, row: f.row ?? null, clockDeg: f.clockDeg, arcDeg: f.arcDeg, zone: f.zone, notes: f.notes }}
                codes={codes}
                busy={busy}
                errors={error?.fields ?? {}}
                onCancel={() => setEditing(null)}
                onSubmit={(x) => void save(x, f.id)}
              />
            </li>
          ) : (
            <li
              key={f.id}
              className="flex flex-col gap-1 rounded-lg border border-line p-3 sm:flex-row sm:items-start sm:justify-between"
              data-testid="finding"
            >
              <div className="min-w-0">
                <p className="font-medium">
                  {damageLabel(f.damageCode)} <span className="text-muted">on the</span> {componentLabel(f.component).toLowerCase()}
                  {f.row ? <span className="text-muted"> ({f.row} row)</span> : null}
                </p>
                <p className="mt-0.5 flex flex-wrap gap-x-3 gap-y-1 text-xs text-muted">
                  <span>{f.damageCode}</span>
                  {f.clockDeg !== null ? (
                    <span>
                      at {clockWords(f.clockDeg)}
                      {f.arcDeg ? `, ${f.arcDeg}° arc` : ""}
                    </span>
                  ) : null}
                  {f.zone ? <span>{zoneLabel(f.zone)}</span> : null}
                  {f.lengthMm ? (
                    <span className="tabular">
                      {f.lengthMm} × {f.widthMm ?? "?"} mm
                    </span>
                  ) : null}
                </p>
                {f.notes ? <p className="mt-1 text-sm text-ink-2">{f.notes}</p> : null}
              </div>
              <div className="flex shrink-0 items-center gap-2">
                <Badge tone={sevTone[f.severity] ?? "neutral"}>Severity {f.severity}</Badge>
                {editable ? (
                  <>
                    <Button size="sm" variant="ghost" onClick={() => setEditing(f.id)}>
                      Change
                    </Button>
                    <Button
                      size="sm"
                      variant="ghost"
                      onClick={() => void run("DELETE", `/api/cases/${caseId}/findings/${f.id}?version=${version}`)}
                      aria-label={`Remove finding ${damageLabel(f.damageCode)}`}
                    >
                      Remove
                    </Button>
                  </>
                ) : null}
              </div>
            </li>
          ),
        )}
      </ul>
      {editing === "new" ? (
        <FindingForm
          codes={codes}
          busy={busy}
          errors={error?.fields ?? {}}
          onCancel={() => setEditing(null)}
          onSubmit={(x) => void save(x)}
        />
      ) : null}
      {editable && editing === null ? (
        <div>
          <Button variant="secondary" onClick={() => setEditing("new")}>
            Add finding
          </Button>
        </div>
      ) : null}
      <ActionError error={error} idPrefix="f-" />
    </div>
  );
}
