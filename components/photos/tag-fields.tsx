"use client";
// The tag inputs shared by the upload defaults and the photo editor: part, row, clock, finding, caption.
import { useId, useState } from "react";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { COMPONENTS, ROWS } from "@/lib/classification/bearing-parts";
import { oClockToDeg } from "@/lib/photos/clock";
import type { FindingOption, TagValues } from "./tag-values";

const HOURS = [12, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11];
const OTHER = "other";

function ClockInput({ id, value, onChange }: { id: string; value: string; onChange: (v: string) => void }) {
  const onHour = value === "" || HOURS.some((h) => String(oClockToDeg(h)) === value);
  const [custom, setCustom] = useState(!onHour);
  return (
    <div className="flex gap-2">
      <Select
        id={id}
        value={custom ? OTHER : value}
        onChange={(e) => {
          if (e.target.value === OTHER) return setCustom(true);
          setCustom(false);
          onChange(e.target.value);
        }}
      >
        <option value="">Not set</option>
        {HOURS.map((h) => (
          <option key={h} value={String(oClockToDeg(h))}>
            {h} o&apos;clock ({oClockToDeg(h)}°)
          </option>
        ))}
        <option value={OTHER}>Exact angle…</option>
      </Select>
      {custom ? (
        <Input
          aria-label="Angle in degrees"
          inputMode="numeric"
          className="w-24 shrink-0"
          placeholder="0–359"
          value={value}
          onChange={(e) => onChange(e.target.value.replace(/[^\d]/g, "").slice(0, 3))}
        />
      ) : null}
    </div>
  );
}

type Props = {
  value: TagValues;
  onChange: (next: TagValues) => void;
  findings: FindingOption[];
  /** Hide the caption (the upload defaults apply to many photos at once). */
  withCaption?: boolean;
  layout?: "grid" | "stack";
};

export function TagFields({ value, onChange, findings, withCaption = true, layout = "grid" }: Props) {
  const id = useId();
  const set = (patch: Partial<TagValues>) => onChange({ ...value, ...patch });
  const part = COMPONENTS.find((c) => c.code === value.component);
  const fixedRow = part && "fixedRow" in part ? part.fixedRow : undefined;
  return (
    <div className={layout === "grid" ? "grid gap-3 sm:grid-cols-2" : "flex flex-col gap-3"}>
      <Field label="Part" htmlFor={`${id}-part`}>
        <Select id={`${id}-part`} value={value.component} onChange={(e) => set({ component: e.target.value, row: "" })}>
          <option value="">Not set</option>
          {COMPONENTS.map((c) => (
            <option key={c.code} value={c.code}>
              {c.label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Row" htmlFor={`${id}-row`} hint={fixedRow ? `This part is on the ${fixedRow} row.` : undefined}>
        <Select id={`${id}-row`} value={fixedRow ?? value.row} disabled={Boolean(fixedRow)} onChange={(e) => set({ row: e.target.value })}>
          <option value="">Not set</option>
          {ROWS.map((r) => (
            <option key={r.code} value={r.code}>
              {r.label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Clock position" htmlFor={`${id}-clock`} hint="12 o'clock = 0°, clockwise seen from the outboard end.">
        <ClockInput id={`${id}-clock`} value={value.clockDeg} onChange={(clockDeg) => set({ clockDeg })} />
      </Field>
      <Field
        label="Finding it shows"
        htmlFor={`${id}-finding`}
        hint={findings.length === 0 ? "No findings recorded on this case yet." : undefined}
      >
        <Select
          id={`${id}-finding`}
          value={value.findingId}
          onChange={(e) => set({ findingId: e.target.value })}
          disabled={findings.length === 0}
        >
          <option value="">None</option>
          {findings.map((f) => (
            <option key={f.id} value={f.id}>
              {f.label}
            </option>
          ))}
        </Select>
      </Field>
      {withCaption ? (
        <div className={layout === "grid" ? "sm:col-span-2" : ""}>
          <Field label="Caption" htmlFor={`${id}-caption`}>
            <Textarea
              id={`${id}-caption`}
              className="min-h-16"
              maxLength={500}
              value={value.caption}
              placeholder="What the photo shows, e.g. spall 12 × 8 mm in the load zone"
              onChange={(e) => set({ caption: e.target.value })}
            />
          </Field>
        </div>
      ) : null}
    </div>
  );
}
