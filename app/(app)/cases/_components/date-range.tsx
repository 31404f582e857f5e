"use client";
// Removal date range: two date boxes and a few common spans. A range that runs backwards is not applied.
import { useEffect, useState } from "react";
import { formatDay } from "@/lib/cases/list-columns";
import { Icon } from "./icons";
import { Popover } from "./popover";

type Range = { from?: string; to?: string };

const iso = (d: Date) => d.toISOString().slice(0, 10);
function daysAgo(n: number) {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() - n);
  return iso(d);
}
const PRESETS: { label: string; range: () => Range }[] = [
  { label: "Last 30 days", range: () => ({ from: daysAgo(30), to: undefined }) },
  { label: "Last 90 days", range: () => ({ from: daysAgo(90), to: undefined }) },
  { label: "Last 12 months", range: () => ({ from: daysAgo(365), to: undefined }) },
  { label: "This year", range: () => ({ from: `${new Date().getUTCFullYear()}-01-01`, to: undefined }) },
];

function summary({ from, to }: Range) {
  if (from && to) return from === to ? `Removed ${formatDay(from)}` : `Removed ${formatDay(from)} – ${formatDay(to)}`;
  if (from) return `Removed since ${formatDay(from)}`;
  if (to) return `Removed until ${formatDay(to)}`;
  return "Removal date";
}

export function DateRange({ value, onChange }: { value: Range; onChange: (r: Range) => void }) {
  const [draft, setDraft] = useState<Range>(value);
  useEffect(() => setDraft({ from: value.from, to: value.to }), [value.from, value.to]);
  const backwards = Boolean(draft.from && draft.to && draft.from > draft.to);

  const set = (patch: Range) => {
    const next = { ...draft, ...patch };
    setDraft(next);
    if (!(next.from && next.to && next.from > next.to)) onChange({ from: next.from || undefined, to: next.to || undefined });
  };
  const box =
    "h-11 w-full rounded-lg border border-line-strong bg-surface px-2.5 text-sm text-ink focus:outline-2 focus:outline-accent aria-[invalid=true]:border-danger sm:h-9";

  return (
    <Popover
      title="Filter by removal date"
      active={Boolean(value.from || value.to)}
      testId="filter-dates"
      label={
        <>
          <Icon name="calendar" className="h-4 w-4 text-muted" />
          {summary(value)}
        </>
      }
    >
      {() => (
        <div className="p-2">
          <div className="grid grid-cols-2 gap-2">
            <label className="text-xs font-medium text-ink-2">
              From
              <input
                type="date"
                className={`${box} mt-1`}
                value={draft.from ?? ""}
                max={draft.to}
                onChange={(e) => set({ from: e.target.value })}
                aria-invalid={backwards}
                name="from"
              />
            </label>
            <label className="text-xs font-medium text-ink-2">
              To
              <input
                type="date"
                className={`${box} mt-1`}
                value={draft.to ?? ""}
                min={draft.from}
                onChange={(e) => set({ to: e.target.value })}
                aria-invalid={backwards}
                name="to"
              />
            </label>
          </div>
          {backwards ? (
            <p role="alert" className="mt-2 text-xs text-danger">
              From is after To; the range is not applied.
            </p>
          ) : null}
          <div className="mt-3 flex flex-wrap gap-1.5">
            {PRESETS.map((p) => (
              <button
                key={p.label}
                type="button"
                onClick={() => set({ to: undefined, ...p.range() })}
                className="h-9 rounded-full border border-line px-3 text-xs font-medium text-ink-2 hover:bg-surface-2 sm:h-7"
              >
                {p.label}
              </button>
            ))}
          </div>
          {value.from || value.to ? (
            <button
              type="button"
              onClick={() => set({ from: undefined, to: undefined })}
              className="mt-3 h-9 w-full rounded-lg border-t border-line text-sm font-medium text-ink-2 hover:bg-surface-2"
            >
              Any date
            </button>
          ) : null}
        </div>
      )}
    </Popover>
  );
}
