"use client";
// Add or change one teardown finding: part, row, code, severity, where (clock and arc, zone) and size.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { COMPONENTS, SEVERITIES, ZONES } from "@/lib/classification/bearing-parts";
import type { FindingInput } from "@/lib/cases/schemas";
import { CodePicker, type PickerEntry } from "./code-picker";

const num = (v: string) => (v.trim() === "" ? null : Number(v.replace(",", ".")));

export function FindingForm({
  initial,
  codes,
  onSubmit,
  onCancel,
  busy,
  errors,
}: {
  initial?: Partial<FindingInput>;
  codes: PickerEntry[];
  onSubmit: (f: FindingInput) => void;
  onCancel: () => void;
  busy: boolean;
  errors: Record<string, string>;
}) {
  const [f, setF] = useState<Partial<FindingInput>>(initial ?? { component: "cup", severity: 2 });
  const comp = COMPONENTS.find((c) => c.code === f.component);
  const set = (p: Partial<FindingInput>) => setF((x) => ({ ...x, ...p }));
  return (
    <form
      className="grid gap-3 rounded-lg border border-line bg-surface-2 p-3 sm:grid-cols-2 lg:grid-cols-4"
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit(f as FindingInput);
      }}
      aria-label="Finding"
    >
      <Field label="Part" htmlFor="f-component" error={errors.component}>
        <Select id="f-component" value={f.component ?? ""} onChange={(e) => set({ component: e.target.value })}>
          {COMPONENTS.map((c) => (
            <option key={c.code} value={c.code}>
              {c.label}
            </option>
          ))}
        </Select>
      </Field>
      <div className="sm:col-span-2">
        <Field label="Damage" htmlFor="f-code" error={errors.damageCode}>
          <CodePicker id="f-code" entries={codes} value={f.damageCode ?? ""} onChange={(damageCode) => set({ damageCode })} />
        </Field>
      </div>
      <Field label="Severity" htmlFor="f-severity" error={errors.severity}>
        <Select id="f-severity" value={f.severity ?? ""} onChange={(e) => set({ severity: Number(e.target.value) })}>
          {SEVERITIES.map((s) => (
            <option key={s.code} value={s.code}>
              {s.code} · {s.label}
            </option>
          ))}
        </Select>
      </Field>
      {comp?.hasRow ? (
        <Field label="Row" htmlFor="f-row" error={errors.row}>
          <Select id="f-row" value={f.row ?? ""} onChange={(e) => set({ row: (e.target.value || null) as FindingInput["row"] })}>
            <option value="">—</option>
            <option value="inboard">Inboard</option>
            <option value="outboard">Outboard</option>
          </Select>
        </Field>
      ) : null}
      <Field
        label="Clock position (°, 0 = 12 o'clock)"
        htmlFor="f-clock"
        error={errors.clockDeg}
        hint="Clockwise seen from the outboard end."
      >
        <Input id="f-clock" inputMode="numeric" value={f.clockDeg ?? ""} onChange={(e) => set({ clockDeg: num(e.target.value) })} />
      </Field>
      <Field label="Arc extent (°)" htmlFor="f-arc" error={errors.arcDeg}>
        <Input id="f-arc" inputMode="numeric" value={f.arcDeg ?? ""} onChange={(e) => set({ arcDeg: num(e.target.value) })} />
      </Field>
      <Field label="Zone" htmlFor="f-zone" error={errors.zone}>
        <Select id="f-zone" value={f.zone ?? ""} onChange={(e) => set({ zone: e.target.value || null })}>
          <option value="">—</option>
          {ZONES.map((z) => (
            <option key={z.code} value={z.code}>
              {z.label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Length × width (mm)" htmlFor="f-length" error={errors.lengthMm ?? errors.widthMm}>
        <div className="flex items-center gap-2">
          <Input
            id="f-length"
            aria-label="Length in mm"
            inputMode="decimal"
            value={f.lengthMm ?? ""}
            onChange={(e) => set({ lengthMm: num(e.target.value) })}
          />
          <span className="text-muted">×</span>
          <Input
            aria-label="Width in mm"
            inputMode="decimal"
            value={f.widthMm ?? ""}
            onChange={(e) => set({ widthMm: num(e.target.value) })}
          />
        </div>
      </Field>
      <div className="sm:col-span-2 lg:col-span-4">
        <Field label="Notes" htmlFor="f-notes" error={errors.notes}>
          <Textarea id="f-notes" rows={2} value={f.notes ?? ""} onChange={(e) => set({ notes: e.target.value })} />
        </Field>
      </div>
      <div className="flex gap-2 sm:col-span-2 lg:col-span-4">
        <Button type="submit" disabled={busy}>
          {initial?.damageCode ? "Save finding" : "Add finding"}
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
