"use client";
// The removal form, phone first: where and when, why, the bearing, the checks, and the live field call.
// The first screen (where and when) comes with the page; the rest (removal-checks.tsx) and the
// report's check before filing (lib/cases/schemas, with zod) load just after it, so a phone on a weak
// signal can start typing sooner. Both are fetched on every visit, so the offline worker holds them.
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { sendEntry } from "@/components/offline/outbox-send";
import { deleteEntry, putEntry, type OutboxEntry } from "@/components/offline/outbox-store";
import { useOutboxEntries } from "@/components/offline/use-connection";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Caution } from "@/components/ui/caution";
import { Field, Input, Select } from "@/components/ui/field";
import { ErrorSummary } from "@/components/ui/error-summary";
import { DEFAULT_END_PLAY_POLICY, type EndPlayPolicy } from "@/lib/field/end-play-policy";
import { AxlePicker } from "./axle-picker";
import { ChoiceChips } from "./choice-chips";
import { emptyDraft, forSaving, type RemovalDraft } from "./form-state";
import { RemovalChecks } from "./removal-checks-lazy";
import { clearLocalDraft, loadLocalDraft, useAutosave } from "./use-autosave";

/** The zod schema the API files a report with, loaded once after the first screen. */
const loadReportRules = () => import("@/lib/cases/schemas");

export type SiteOption = { id: string; name: string; kind: string; policy: EndPlayPolicy };

type Props = {
  mode: "new" | "edit";
  sites: SiteOption[];
  initial?: RemovalDraft;
  caseId?: string;
  version?: number;
  defaultSiteId: string | null;
};

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

  // Fetched now, not when filing: filing must work without signal, from what this visit loaded.
  useEffect(() => void loadReportRules().catch(() => undefined), []);

  useEffect(() => {
    if (mode === "new") {
      const saved = loadLocalDraft();
      if (saved) setDraft(saved);
    }
    setRestored(true);
  }, [mode]);

  const patch = (p: Partial<RemovalDraft>) => setDraft((d) => ({ ...d, ...p }));
  const setChecks = (p: Partial<RemovalDraft["fieldChecks"]>) => setDraft((d) => ({ ...d, fieldChecks: { ...d.fieldChecks, ...p } }));
  const policy = sites.find((s) => s.id === draft.siteId)?.policy ?? DEFAULT_END_PLAY_POLICY;

  async function file() {
    if (filing) return;
    // Set before the first await, so a second tap while the check loads does nothing.
    setFiling(true);
    // Checked on the device first: what is missing is shown now, not after the outbox replays it. Should the
    // check itself not load (no signal on a visit that never fetched it), the server checks the report when it
    // arrives, and a refusal stays in the outbox with its reason.
    const rules = await loadReportRules().catch(() => null);
    const parsed = rules?.createCaseSchema.safeParse(forSaving(draft));
    if (parsed && !parsed.success) {
      const fields: Record<string, string> = {};
      for (const issue of parsed.error.issues) fields[issue.path.join(".") || "_"] ??= issue.message;
      setFiling(false);
      return setChecked(fields);
    }
    setChecked(null);
    fileKey.current ??= crypto.randomUUID();
    const label =
      [draft.carMark, draft.carNumber].filter(Boolean).join(" ") + (draft.axle && draft.side ? ` · ${draft.axle}${draft.side}` : "");
    const entry: OutboxEntry = {
      key: fileKey.current,
      body: forSaving(draft),
      label: label || "Removal report",
      queuedAt: new Date().toISOString(),
      attempts: 0,
      state: "waiting",
    };
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
        <p className="text-lg font-semibold">
          {queued} is filed as {sentNow}.
        </p>
        <div className="flex flex-col gap-3 sm:flex-row">
          <Button size="lg" onClick={() => router.push(`/cases/${sentNow}`)}>
            Open {sentNow}
          </Button>
          <Button size="lg" variant="secondary" onClick={startAnother}>
            Start another report
          </Button>
        </div>
      </div>
    );
  }

  if (queued) {
    return (
      <div role="status" data-testid="queued" className="flex flex-col gap-4 rounded-xl border border-warn/40 bg-warn-soft p-5 text-ink">
        <p className="text-lg font-semibold">{queued} is kept on this device — waiting to send.</p>
        <p className="text-sm text-ink-2">
          There is no connection to the server right now. The report is sent by itself, once, when the connection returns; the bar at the
          top shows when it is filed. Do not file it again.
        </p>
        <Button size="lg" onClick={startAnother}>
          Start another report
        </Button>
      </div>
    );
  }

  return (
    <form className="flex flex-col gap-5" onSubmit={(e) => e.preventDefault()} noValidate aria-label="Removal report">
      <ErrorSummary errors={errors} />
      <Caution title="Before you start">
        Wear the protective equipment your employer requires (safety-toe boots, safety glasses, gloves). Work on, under or between cars only
        under blue-signal protection. The wheelset must be out from under the car and secured against rolling.
      </Caution>

      <Card title="1 · Where and when">
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Removal site" htmlFor="siteId" error={errors.siteId}>
            <Select id="siteId" value={draft.siteId ?? ""} onChange={(e) => patch({ siteId: e.target.value || null })}>
              <option value="">Choose…</option>
              {sites
                .filter((s) => s.kind !== "lab")
                .map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.name}
                  </option>
                ))}
            </Select>
          </Field>
          <Field label="Removed on" htmlFor="removedOn" error={errors.removedOn}>
            <Input
              id="removedOn"
              type="date"
              value={draft.removedOn ?? ""}
              onChange={(e) => patch({ removedOn: e.target.value || null })}
            />
          </Field>
          <Field label="Car reporting mark" htmlFor="carMark" error={errors.carMark}>
            <Input
              id="carMark"
              autoCapitalize="characters"
              placeholder="SRRL"
              value={draft.carMark ?? ""}
              onChange={(e) => patch({ carMark: e.target.value.toUpperCase() })}
            />
          </Field>
          <Field label="Car number" htmlFor="carNumber" error={errors.carNumber}>
            <Input
              id="carNumber"
              inputMode="numeric"
              placeholder="204518"
              value={draft.carNumber ?? ""}
              onChange={(e) => patch({ carNumber: e.target.value })}
            />
          </Field>
        </div>
        <div className="mt-5">
          <p className="mb-2 text-sm font-medium text-ink-2">
            Wheelset position{" "}
            {draft.axle && draft.side ? (
              <span className="ml-1 rounded bg-accent-soft px-1.5 py-0.5 text-accent">
                {draft.axle}
                {draft.side}
              </span>
            ) : null}
          </p>
          <div data-field="axle">
            <AxlePicker axle={draft.axle} side={draft.side} onPick={(axle, side) => patch({ axle, side })} />
          </div>
          {errors.axle || errors.side ? <p className="text-sm text-danger">{errors.axle ?? errors.side}</p> : null}
        </div>
        <div className="mt-4">
          <p className="mb-1.5 text-sm font-medium text-ink-2">Wheel diameter</p>
          <div className="flex flex-wrap items-center gap-2">
            <ChoiceChips
              label="Wheel diameter"
              size="sm"
              value={String(draft.wheelDiameterIn ?? "")}
              onChange={(v) => patch({ wheelDiameterIn: Number(v) })}
              options={[
                { value: "33", label: "33 in" },
                { value: "36", label: "36 in" },
                { value: "38", label: "38 in" },
              ]}
            />
            <Input
              aria-label="Wheel diameter in inches"
              className="!w-24"
              inputMode="decimal"
              value={draft.wheelDiameterIn ?? ""}
              onChange={(e) => patch({ wheelDiameterIn: e.target.value === "" ? null : Number(e.target.value) })}
            />
          </div>
        </div>
      </Card>

      <RemovalChecks draft={draft} patch={patch} setChecks={setChecks} policy={policy} errors={errors} />

      <div className="flex flex-col-reverse items-stretch gap-3 sm:flex-row sm:items-center sm:justify-between">
        <p className="text-sm text-muted" role="status" data-testid="save-state">
          {autosave.state.kind === "saving"
            ? "Saving…"
            : (autosave.state.message ??
              (mode === "new" ? "Drafts are kept on this device until you file." : "Changes save automatically."))}
        </p>
        {mode === "new" ? (
          <Button size="lg" onClick={file} disabled={filing}>
            {filing ? "Sending…" : "File removal report"}
          </Button>
        ) : (
          <Button size="lg" variant="secondary" onClick={() => void autosave.saveNow()}>
            Save now
          </Button>
        )}
      </div>
      {autosave.state.kind === "conflict" ? (
        <div role="alert" className="rounded-lg border border-danger/40 bg-danger-soft p-3 text-sm text-danger">
          {autosave.state.message} Your edits are kept on this device.
          <button type="button" className="ml-2 font-semibold underline" onClick={() => location.reload()}>
            Reload
          </button>
        </div>
      ) : autosave.state.kind === "error" ? (
        <p role="alert" className="rounded-lg border border-danger/40 bg-danger-soft p-3 text-sm text-danger">
          {autosave.state.message}
        </p>
      ) : null}
    </form>
  );
}
