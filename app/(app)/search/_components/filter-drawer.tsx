"use client";
// On wide screens the filters sit beside the results; on phones they open as a drawer
// from a "Filters" button, and close again when a filter is picked (the URL changes).
import { useEffect, useState, type ReactNode } from "react";
import { useSearchParams } from "next/navigation";

export function FilterDrawer({ active, total, children }: { active: number; total: number; children: ReactNode }) {
  const [open, setOpen] = useState(false);
  const search = useSearchParams().toString();
  useEffect(() => setOpen(false), [search]);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && setOpen(false);
    document.addEventListener("keydown", onKey);
    document.body.style.overflow = "hidden";
    return () => {
      document.removeEventListener("keydown", onKey);
      document.body.style.overflow = "";
    };
  }, [open]);

  return (
    <>
      <button
        type="button"
        onClick={() => setOpen(true)}
        data-testid="open-filters"
        className="inline-flex h-11 w-fit items-center gap-2 rounded-lg border border-line-strong bg-surface px-4 text-sm font-medium text-ink-2 lg:hidden"
      >
        <svg viewBox="0 0 24 24" className="h-4 w-4" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" aria-hidden>
          <path d="M4 6h16M7 12h10M10 18h4" />
        </svg>
        Filters
        {active ? <span className="rounded-full bg-accent px-1.5 text-xs font-semibold text-accent-ink">{active}</span> : null}
      </button>
      <aside className="hidden lg:block" aria-label="Filters">
        <div className="rounded-xl border border-line bg-surface px-2 py-1">{children}</div>
      </aside>
      {open ? (
        <div className="fixed inset-0 z-40 lg:hidden" role="dialog" aria-modal="true" aria-label="Filters">
          <button type="button" aria-label="Close filters" className="absolute inset-0 bg-slate-950/50" onClick={() => setOpen(false)} />
          <div className="absolute inset-y-0 right-0 flex w-[min(22rem,92vw)] flex-col bg-surface shadow-2xl">
            <div className="flex items-center justify-between border-b border-line px-4 py-3">
              <h2 className="text-base font-semibold text-ink">Filters</h2>
              <button
                type="button"
                onClick={() => setOpen(false)}
                className="grid h-10 w-10 place-items-center rounded-lg text-muted hover:bg-surface-2"
                aria-label="Close"
              >
                <svg
                  viewBox="0 0 24 24"
                  className="h-5 w-5"
                  fill="none"
                  stroke="currentColor"
                  strokeWidth="1.8"
                  strokeLinecap="round"
                  aria-hidden
                >
                  <path d="M6 6l12 12M18 6L6 18" />
                </svg>
              </button>
            </div>
            <div className="flex-1 overflow-y-auto px-2">{children}</div>
            <div className="border-t border-line p-3">
              <button
                type="button"
                onClick={() => setOpen(false)}
                className="h-11 w-full rounded-lg bg-accent text-sm font-semibold text-accent-ink"
              >
                Show {total.toLocaleString("en-US")} {total === 1 ? "case" : "cases"}
              </button>
            </div>
          </div>
        </div>
      ) : null}
    </>
  );
}
