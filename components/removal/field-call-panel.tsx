"use client";
// The computed field call, shown as the form is filled in, with every reason in plain words.
import { useState } from "react";
import type { FieldCall } from "@/lib/field";

const LOOK = {
  remove: { label: "Remove from service", cls: "bg-danger text-white" },
  keep: { label: "Keep in service", cls: "bg-ok text-white" },
  undecided: { label: "Not decided yet", cls: "bg-warn-soft text-ink border border-warn/40" },
} as const;

export function FieldCallPanel({ call, sticky = true }: { call: FieldCall; sticky?: boolean }) {
  const [open, setOpen] = useState(false);
  const look = LOOK[call.call];
  const shown = call.reasons.filter((r) => r.level !== "info" || open);
  return (
    <section
      aria-label="Field call"
      data-testid="field-call"
      className={`${sticky ? "sticky bottom-0 z-10 -mx-4 border-t border-line bg-surface/95 px-4 py-3 backdrop-blur sm:static sm:mx-0 sm:rounded-xl sm:border" : "rounded-xl border border-line bg-surface p-4"}`}
    >
      <div className="flex items-center justify-between gap-3">
        <div className="flex items-center gap-3">
          <span className="text-xs font-semibold uppercase tracking-widest text-muted">Field call</span>
          <span className={`rounded-md px-2.5 py-1 text-sm font-bold ${look.cls}`} data-call={call.call}>
            {look.label}
          </span>
        </div>
        <button
          type="button"
          className="-mr-2 inline-flex min-h-11 min-w-11 items-center justify-center px-2 text-sm text-accent"
          onClick={() => setOpen(!open)}
          aria-expanded={open}
        >
          {open ? "Hide reasons" : `Reasons (${call.reasons.length})`}
        </button>
      </div>
      {open ? (
        <ul className="mt-2 max-h-64 list-disc overflow-auto pl-5 text-sm text-ink-2">
          {shown.map((r, i) => (
            <li key={i} className={r.level === "remove" ? "text-danger" : ""}>
              {r.text}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
