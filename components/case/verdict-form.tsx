"use client";
// The verdict: primary and contributing causes, confidence, whether teardown confirmed the removal.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Select, Textarea } from "@/components/ui/field";
import { ChoiceChips } from "@/components/removal/choice-chips";
import { CONFIDENCES } from "@/lib/classification/bearing-parts";
import { ROOT_CAUSES } from "@/lib/classification/root-causes";
import { ActionError, useCaseAction } from "./use-case-action";
import { Facts } from "./facts";
import { causeLabel, confidenceLabel } from "@/lib/classification/labels";

type Verdict = {
  primaryCause: string | null;
  contributingCauses: string[];
  confidence: "confirmed" | "probable" | "undetermined" | null;
  removalConfirmed: "confirmed" | "no-defect" | null;
  correctiveAction: string;
  verdictNotes: string;
};

export function VerdictForm({
  caseId,
  version,
  value,
  editable,
  causes,
}: {
  caseId: string;
  version: number;
  value: Verdict;
  editable: boolean;
  causes: { code: string; label: string }[];
}) {
  const { run, error, busy } = useCaseAction();
  const [v, setV] = useState<Verdict>(value);
  const [dirty, setDirty] = useState(false);
  const set = (p: Partial<Verdict>) => {
    setV((x) => ({ ...x, ...p }));
    setDirty(true);
  };
  const list = causes.length ? causes : ROOT_CAUSES.map((c) => ({ code: c.code, label: c.label }));
  if (!editable) {
    return (
      <div className="flex flex-col gap-4">
        <Facts
          items={[
            ["Primary root cause", causeLabel(v.primaryCause)],
            ["Contributing", v.contributingCauses.map((x) => causeLabel(x)).join(", ")],
            ["Confidence", confidenceLabel(v.confidence)],
            [
              "Removal",
              v.removalConfirmed === "confirmed" ? "Confirmed by teardown" : v.removalConfirmed === "no-defect" ? "No defect found" : null,
            ],
          ]}
        />
        {v.correctiveAction ? (
          <div>
            <p className="text-xs text-muted">Corrective action</p>
            <p className="whitespace-pre-wrap text-sm">{v.correctiveAction}</p>
          </div>
        ) : null}
        {v.verdictNotes ? (
          <div>
            <p className="text-xs text-muted">Notes</p>
            <p className="whitespace-pre-wrap text-sm">{v.verdictNotes}</p>
          </div>
        ) : null}
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Primary root cause" htmlFor="primaryCause" error={error?.fields?.primaryCause}>
          <Select
            id="primaryCause"
            value={v.primaryCause ?? ""}
            onChange={(e) => {
              const primaryCause = e.target.value || null;
              set({
                primaryCause,
                removalConfirmed:
                  primaryCause === "no-defect"
                    ? "no-defect"
                    : primaryCause && primaryCause !== "undetermined"
                      ? "confirmed"
                      : v.removalConfirmed,
              });
            }}
          >
            <option value="">Choose…</option>
            {list.map((c) => (
              <option key={c.code} value={c.code}>
                {c.label}
              </option>
            ))}
          </Select>
        </Field>
        <div>
          <p className="mb-1.5 text-sm font-medium text-ink-2">Removal</p>
          <ChoiceChips
            label="Removal confirmed"
            value={v.removalConfirmed}
            onChange={(removalConfirmed) => set({ removalConfirmed })}
            options={[
              { value: "confirmed", label: "Confirmed by teardown" },
              { value: "no-defect", label: "No defect found", tone: "warn" },
            ]}
          />
        </div>
      </div>
      <div>
        <p className="mb-1.5 text-sm font-medium text-ink-2">Contributing causes</p>
        <div className="flex flex-wrap gap-2">
          {list
            .filter((c) => c.code !== v.primaryCause && c.code !== "no-defect" && c.code !== "undetermined")
            .map((c) => {
              const on = v.contributingCauses.includes(c.code);
              return (
                <button
                  key={c.code}
                  type="button"
                  aria-pressed={on}
                  onClick={() =>
                    set({ contributingCauses: on ? v.contributingCauses.filter((x) => x !== c.code) : [...v.contributingCauses, c.code] })
                  }
                  className={`min-h-11 rounded-lg border px-3 text-sm lg:min-h-9 ${on ? "border-accent bg-accent-soft font-medium" : "border-line-strong"}`}
                >
                  {c.label}
                </button>
              );
            })}
        </div>
      </div>
      <div>
        <p className="mb-1.5 text-sm font-medium text-ink-2">Confidence</p>
        <ChoiceChips
          label="Confidence"
          value={v.confidence}
          onChange={(confidence) => set({ confidence })}
          options={CONFIDENCES.map((c) => ({ value: c.code, label: c.label }))}
        />
      </div>
      <Field label="Corrective action" htmlFor="correctiveAction">
        <Textarea id="correctiveAction" rows={2} value={v.correctiveAction} onChange={(e) => set({ correctiveAction: e.target.value })} />
      </Field>
      <Field label="Reasoning" htmlFor="verdictNotes">
        <Textarea
          id="verdictNotes"
          rows={3}
          value={v.verdictNotes}
          onChange={(e) => set({ verdictNotes: e.target.value })}
          placeholder="Why the evidence points to this cause."
        />
      </Field>
      <div className="flex items-center gap-3">
        <Button
          disabled={busy || !dirty}
          onClick={async () => (await run("PATCH", `/api/cases/${caseId}`, { version, section: "verdict", data: v })) && setDirty(false)}
        >
          Save verdict
        </Button>
        {dirty ? <span className="text-sm text-muted">Unsaved changes</span> : null}
      </div>
      <ActionError error={error} />
    </div>
  );
}
