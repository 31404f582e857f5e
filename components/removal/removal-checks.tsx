"use client";
// The removal form after its first screen: why the bearing came out, the bearing, the checks and
// the live field call. It carries the field rules (lib/field) and the code lists, so the form loads
// it just after the first screen (removal-checks-lazy.tsx) and the mechanic can start typing sooner.
import { useMemo } from "react";
import { Card } from "@/components/ui/card";
import { Caution } from "@/components/ui/caution";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { evaluateFieldChecks } from "@/lib/cases/compute";
import { BEARING_CLASSES } from "@/lib/cases/bearing-classes";
import { VISUAL_FINDINGS, safetyConfirmationsFor, type EndPlayPolicy } from "@/lib/field";
import { ChoiceChips } from "./choice-chips";
import { EndPlayEntry } from "./end-play-entry";
import { FieldCallPanel } from "./field-call-panel";
import { forSaving, type RemovalDraft } from "./form-state";
import { HandRollEntry } from "./hand-roll-grid";
import { TriggerDetails } from "./trigger-details";

export type RemovalChecksProps = {
  draft: RemovalDraft;
  patch: (p: Partial<RemovalDraft>) => void;
  setChecks: (p: Partial<RemovalDraft["fieldChecks"]>) => void;
  policy: EndPlayPolicy;
  errors: Record<string, string>;
};

export function RemovalChecks({ draft, patch, setChecks, policy, errors }: RemovalChecksProps) {
  const checks = draft.fieldChecks;
  const evaluation = useMemo(() => evaluateFieldChecks(forSaving(draft).fieldChecks, policy), [draft, policy]);
  const wayside = draft.trigger === "wayside-hot" || draft.trigger === "wayside-acoustic";
  const conf = checks.confirmations ?? {};

  return (
    <>
      <Card title="2 · Why it came out">
        <TriggerDetails
          trigger={draft.trigger ?? ""}
          detail={(draft.triggerDetail ?? {}) as Record<string, string | number | boolean | null>}
          onTrigger={(trigger) => patch({ trigger, triggerDetail: {} })}
          onDetail={(triggerDetail) => patch({ triggerDetail })}
          errors={errors}
        />
        {draft.trigger === "wayside-hot" ? (
          <div className="mt-4">
            <Caution title="Hot bearing">
              A bearing that set off a hot-bearing alarm may be hot enough to burn. Let it cool and handle it with protection.
            </Caution>
          </div>
        ) : null}
        {draft.trigger === "welding" ? (
          <div className="mt-4">
            <Caution title="Welding near bearings">
              Welding near a mounted bearing must never return current through it; ground the work piece directly.
            </Caution>
          </div>
        ) : null}
      </Card>

      <Card title="3 · The bearing">
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label="Serial" htmlFor="serial" error={errors.serial}>
            <Input id="serial" autoCapitalize="characters" value={draft.serial ?? ""} onChange={(e) => patch({ serial: e.target.value })} />
          </Field>
          <Field label="Class" htmlFor="bearingClass" error={errors.bearingClass}>
            <Select
              id="bearingClass"
              value={draft.bearingClass ?? ""}
              onChange={(e) => patch({ bearingClass: (e.target.value || undefined) as RemovalDraft["bearingClass"] })}
            >
              <option value="">Choose…</option>
              {BEARING_CLASSES.map((c) => (
                <option key={c} value={c}>
                  {c === "other" ? "Other…" : `Class ${c}`}
                </option>
              ))}
            </Select>
          </Field>
          {draft.bearingClass === "other" ? (
            <Field label="Other class" htmlFor="bearingClassOther">
              <Input
                id="bearingClassOther"
                value={draft.bearingClassOther ?? ""}
                onChange={(e) => patch({ bearingClassOther: e.target.value })}
              />
            </Field>
          ) : (
            <Field label="Maker code" htmlFor="makerCode">
              <Input id="makerCode" value={draft.makerCode ?? ""} onChange={(e) => patch({ makerCode: e.target.value })} />
            </Field>
          )}
          <Field label="Made (year-month)" htmlFor="manufacturedYm" error={errors.manufacturedYm}>
            <Input
              id="manufacturedYm"
              type="month"
              value={draft.manufacturedYm ?? ""}
              onChange={(e) => patch({ manufacturedYm: e.target.value || null })}
            />
          </Field>
          <Field label="Mounted on" htmlFor="mountedOn" error={errors.mountedOn}>
            <Input
              id="mountedOn"
              type="date"
              value={draft.mountedOn ?? ""}
              onChange={(e) => patch({ mountedOn: e.target.value || null })}
            />
          </Field>
          <Field label="Times reconditioned" htmlFor="timesReconditioned">
            <Input
              id="timesReconditioned"
              inputMode="numeric"
              value={draft.timesReconditioned ?? ""}
              onChange={(e) => patch({ timesReconditioned: e.target.value === "" ? null : Number(e.target.value) })}
            />
          </Field>
          <Field label="Lot" htmlFor="lot">
            <Input id="lot" value={draft.lot ?? ""} onChange={(e) => patch({ lot: e.target.value || null })} />
          </Field>
          <Field label="Miles since mounting (if known)" htmlFor="serviceMiles">
            <Input
              id="serviceMiles"
              inputMode="numeric"
              value={draft.serviceMiles ?? ""}
              onChange={(e) => patch({ serviceMiles: e.target.value === "" ? null : Number(e.target.value) })}
            />
          </Field>
        </div>
      </Card>

      <Card title="4 · Hand roll">
        <div className="mb-4 grid gap-2 text-sm text-ink-2 sm:grid-cols-2">
          {safetyConfirmationsFor(draft.trigger).map(({ key, label, caution }) => (
            <div key={key} data-safety={key}>
              <label className={`flex min-h-12 items-center gap-3 rounded-lg border px-3 ${conf[key] ? "border-line" : "border-warn/50"}`}>
                <input
                  type="checkbox"
                  className="h-6 w-6 accent-[var(--accent)]"
                  checked={!!conf[key]}
                  onChange={(e) => setChecks({ confirmations: { ...conf, [key]: e.target.checked } })}
                />
                {label}
              </label>
              {/* Unticked is allowed (the report still files) but recorded on the case and shown to the engineer. */}
              {!conf[key] ? (
                <p className="mt-1 px-1 text-xs text-warn">Not confirmed: {caution} If filed unticked, the case carries a safety flag.</p>
              ) : null}
            </div>
          ))}
        </div>
        <p className="mb-3 text-sm text-muted">
          Truck lifted off the wheelset. Hands on the cup 180° apart; turn two full revolutions one way, by hand, feeling for roughness or a
          catch. Pull the cup outboard, then push it inboard; rotate the axle 120° and repeat, then once more.
        </p>
        <HandRollEntry value={checks.handRoll ?? { grid: {}, procedure: {} }} onChange={(handRoll) => setChecks({ handRoll })} />
      </Card>

      <Card title="5 · Mounted end play">
        <p className="mb-3 text-sm text-muted">
          Turn the bearing first so the rollers seat. Dial indicator on a magnetic base on the cup, stem against the wheel hub: push the cup
          toward the wheel and zero, pull toward the end cap and read the travel.
        </p>
        <div data-field="endPlay">
          <EndPlayEntry
            value={checks.endPlay ?? { method: "dial", unit: "in", trials: [{ zero: "0", reading: "" }] }}
            onChange={(endPlay) => setChecks({ endPlay })}
            policy={policy}
          />
        </div>
      </Card>

      <Card title="6 · What can be seen">
        <div className="grid gap-2 sm:grid-cols-2">
          {VISUAL_FINDINGS.map((v) => {
            const on = checks.visual.some((x) => x.code === v.code);
            return (
              <label
                key={v.code}
                className={`flex min-h-11 items-center gap-3 rounded-lg border px-3 text-sm ${on ? "border-accent bg-accent-soft" : "border-line"}`}
              >
                <input
                  type="checkbox"
                  className="h-5 w-5 accent-[var(--accent)]"
                  checked={on}
                  onChange={(e) =>
                    setChecks({
                      visual: e.target.checked ? [...checks.visual, { code: v.code }] : checks.visual.filter((x) => x.code !== v.code),
                    })
                  }
                />
                {v.label}
              </label>
            );
          })}
        </div>
        {wayside ? (
          <div className="mt-4">
            <p className="mb-1.5 text-sm font-medium text-ink-2">Was the detector alarm confirmed on inspection?</p>
            <ChoiceChips
              label="Alarm confirmed"
              value={checks.waysideAlarmConfirmed === undefined ? undefined : checks.waysideAlarmConfirmed ? "yes" : "no"}
              onChange={(v) => setChecks({ waysideAlarmConfirmed: v === "yes" })}
              options={[
                { value: "yes", label: "Confirmed", tone: "danger" },
                { value: "no", label: "Not confirmed" },
              ]}
            />
          </div>
        ) : null}
        <div className="mt-4">
          <Field label="Notes" htmlFor="fieldNotes" error={errors.fieldNotes}>
            <Textarea
              id="fieldNotes"
              rows={3}
              value={draft.fieldNotes ?? ""}
              onChange={(e) => patch({ fieldNotes: e.target.value })}
              placeholder="Anything else the lab should know."
            />
          </Field>
        </div>
      </Card>

      <FieldCallPanel call={evaluation.call} />
    </>
  );
}
