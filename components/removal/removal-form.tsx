"use client";
// The removal form, phone first: where and when, why, the bearing, the checks, and the live field call.
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Caution } from "@/components/ui/caution";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { evaluateFieldChecks } from "@/lib/cases/compute";
import { BEARING_CLASSES } from "@/lib/cases/bearing-classes";
import { DEFAULT_END_PLAY_POLICY, VISUAL_FINDINGS, type EndPlayPolicy } from "@/lib/field";
import { AxlePicker } from "./axle-picker";
import { ChoiceChips } from "./choice-chips";
import { EndPlayEntry } from "./end-play-entry";
import { FieldCallPanel } from "./field-call-panel";
import { emptyDraft, forSaving, type RemovalDraft } from "./form-state";
import { HandRollEntry } from "./hand-roll-grid";
import { TriggerDetails } from "./trigger-details";
import { clearLocalDraft, loadLocalDraft, readError, useAutosave } from "./use-autosave";

export type SiteOption = { id: string; name: string; kind: string; policy: EndPlayPolicy };

type Props = { mode: "new" | "edit"; sites: SiteOption[]; initial?: RemovalDraft; caseId?: string; version?: number; defaultSiteId: string | null };

export function RemovalForm({ mode, sites, initial, caseId, version, defaultSiteId }: Props) {
  const router = useRouter();
  const [draft, setDraft] = useState<RemovalDraft>(initial ?? emptyDraft(defaultSiteId));
  const [restored, setRestored] = useState(false);
  const [filing, setFiling] = useState(false);
  const autosave = useAutosave(draft, { mode, caseId, version, enabled: restored || mode === "edit" });
  const errors = autosave.state.fields ?? {};

  useEffect(() => {
    if (mode === "new") {
      const saved = loadLocalDraft();
      if (saved) setDraft(saved);
    }
    setRestored(true);
  }, [mode]);

  const patch = (p: Partial<RemovalDraft>) => setDraft((d) => ({ ...d, ...p }));
  const checks = draft.fieldChecks;
  const setChecks = (p: Partial<RemovalDraft["fieldChecks"]>) => setDraft((d) => ({ ...d, fieldChecks: { ...d.fieldChecks, ...p } }));
  const policy = sites.find((s) => s.id === draft.siteId)?.policy ?? DEFAULT_END_PLAY_POLICY;
  const evaluation = useMemo(() => evaluateFieldChecks(forSaving(draft).fieldChecks, policy), [draft, policy]);
  const wayside = draft.trigger === "wayside-hot" || draft.trigger === "wayside-acoustic";
  const conf = checks.confirmations ?? {};

  async function file() {
    setFiling(true);
    const res = await fetch("/api/cases", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(forSaving(draft)) });
    setFiling(false);
    if (!res.ok) return autosave.setState(await readError(res));
    const body = (await res.json()) as { case: { number: string } };
    clearLocalDraft();
    router.push(`/cases/${body.case.number}`);
  }

  return (
    <form className="flex flex-col gap-5" onSubmit={(e) => e.preventDefault()} noValidate aria-label="Removal report">
      <Caution title="Before you start">
        Wear the protective equipment your employer requires (safety-toe boots, safety glasses, gloves). Work on, under or between cars only under
        blue-signal protection. The wheelset must be out from under the car and secured against rolling.
      </Caution>

      <Card title="1 · Where and when">
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Removal site" htmlFor="siteId" error={errors.siteId}>
            <Select id="siteId" value={draft.siteId ?? ""} onChange={(e) => patch({ siteId: e.target.value || null })}>
              <option value="">Choose…</option>
              {sites.filter((s) => s.kind !== "lab").map((s) => (
                <option key={s.id} value={s.id}>{s.name}</option>
              ))}
            </Select>
          </Field>
          <Field label="Removed on" htmlFor="removedOn" error={errors.removedOn}>
            <Input id="removedOn" type="date" value={draft.removedOn ?? ""} onChange={(e) => patch({ removedOn: e.target.value || null })} />
          </Field>
          <Field label="Car reporting mark" htmlFor="carMark" error={errors.carMark}>
            <Input id="carMark" autoCapitalize="characters" placeholder="SRRL" value={draft.carMark ?? ""} onChange={(e) => patch({ carMark: e.target.value.toUpperCase() })} />
          </Field>
          <Field label="Car number" htmlFor="carNumber" error={errors.carNumber}>
            <Input id="carNumber" inputMode="numeric" placeholder="204518" value={draft.carNumber ?? ""} onChange={(e) => patch({ carNumber: e.target.value })} />
          </Field>
        </div>
        <div className="mt-5">
          <p className="mb-2 text-sm font-medium text-ink-2">
            Wheelset position {draft.axle && draft.side ? <span className="ml-1 rounded bg-accent-soft px-1.5 py-0.5 text-accent">{draft.axle}{draft.side}</span> : null}
          </p>
          <AxlePicker axle={draft.axle} side={draft.side} onPick={(axle, side) => patch({ axle, side })} />
          {errors.axle || errors.side ? <p className="text-sm text-danger">{errors.axle ?? errors.side}</p> : null}
        </div>
        <div className="mt-4">
          <p className="mb-1.5 text-sm font-medium text-ink-2">Wheel diameter</p>
          <div className="flex flex-wrap items-center gap-2">
            <ChoiceChips label="Wheel diameter" size="sm" value={String(draft.wheelDiameterIn ?? "")} onChange={(v) => patch({ wheelDiameterIn: Number(v) })} options={[{ value: "33", label: "33 in" }, { value: "36", label: "36 in" }, { value: "38", label: "38 in" }]} />
            <Input aria-label="Wheel diameter in inches" className="!w-24" inputMode="decimal" value={draft.wheelDiameterIn ?? ""} onChange={(e) => patch({ wheelDiameterIn: e.target.value === "" ? null : Number(e.target.value) })} />
          </div>
        </div>
      </Card>

      <Card title="2 · Why it came out">
        <TriggerDetails trigger={draft.trigger ?? ""} detail={(draft.triggerDetail ?? {}) as Record<string, string | number | boolean | null>} onTrigger={(trigger) => patch({ trigger, triggerDetail: {} })} onDetail={(triggerDetail) => patch({ triggerDetail })} errors={errors} />
        {draft.trigger === "wayside-hot" ? (
          <div className="mt-4">
            <Caution title="Hot bearing">A bearing that set off a hot-bearing alarm may be hot enough to burn. Let it cool and handle it with protection.</Caution>
          </div>
        ) : null}
        {draft.trigger === "welding" ? (
          <div className="mt-4">
            <Caution title="Welding near bearings">Welding near a mounted bearing must never return current through it; ground the work piece directly.</Caution>
          </div>
        ) : null}
      </Card>

      <Card title="3 · The bearing">
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label="Serial" htmlFor="serial" error={errors.serial}>
            <Input id="serial" autoCapitalize="characters" value={draft.serial ?? ""} onChange={(e) => patch({ serial: e.target.value })} />
          </Field>
          <Field label="Class" htmlFor="bearingClass" error={errors.bearingClass}>
            <Select id="bearingClass" value={draft.bearingClass ?? ""} onChange={(e) => patch({ bearingClass: (e.target.value || undefined) as RemovalDraft["bearingClass"] })}>
              <option value="">Choose…</option>
              {BEARING_CLASSES.map((c) => (
                <option key={c} value={c}>{c === "other" ? "Other…" : `Class ${c}`}</option>
              ))}
            </Select>
          </Field>
          {draft.bearingClass === "other" ? (
            <Field label="Other class" htmlFor="bearingClassOther">
              <Input id="bearingClassOther" value={draft.bearingClassOther ?? ""} onChange={(e) => patch({ bearingClassOther: e.target.value })} />
            </Field>
          ) : (
            <Field label="Maker code" htmlFor="makerCode">
              <Input id="makerCode" value={draft.makerCode ?? ""} onChange={(e) => patch({ makerCode: e.target.value })} />
            </Field>
          )}
          <Field label="Made (year-month)" htmlFor="manufacturedYm" error={errors.manufacturedYm}>
            <Input id="manufacturedYm" type="month" value={draft.manufacturedYm ?? ""} onChange={(e) => patch({ manufacturedYm: e.target.value || null })} />
          </Field>
          <Field label="Mounted on" htmlFor="mountedOn" error={errors.mountedOn}>
            <Input id="mountedOn" type="date" value={draft.mountedOn ?? ""} onChange={(e) => patch({ mountedOn: e.target.value || null })} />
          </Field>
          <Field label="Times reconditioned" htmlFor="timesReconditioned">
            <Input id="timesReconditioned" inputMode="numeric" value={draft.timesReconditioned ?? ""} onChange={(e) => patch({ timesReconditioned: e.target.value === "" ? null : Number(e.target.value) })} />
          </Field>
          <Field label="Lot" htmlFor="lot">
            <Input id="lot" value={draft.lot ?? ""} onChange={(e) => patch({ lot: e.target.value || null })} />
          </Field>
          <Field label="Miles since mounting (if known)" htmlFor="serviceMiles">
            <Input id="serviceMiles" inputMode="numeric" value={draft.serviceMiles ?? ""} onChange={(e) => patch({ serviceMiles: e.target.value === "" ? null : Number(e.target.value) })} />
          </Field>
        </div>
      </Card>

      <Card title="4 · Hand roll">
        <div className="mb-4 grid gap-2 text-sm text-ink-2 sm:grid-cols-2">
          {([
            ["blueSignal", "Blue-signal protection is in place"],
            ["wheelsetSecured", "Wheelset is out from under the car and secured against rolling"],
            ["ppe", "Required protective equipment is worn"],
            ["cooled", "A hot bearing has cooled enough to handle"],
          ] as const).map(([key, label]) => (
            <label key={key} className="flex min-h-11 items-center gap-3 rounded-lg border border-line px-3">
              <input type="checkbox" className="h-5 w-5 accent-[var(--accent)]" checked={!!conf[key]} onChange={(e) => setChecks({ confirmations: { ...conf, [key]: e.target.checked } })} />
              {label}
            </label>
          ))}
        </div>
        <p className="mb-3 text-sm text-muted">
          Truck lifted off the wheelset. Hands on the cup 180° apart; turn two full revolutions one way, by hand, feeling for roughness or a catch.
          Pull the cup outboard, then push it inboard; rotate the axle 120° and repeat, then once more.
        </p>
        <HandRollEntry value={checks.handRoll ?? { grid: {}, procedure: {} }} onChange={(handRoll) => setChecks({ handRoll })} />
      </Card>

      <Card title="5 · Mounted end play">
        <p className="mb-3 text-sm text-muted">
          Turn the bearing first so the rollers seat. Dial indicator on a magnetic base on the cup, stem against the wheel hub: push the cup toward the wheel and zero, pull toward the end cap and read the travel.
        </p>
        <EndPlayEntry value={checks.endPlay ?? { method: "dial", unit: "in", trials: [{ zero: "0", reading: "" }] }} onChange={(endPlay) => setChecks({ endPlay })} policy={policy} />
      </Card>

      <Card title="6 · What can be seen">
        <div className="grid gap-2 sm:grid-cols-2">
          {VISUAL_FINDINGS.map((v) => {
            const on = checks.visual.some((x) => x.code === v.code);
            return (
              <label key={v.code} className={`flex min-h-11 items-center gap-3 rounded-lg border px-3 text-sm ${on ? "border-accent bg-accent-soft" : "border-line"}`}>
                <input type="checkbox" className="h-5 w-5 accent-[var(--accent)]" checked={on} onChange={(e) => setChecks({ visual: e.target.checked ? [...checks.visual, { code: v.code }] : checks.visual.filter((x) => x.code !== v.code) })} />
                {v.label}
              </label>
            );
          })}
        </div>
        {wayside ? (
          <div className="mt-4">
            <p className="mb-1.5 text-sm font-medium text-ink-2">Was the detector alarm confirmed on inspection?</p>
            <ChoiceChips label="Alarm confirmed" value={checks.waysideAlarmConfirmed === undefined ? undefined : checks.waysideAlarmConfirmed ? "yes" : "no"} onChange={(v) => setChecks({ waysideAlarmConfirmed: v === "yes" })} options={[{ value: "yes", label: "Confirmed", tone: "danger" }, { value: "no", label: "Not confirmed" }]} />
          </div>
        ) : null}
        <div className="mt-4">
          <Field label="Notes" htmlFor="fieldNotes" error={errors.fieldNotes}>
            <Textarea id="fieldNotes" rows={3} value={draft.fieldNotes ?? ""} onChange={(e) => patch({ fieldNotes: e.target.value })} placeholder="Anything else the lab should know." />
          </Field>
        </div>
      </Card>

      <FieldCallPanel call={evaluation.call} />

      <div className="flex flex-col-reverse items-stretch gap-3 sm:flex-row sm:items-center sm:justify-between">
        <p className="text-sm text-muted" role="status" data-testid="save-state">
          {autosave.state.kind === "saving" ? "Saving…" : autosave.state.message ?? (mode === "new" ? "Drafts are kept on this device until you file." : "Changes save automatically.")}
        </p>
        {mode === "new" ? (
          <Button size="lg" onClick={file} disabled={filing}>
            {filing ? "Filing…" : "File removal report"}
          </Button>
        ) : (
          <Button size="lg" variant="secondary" onClick={() => void autosave.saveNow()}>Save now</Button>
        )}
      </div>
      {autosave.state.kind === "conflict" ? (
        <div role="alert" className="rounded-lg border border-danger/40 bg-danger-soft p-3 text-sm text-danger">
          {autosave.state.message} Your edits are kept on this device.
          <button type="button" className="ml-2 font-semibold underline" onClick={() => location.reload()}>Reload</button>
        </div>
      ) : autosave.state.kind === "error" ? (
        <p role="alert" className="rounded-lg border border-danger/40 bg-danger-soft p-3 text-sm text-danger">{autosave.state.message}</p>
      ) : null}
    </form>
  );
}
