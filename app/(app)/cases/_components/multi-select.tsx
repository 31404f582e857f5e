"use client";
// A filter that takes several values: a chip naming what is chosen, a checklist behind it.
import { useState } from "react";
import type { FilterOption } from "@/lib/cases/types";
import { Icon } from "./icons";
import { Popover } from "./popover";

type Props = { label: string; options: FilterOption[]; selected: string[]; onChange: (codes: string[]) => void; testId?: string };

function summary(label: string, options: FilterOption[], selected: string[]) {
  if (!selected.length) return label;
  if (selected.length === 1) return `${label}: ${options.find((o) => o.code === selected[0])?.label ?? selected[0]}`;
  return `${label} · ${selected.length}`;
}

export function MultiSelect({ label, options, selected, onChange, testId }: Props) {
  const [needle, setNeedle] = useState("");
  const shown = needle ? options.filter((o) => o.label.toLowerCase().includes(needle.toLowerCase())) : options;
  const toggle = (code: string) => onChange(selected.includes(code) ? selected.filter((c) => c !== code) : [...selected, code]);

  return (
    <Popover
      title={`Filter by ${label.toLowerCase()}`}
      active={selected.length > 0}
      testId={testId}
      label={<span className="max-w-[14rem] truncate">{summary(label, options, selected)}</span>}
    >
      {() => (
        <div>
          {options.length > 8 ? (
            <div className="relative p-1">
              <Icon name="search" className="pointer-events-none absolute left-3.5 top-1/2 h-4 w-4 -translate-y-1/2 text-muted" />
              <input
                value={needle}
                onChange={(e) => setNeedle(e.target.value)}
                placeholder={`Find a ${label.toLowerCase()}`}
                aria-label={`Find a ${label.toLowerCase()}`}
                className="h-10 w-full rounded-lg border border-line bg-surface-2 pl-9 pr-3 text-sm text-ink placeholder:text-muted focus:outline-2 focus:outline-accent sm:h-9"
              />
            </div>
          ) : null}
          <ul className="max-h-72 overflow-y-auto py-1" role="group" aria-label={label}>
            {shown.map((o) => {
              const on = selected.includes(o.code);
              return (
                <li key={o.code}>
                  <label className="flex min-h-11 cursor-pointer items-center gap-2.5 rounded-lg px-2.5 text-sm text-ink hover:bg-surface-2 sm:min-h-9">
                    <input type="checkbox" checked={on} onChange={() => toggle(o.code)} className="h-4 w-4 accent-[var(--accent)]" />
                    <span className="min-w-0 flex-1 truncate">{o.label}</span>
                    {o.retired ? <span className="text-[11px] uppercase tracking-wide text-muted">retired</span> : null}
                  </label>
                </li>
              );
            })}
            {!shown.length ? <li className="px-2.5 py-3 text-sm text-muted">Nothing matches “{needle}”.</li> : null}
          </ul>
          {selected.length ? (
            <div className="border-t border-line p-1">
              <button
                type="button"
                onClick={() => onChange([])}
                className="h-9 w-full rounded-lg text-sm font-medium text-ink-2 hover:bg-surface-2"
              >
                Clear {label.toLowerCase()}
              </button>
            </div>
          ) : null}
        </div>
      )}
    </Popover>
  );
}
