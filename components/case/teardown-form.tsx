"use client";
// Lubricant condition, the disposition of each part and the teardown narrative.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Select, Textarea } from "@/components/ui/field";
import { COMPONENTS, DISPOSITIONS, LUBRICANT_CONDITIONS } from "@/lib/classification/bearing-parts";
import { ActionError, useCaseAction } from "./use-case-action";
import { componentLabel, dispositionLabel, lubricantLabel } from "@/lib/classification/labels";

type Teardown = { lubricant: { conditions?: string[]; notes?: string }; dispositions: Record<string, string>; teardownNotes: string };
const PARTS = COMPONENTS.filter((c) => !["lubricant", "journal"].includes(c.code));

export function TeardownForm({
  caseId,
  version,
  value,
  editable,
}: {
  caseId: string;
  version: number;
  value: Teardown;
  editable: boolean;
}) {
  const { run, error, busy } = useCaseAction();
  const [t, setT] = useState<Teardown>(value);
  const [dirty, setDirty] = useState(false);
  const set = (p: Partial<Teardown>) => {
    setT((x) => ({ ...x, ...p }));
    setDirty(true);
  };
  if (!editable) {
    return (
      <div className="grid gap-4 text-sm sm:grid-cols-2">
        <div>
          <p className="text-xs text-muted">Lubricant</p>
          <p className="font-medium">{(t.lubricant.conditions ?? []).map((x) => lubricantLabel(x)).join(", ") || "—"}</p>
          {t.lubricant.notes ? <p className="mt-1 text-ink-2">{t.lubricant.notes}</p> : null}
        </div>
        <div>
          <p className="text-xs text-muted">Dispositions</p>
          <p className="font-medium">
            {Object.entries(t.dispositions)
              .map(([k, v]) => `${componentLabel(k)}: ${dispositionLabel(v)}`)
              .join(" · ") || "—"}
          </p>
        </div>
        {t.teardownNotes ? <p className="whitespace-pre-wrap rounded-lg bg-surface-2 p-3 sm:col-span-2">{t.teardownNotes}</p> : null}
      </div>
    );
  }
  const conds = t.lubricant.conditions ?? [];
  return (
    <div className="flex flex-col gap-4">
      <div>
        <p className="mb-1.5 text-sm font-medium text-ink-2">Lubricant condition</p>
        <div className="flex flex-wrap gap-2">
          {LUBRICANT_CONDITIONS.map((l) => {
            const on = conds.includes(l.code);
            return (
              <button
                key={l.code}
                type="button"
                aria-pressed={on}
                onClick={() =>
                  set({ lubricant: { ...t.lubricant, conditions: on ? conds.filter((c) => c !== l.code) : [...conds, l.code] } })
                }
                className={`min-h-11 rounded-lg border px-3 text-sm lg:min-h-10 ${on ? "border-accent bg-accent-soft font-medium" : "border-line-strong"}`}
              >
                {l.label}
              </button>
            );
          })}
        </div>
      </div>
      <Field label="Lubricant notes" htmlFor="lub-notes">
        <Textarea
          id="lub-notes"
          rows={2}
          value={t.lubricant.notes ?? ""}
          onChange={(e) => set({ lubricant: { ...t.lubricant, notes: e.target.value } })}
        />
      </Field>
      <div>
        <p className="mb-1.5 text-sm font-medium text-ink-2">Disposition of each part</p>
        <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {PARTS.map((p) => (
            <label key={p.code} className="flex items-center justify-between gap-2 text-sm">
              <span className="text-ink-2">{p.label}</span>
              <Select
                aria-label={`Disposition of ${p.label}`}
                className="!w-36"
                value={t.dispositions[p.code] ?? ""}
                onChange={(e) => {
                  const next = { ...t.dispositions };
                  if (e.target.value) next[p.code] = e.target.value;
                  else delete next[p.code];
                  set({ dispositions: next });
                }}
              >
                <option value="">—</option>
                {DISPOSITIONS.map((d) => (
                  <option key={d.code} value={d.code}>
                    {d.label}
                  </option>
                ))}
              </Select>
            </label>
          ))}
        </div>
      </div>
      <Field label="Teardown notes" htmlFor="teardownNotes">
        <Textarea
          id="teardownNotes"
          rows={4}
          value={t.teardownNotes}
          onChange={(e) => set({ teardownNotes: e.target.value })}
          placeholder="What the teardown showed, in the order you found it."
        />
      </Field>
      <div className="flex items-center gap-3">
        <Button
          disabled={busy || !dirty}
          onClick={async () => (await run("PATCH", `/api/cases/${caseId}`, { version, section: "teardown", data: t })) && setDirty(false)}
        >
          Save teardown
        </Button>
        {dirty ? <span className="text-sm text-muted">Unsaved changes</span> : null}
      </div>
      <ActionError error={error} />
    </div>
  );
}
