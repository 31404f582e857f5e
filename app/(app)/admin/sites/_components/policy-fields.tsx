"use client";
import { useId } from "react";
import { Field, Input } from "@/components/ui/field";
import { formatIn, formatMmFromIn, limitText, readLimit, type PolicyUnit } from "@/lib/admin/policy-units";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field/end-play-policy";
import { DEFAULT_PLAUSIBLE_MAX_IN } from "@/lib/field/plausibility";
import type { PolicyKey } from "./types";

const FIELDS: { key: PolicyKey; label: string; hint: string }[] = [
  { key: "endPlayMaxIn", label: "Remove when end play is more than", hint: "Mounted end play above this removes the bearing." },
  { key: "dialSpreadIn", label: "Dial-indicator trials may differ by", hint: "Trials further apart than this are flagged for a re-check." },
  { key: "tapeSpreadIn", label: "Tape trials may differ by", hint: "The same for readings taken with a tape." },
  {
    key: "plausibleMaxIn",
    label: "Largest believable reading",
    hint: "A trial above this is refused until corrected or confirmed as typed: a wrong unit or a missing decimal point, not end play.",
  },
];

export type PolicyTexts = Record<PolicyKey, string>;

export function policyTexts(values: Record<PolicyKey, number>, unit: PolicyUnit): PolicyTexts {
  return {
    endPlayMaxIn: limitText(values.endPlayMaxIn, unit),
    dialSpreadIn: limitText(values.dialSpreadIn, unit),
    tapeSpreadIn: limitText(values.tapeSpreadIn, unit),
    plausibleMaxIn: limitText(values.plausibleMaxIn, unit),
  };
}

/** The four limits, typed in inches or millimetres, each shown in the other unit as you type. */
export function PolicyFields({
  texts,
  unit,
  errors,
  onChange,
  onUnit,
}: {
  texts: PolicyTexts;
  unit: PolicyUnit;
  errors: Record<string, string>;
  onChange: (next: PolicyTexts) => void;
  onUnit: (unit: PolicyUnit) => void;
}) {
  const idBase = useId();
  const other = unit === "in" ? "mm" : "in";
  return (
    <fieldset className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <legend className="text-sm font-semibold text-ink">End-play limits</legend>
        <div role="radiogroup" aria-label="Unit" className="inline-flex rounded-lg border border-line-strong p-0.5 text-sm">
          {(["in", "mm"] as const).map((u) => (
            <button
              key={u}
              type="button"
              role="radio"
              aria-checked={unit === u}
              onClick={() => onUnit(u)}
              className={`h-11 min-w-12 rounded-md px-3 font-medium lg:h-8 ${unit === u ? "bg-ink text-surface" : "text-ink-2 hover:bg-surface-2"}`}
            >
              {u === "in" ? "inches" : "mm"}
            </button>
          ))}
        </div>
      </div>
      {FIELDS.map((f) => {
        const read = readLimit(texts[f.key], unit);
        const echo = read.ok ? (other === "mm" ? `= ${formatMmFromIn(read.inches)} mm` : `= ${formatIn(read.inches)} in`) : "";
        const id = `${idBase}-${f.key}`;
        return (
          <Field key={f.key} label={f.label} htmlFor={id} error={errors[f.key]} hint={f.hint}>
            <div className="flex items-center gap-2">
              <div className="relative w-36 shrink-0">
                <Input
                  id={id}
                  inputMode="decimal"
                  value={texts[f.key]}
                  aria-invalid={!!errors[f.key]}
                  onChange={(e) => onChange({ ...texts, [f.key]: e.target.value })}
                  className="pr-10 tabular"
                />
                <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm text-muted">{unit}</span>
              </div>
              <span className="text-sm text-muted tabular" data-testid={`${f.key}-other-unit`}>
                {echo}
              </span>
            </div>
          </Field>
        );
      })}
      <p className="text-xs text-muted">
        Tearline&apos;s starting values: {formatIn(DEFAULT_END_PLAY_POLICY.maxIn)} in ({formatMmFromIn(DEFAULT_END_PLAY_POLICY.maxIn)} mm),
        trials within {formatIn(DEFAULT_END_PLAY_POLICY.dialSpreadIn)} in on a dial and 1/64 in on a tape, readings believable up to{" "}
        {formatIn(DEFAULT_PLAUSIBLE_MAX_IN)} in.
      </p>
    </fieldset>
  );
}

/** Reads the three texts as inches; field errors for anything that is not a length. */
export function readPolicy(
  texts: PolicyTexts,
  unit: PolicyUnit,
): { values: Partial<Record<PolicyKey, number>>; errors: Record<string, string> } {
  const values: Partial<Record<PolicyKey, number>> = {};
  const errors: Record<string, string> = {};
  for (const key of Object.keys(texts) as PolicyKey[]) {
    const read = readLimit(texts[key], unit);
    if (read.ok) values[key] = read.inches;
    else errors[key] = read.error;
  }
  return { values, errors };
}
