"use client";
// Recurring causes: the same cause at one site, on one car or in one bearing lot within the
// chosen window, newest first, each with links to its cases.
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useTransition } from "react";
import type { ClusterTally } from "@/lib/tallies/types";
import { formatDay } from "@/lib/dates";

const KINDS = [
  { id: "site", label: "Same site" },
  { id: "car", label: "Same car" },
  { id: "lot", label: "Same lot" },
] as const;
const WINDOWS = [7, 14, 30, 60, 90, 180];

const fmt = (d: string) => formatDay(d);

export function ClusterControls({ tally }: { tally: ClusterTally }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const [pending, start] = useTransition();
  function set(key: "cluster" | "window", value: string) {
    const q = new URLSearchParams(params.toString());
    const isDefault = (key === "cluster" && value === "site") || (key === "window" && value === "30");
    if (isDefault) q.delete(key);
    else q.set(key, value);
    start(() => router.push(`${pathname}${q.size ? `?${q}` : ""}#recurrence`, { scroll: false }));
  }
  return (
    <>
      <div role="group" aria-label="Group by" className="inline-flex rounded-lg bg-surface-2 p-0.5 ring-1 ring-line">
        {KINDS.map((k) => (
          <button
            key={k.id}
            type="button"
            aria-pressed={tally.keyKind === k.id}
            onClick={() => set("cluster", k.id)}
            className={`h-11 rounded-md px-3 text-sm font-medium lg:h-8 ${tally.keyKind === k.id ? "bg-surface text-ink shadow-sm" : "text-muted hover:text-ink"}`}
          >
            {k.label}
          </button>
        ))}
      </div>
      <label className="flex items-center gap-2 text-sm text-ink-2">
        within
        <select
          aria-label="Window in days"
          value={tally.windowDays}
          onChange={(e) => set("window", e.target.value)}
          className="h-11 rounded-lg border border-line-strong bg-surface px-2 text-sm text-ink lg:h-9"
        >
          {[...new Set([...WINDOWS, tally.windowDays])]
            .sort((a, b) => a - b)
            .map((w) => (
              <option key={w} value={w}>
                {w} days
              </option>
            ))}
        </select>
      </label>
      <span className="text-xs text-muted">{pending ? "Updating…" : `at least ${tally.minSize} cases`}</span>
    </>
  );
}

export function ClustersList({ tally }: { tally: ClusterTally }) {
  if (tally.items.length === 0) {
    return (
      <p className="py-6 text-center text-sm text-muted">
        No cause came back {tally.keyKind === "site" ? "at one site" : tally.keyKind === "car" ? "on one car" : "in one lot"}{" "}
        {tally.minSize} or more times within {tally.windowDays} days.
      </p>
    );
  }
  return (
    <div>
      <ol className="max-h-[34rem] divide-y divide-line overflow-y-auto pr-1" data-clusters>
        {tally.items.map((c) => (
          <li key={`${c.key}-${c.cause}-${c.firstDate}`} className="py-3 first:pt-0">
            <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
              <p className="font-medium text-ink">
                {c.causeLabel} <span className="font-normal text-muted">·</span> {c.keyLabel}
              </p>
              <p className="text-sm text-ink-2 tabular">
                <span className="font-semibold text-ink">{c.size} cases</span> · {fmt(c.firstDate)} – {fmt(c.lastDate)}
              </p>
            </div>
            <ul className="mt-1.5 flex flex-wrap gap-1.5">
              {c.caseNumbers.slice(0, 12).map((n) => (
                <li key={n}>
                  <Link
                    href={`/cases/${n}`}
                    className="inline-flex h-11 items-center rounded-md bg-surface-2 px-2.5 text-xs lg:h-7 lg:px-2 font-medium text-ink-2 ring-1 ring-line tabular hover:text-accent hover:ring-accent"
                  >
                    {n}
                  </Link>
                </li>
              ))}
              {c.size > 12 ? <li className="inline-flex h-11 items-center px-1 lg:h-7 text-xs text-muted">newest 12 of {c.size}</li> : null}
            </ul>
          </li>
        ))}
      </ol>
      {tally.total > tally.items.length ? (
        <p className="mt-2 text-xs text-muted">
          Showing the {tally.items.length} most recent of {tally.total} clusters; narrow the filters to see others.
        </p>
      ) : null}
    </div>
  );
}
