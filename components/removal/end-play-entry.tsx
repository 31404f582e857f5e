"use client";
// End play entry with the arithmetic shown live: each trial, mean and spread in inches and mm.
import { useState } from "react";
import {
  DEFAULT_END_PLAY_POLICY,
  evaluateEndPlay,
  formatInches,
  formatMm,
  switchTrialUnit,
  unitSwitchNeedsChoice,
  type EndPlayPolicy,
  type LengthUnit,
} from "@/lib/field";
import type { FieldChecks } from "@/lib/cases/schemas";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "./choice-chips";
import { FieldMessages } from "./field-messages";

type EndPlay = NonNullable<FieldChecks["endPlay"]>;

const CALL_LABEL = {
  within: "Within the limit",
  "over-limit": "Over the limit — remove",
  "tight-remove": "Tight, will not turn — remove",
  "tight-remeasure": "Zero but turns freely — re-measure",
  "tight-unknown": "Zero — does it turn by hand?",
  incomplete: "No reading yet",
} as const;

export function EndPlayEntry({
  value,
  onChange,
  policy = DEFAULT_END_PLAY_POLICY,
  readOnly,
}: {
  value: EndPlay;
  onChange: (v: EndPlay) => void;
  policy?: EndPlayPolicy;
  readOnly?: boolean;
}) {
  const filled = value.trials.filter((t) => String(t.reading ?? "").trim() !== "");
  const result = evaluateEndPlay({ ...value, trials: filled }, policy);
  // A changed number needs its own confirmation if it is implausible again.
  const setTrial = (i: number, key: "zero" | "reading", v: string) =>
    onChange({ ...value, confirmedAsTyped: undefined, trials: value.trials.map((t, j) => (j === i ? { ...t, [key]: v } : t)) });
  const [pendingUnit, setPendingUnit] = useState<LengthUnit | null>(null);
  const chooseUnit = (unit: LengthUnit) => {
    if (unit === value.unit) return;
    if (unitSwitchNeedsChoice(value.trials)) return setPendingUnit(unit);
    onChange({ ...value, unit });
  };
  const applyUnit = (how: "convert" | "reinterpret") => {
    if (!pendingUnit) return;
    onChange({
      ...value,
      unit: pendingUnit,
      confirmedAsTyped: undefined,
      trials: switchTrialUnit(value.trials, value.unit, pendingUnit, how),
    });
    setPendingUnit(null);
  };
  const implausible = result.messages.some((m) => m.code === "implausible-reading");
  const dial = value.method === "dial";
  const tone = result.removes ? "text-danger" : result.call === "within" ? "text-ok" : "text-warn";
  return (
    <fieldset disabled={readOnly} className="flex flex-col gap-4">
      <div className="flex flex-wrap gap-5">
        <div>
          <p className="mb-1.5 text-xs font-medium text-muted">Measured with</p>
          <ChoiceChips
            label="Method"
            size="sm"
            value={value.method}
            onChange={(method) => onChange({ ...value, method })}
            options={[
              { value: "dial", label: "Dial indicator" },
              { value: "tape", label: "Metal tape" },
            ]}
          />
        </div>
        <div>
          <p className="mb-1.5 text-xs font-medium text-muted">Units</p>
          <ChoiceChips
            label="Units"
            size="sm"
            value={value.unit}
            onChange={chooseUnit}
            options={[
              { value: "in", label: "inches" },
              { value: "mm", label: "mm" },
            ]}
          />
        </div>
        <div>
          <p className="mb-1.5 text-xs font-medium text-muted">Turned so the rollers seat before measuring?</p>
          <ChoiceChips
            label="Rollers seated"
            size="sm"
            value={value.rollersSeated === undefined ? undefined : value.rollersSeated ? "yes" : "no"}
            onChange={(v) => onChange({ ...value, rollersSeated: v === "yes" })}
            options={[
              { value: "yes", label: "Yes, turned first" },
              { value: "no", label: "No", tone: "danger" },
            ]}
          />
        </div>
      </div>
      {pendingUnit ? (
        <div
          role="alertdialog"
          aria-label="Change units"
          data-testid="unit-switch"
          className="rounded-lg border border-warn/40 bg-warn-soft p-3 text-sm"
        >
          <p className="mb-2 font-medium text-ink">
            The trials hold numbers typed in {value.unit === "in" ? "inches" : "mm"}. What should happen to them?
          </p>
          <div className="flex flex-wrap gap-2">
            <Button size="sm" onClick={() => applyUnit("convert")}>
              Convert them to {pendingUnit === "in" ? "inches" : "mm"}
            </Button>
            <Button size="sm" variant="secondary" onClick={() => applyUnit("reinterpret")}>
              They were read in {pendingUnit === "in" ? "inches" : "mm"}
            </Button>
            <Button size="sm" variant="ghost" onClick={() => setPendingUnit(null)}>
              Keep {value.unit === "in" ? "inches" : "mm"}
            </Button>
          </div>
        </div>
      ) : null}
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-xs text-muted">
            <th className="w-12 pb-1 font-medium">Trial</th>
            {dial ? <th className="pb-1 font-medium">Zero (pushed)</th> : null}
            <th className="pb-1 font-medium">{dial ? "Reading (pulled)" : `Tape reading (${value.unit}, fractions ok)`}</th>
            <th className="pb-1 text-right font-medium">End play</th>
            <th className="w-8" />
          </tr>
        </thead>
        <tbody>
          {value.trials.map((t, i) => {
            const v = result.trials.find((x) => x.trial === filled.indexOf(t) + 1);
            return (
              <tr key={i} className="border-t border-line">
                <td className="py-1.5 font-medium tabular">{i + 1}</td>
                {dial ? (
                  <td className="py-1.5 pr-2">
                    <input
                      aria-label={`Trial ${i + 1} zero`}
                      inputMode="decimal"
                      className="h-11 w-full rounded-md border border-line-strong bg-surface px-2 text-base tabular"
                      value={String(t.zero ?? "")}
                      onChange={(e) => setTrial(i, "zero", e.target.value)}
                    />
                  </td>
                ) : null}
                <td className="py-1.5 pr-2">
                  <input
                    aria-label={`Trial ${i + 1} reading`}
                    inputMode={dial ? "decimal" : "text"}
                    placeholder={dial ? (value.unit === "in" ? "0.018" : "0.45") : "3/64"}
                    aria-invalid={implausible || undefined}
                    className={`h-11 w-full rounded-md border bg-surface px-2 text-base tabular ${implausible ? "border-danger ring-2 ring-danger/30" : "border-line-strong"}`}
                    value={String(t.reading ?? "")}
                    onChange={(e) => setTrial(i, "reading", e.target.value)}
                  />
                </td>
                <td className="py-1.5 text-right text-xs tabular text-ink-2">
                  {v ? (
                    <>
                      {formatInches(v.in)}
                      <br />
                      {formatMm(v.mm)}
                    </>
                  ) : (
                    "—"
                  )}
                </td>
                <td className="py-1.5 text-right">
                  {value.trials.length > 1 ? (
                    <button
                      type="button"
                      aria-label={`Delete trial ${i + 1}`}
                      className="min-h-11 min-w-11 px-2 text-lg text-muted hover:text-danger"
                      onClick={() => onChange({ ...value, trials: value.trials.filter((_, j) => j !== i) })}
                    >
                      ×
                    </button>
                  ) : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="flex flex-wrap items-center gap-3">
        <Button
          variant="secondary"
          size="sm"
          onClick={() => onChange({ ...value, trials: [...value.trials, { zero: "0", reading: "" }] })}
          disabled={value.trials.length >= 10}
        >
          Add trial
        </Button>
        {implausible ? (
          <Button size="sm" variant="danger" onClick={() => onChange({ ...value, confirmedAsTyped: true })}>
            Confirm the reading as typed
          </Button>
        ) : null}
        {result.call.startsWith("tight") ? (
          <ChoiceChips
            label="Turns by hand"
            size="sm"
            value={value.turnsByHand === undefined ? undefined : value.turnsByHand ? "yes" : "no"}
            onChange={(v) => onChange({ ...value, turnsByHand: v === "yes" })}
            options={[
              { value: "yes", label: "Turns easily by hand" },
              { value: "no", label: "Will not turn by hand", tone: "danger" },
            ]}
          />
        ) : null}
      </div>
      {result.call !== "incomplete" ? (
        <div
          className="grid grid-cols-2 gap-3 rounded-lg border border-line bg-surface-2 p-3 sm:grid-cols-4"
          aria-live="polite"
          data-testid="end-play-result"
        >
          <Stat label="Mean" value={formatInches(result.meanIn)} sub={formatMm(result.meanMm)} />
          <Stat label="Spread" value={formatInches(result.spreadIn)} sub={formatMm(result.spreadMm)} />
          <Stat label="Limit" value={formatInches(policy.maxIn)} sub={`${result.count} trial${result.count === 1 ? "" : "s"}`} />
          <div>
            <p className="text-xs text-muted">Call</p>
            <p className={`font-semibold ${tone}`}>{CALL_LABEL[result.call]}</p>
          </div>
        </div>
      ) : null}
      {filled.length ? (
        <FieldMessages messages={result.messages} />
      ) : (
        <p className="text-sm text-muted">Enter at least one reading to see the end play and the call.</p>
      )}
    </fieldset>
  );
}

function Stat({ label, value, sub }: { label: string; value: string; sub: string }) {
  return (
    <div>
      <p className="text-xs text-muted">{label}</p>
      <p className="font-semibold tabular">{value}</p>
      <p className="text-xs tabular text-muted">{sub}</p>
    </div>
  );
}
