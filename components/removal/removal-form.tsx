"use client";
// The removal form, phone first: where and when, why, the bearing, the checks, and the live field call.
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import { sendEntry } from "@/components/offline/outbox-send";
import { deleteEntry, putEntry, type OutboxEntry } from "@/components/offline/outbox-store";
import { useOutboxEntries } from "@/components/offline/use-connection";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Caution } from "@/components/ui/caution";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { evaluateFieldChecks } from "@/lib/cases/compute";
import { BEARING_CLASSES } from "@/lib/cases/bearing-classes";
import { createCaseSchema } from "@/lib/cases/schemas";
import { ErrorSummary } from "@/components/ui/error-summary";
import { DEFAULT_END_PLAY_POLICY, VISUAL_FINDINGS, safetyConfirmationsFor, type EndPlayPolicy } from "@/lib/field";
import { AxlePicker } from "./axle-picker";
import { ChoiceChips } from "./choice-chips";
import { EndPlayEntry } from "./end-play-entry";
import { FieldCallPanel } from "./field-call-panel";
import { emptyDraft, forSaving, type RemovalDraft } from "./form-state";
import { HandRollEntry } from "./hand-roll-grid";
import { TriggerDetails } from "./trigger-details";
import { clearLocalDraft, loadLocalDraft, useAutosave } from "./use-autosave";

export type SiteOption = { id: string; name: string; kind: string; policy: EndPlayPolicy };

type Props = { mode: "new" | "edit"; sites: SiteOption[]; initial?: RemovalDraft; caseId?: string; version?: number; defaultSiteId: string | null };

export function RemovalForm({ mode, sites, initial, caseId, version, defaultSiteId }: Props) {
  const router = useRouter();
  const [draft, setDraft] = useState<RemovalDraft>(initial ?? emptyDraft(defaultSiteId));
  const [restored, setRestored] = useState(false);
  const [filing, setFiling] = useState(false);
  const [queued, setQueued] = useState<string | null>(null);
  // One key per report: a double tap or a replay from the outbox files it once.
  const fileKey = useRef<string | null>(null);
  const { lastSent } = useOutboxEntries();
  const sentNow = queued && lastSent && lastSent.key === fileKey.current ? lastSent.number : null;
  const autosave = useAutosave(draft, { mode, caseId, version, enabled: restored || mode === "edit" });
  const [checked, setChecked] = useState<Record<string, string> | null>(null);
  const errors = checked ?? autosave.state.fields ?? {};

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
    if (filing) return;
    // Checked on the device first: what is missing is shown now, not after the outbox replays it.
    const parsed = createCaseSchema.safeParse(forSaving(draft));
    if (!parsed.success) {
      const fields: Record<string, string> = {};
      for (const issue of parsed.error.issues) fields[issue.path.join(".") || "_"] ??= issue.message;
      return setChecked(fields);
    }
    setChecked(null);
    setFiling(true);
    fileKey.current ??= crypto.randomUUID();
    const label = [draft.carMark, draft.carNumber].filter(Boolean).join(" ") + (draft.axle && draft.side ? ` · ${draft.axle}${draft.side}` : "");
    const entry: OutboxEntry = { key: fileKey.current, body: forSaving(draft), label: label || "Removal report", queuedAt: new Date().toISOString(), attempts: 0, state: "waiting" };
    // Into the device outbox first: whatever the signal does next, the report is not lost.
    await putEntry(entry);
    const result = await sendEntry(entry);
    setFiling(false);
    if (result.kind === "filed") {
      clearLocalDraft();
      return router.push(`/cases/${result.number}`);
    }
    if (result.kind === "refused") {
      await deleteEntry(entry.key);
      fileKey.current = null;
      return autosave.setState({ kind: "error", message: result.message, fields: result.fields });
    }
    clearLocalDraft();
    setQueued(label || "Your report");
  }

  function startAnother() {
    fileKey.current = null;
    setQueued(null);
    setDraft(emptyDraft(draft.siteId ?? defaultSiteId));
    window.scrollTo(0, 0);
  }

  if (queued && sentNow) {
    return (
      <div role="status" data-testid="queued-sent" className="flex flex-col gap-4 rounded-xl border border-ok/40 bg-ok-soft p-5 text-ink">
        <p className="text-lg font-semibold">{queued} is filed as {sentNow}.</p>
        <div className="flex flex-col gap-3 sm:flex-row">
          <Button size="lg" onClick={() => router.push(`/cases/${sentNow}`)}>Open {sentNow}</Button>
          <Button size="lg" variant="secondary" onClick={startAnother}>Start another report</Button>
        </div>
      </div>
    );
  }

  if (queued) {
    return (
      <div role="status" data-testid="queued" className="flex flex-col gap-4 rounded-xl border border-warn/40 bg-warn-soft p-5 text-ink">
        <p className="text-lg font-semibold">{queued} is kept on this device — waiting to send.</p>
        <p className="text-sm text-ink-2">There is no connection to the server right now. The report is sent by itself, once, when the connection returns; the bar at the top shows when it is filed. Do not file it again.</p>
        <Button size="lg" onClick={startAnother}>Start another report</Button>
      </div>
    );
  }

  return (
    <form className="flex flex-col gap-5" onSubmit={(e) => e.preventDefault()} noValidate aria-label="Removal report">
      <ErrorSummary errors={errors} />
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
          <div data-field="axle">
            <AxlePicker axle={draft.axle} side={draft.side} onPick={(axle, side) => patch({ axle, side })} />
          </div>
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
          {safetyConfirmationsFor(draft.trigger).map(({ key, label, caution }) => (
            <div key={key} data-safety={key}>
              <label className={`flex min-h-12 items-center gap-3 rounded-lg border px-3 ${conf[key] ? "border-line" : "border-warn/50"}`}>
                <input type="checkbox" className="h-6 w-6 accent-[var(--accent)]" checked={!!conf[key]} onChange={(e) => setChecks({ confirmations: { ...conf, [key]: e.target.checked } })} />
                {label}
              </label>
              {/* Unticked is allowed (the report still files) but recorded on the case and shown to the engineer. */}
              {!conf[key] ? <p className="mt-1 px-1 text-xs text-warn">Not confirmed: {caution} If filed unticked, the case carries a safety flag.</p> : null}
            </div>
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
        <div data-field="endPlay">
          <EndPlayEntry value={checks.endPlay ?? { method: "dial", unit: "in", trials: [{ zero: "0", reading: "" }] }} onChange={(endPlay) => setChecks({ endPlay })} policy={policy} />
        </div>
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
            {filing ? "Sending…" : "File removal report"}
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
