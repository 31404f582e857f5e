"use client";
// The filters every tally shares. They live in the URL, so a filtered view can be bookmarked or sent.
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useTransition } from "react";
import { Select } from "@/components/ui/field";
import { addMonths, filtersToQuery, type TallyFilters } from "@/lib/tallies/filter-query";

type Option = { value: string; label: string };
type Props = {
  filters: TallyFilters;
  sites: Option[];
  classes: Option[];
  triggers: Option[];
  /** Set for inspectors: tallies count their own shop only. */
  siteLimit: string | null;
  currentMonth: string;
};

const PRESETS = [
  { id: "all", label: "All time", months: 0 },
  { id: "12", label: "Last 12 months", months: 12 },
  { id: "24", label: "Last 24 months", months: 24 },
  { id: "36", label: "Last 36 months", months: 36 },
] as const;

function presetOf(f: TallyFilters, current: string): string {
  if (!f.from && !f.to) return "all";
  const hit = PRESETS.find((p) => p.months && f.to === current && f.from === addMonths(current, -(p.months - 1)));
  return hit?.id ?? "custom";
}

const label = "mb-1 block text-xs font-medium text-muted";

/** A value from a shared link that the list does not hold (an admin-added code, a free "other" class) still shows. */
const withCurrent = (options: Option[], value: string | undefined) =>
  value && !options.some((o) => o.value === value) ? [...options, { value, label: value }] : options;

export function FilterBar({ filters, sites, classes, triggers, siteLimit, currentMonth }: Props) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const [pending, startTransition] = useTransition();
  const preset = presetOf(filters, currentMonth);

  function go(change: Partial<TallyFilters>) {
    const next = { ...filters, ...change };
    const q = new URLSearchParams(filtersToQuery(next));
    // keep page-specific settings (life measure, chosen cause, missed-call window)
    for (const key of ["measure", "cause", "miss"]) {
      const v = params.get(key);
      if (v) q.set(key, v);
    }
    startTransition(() => router.push(`${pathname}${q.size ? `?${q}` : ""}`, { scroll: false }));
  }

  function choosePreset(id: string) {
    if (id === "all") return go({ from: undefined, to: undefined });
    if (id === "custom") return go({ from: filters.from ?? addMonths(currentMonth, -11), to: filters.to ?? currentMonth });
    const months = PRESETS.find((p) => p.id === id)!.months;
    go({ from: addMonths(currentMonth, -(months - 1)), to: currentMonth });
  }

  const active = [filters.from || filters.to, filters.site, filters.class, filters.trigger].filter(Boolean).length;
  return (
    <form className="mb-5 rounded-xl border border-line bg-surface p-3 sm:p-4" aria-label="Filters" onSubmit={(e) => e.preventDefault()}>
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4 xl:grid-cols-[1.2fr_1fr_1fr_1.2fr_auto]">
        <div className="col-span-2 md:col-span-1">
          <label className={label} htmlFor="f-period">
            Period
          </label>
          <Select id="f-period" value={preset} onChange={(e) => choosePreset(e.target.value)}>
            {PRESETS.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label}
              </option>
            ))}
            <option value="custom">Chosen months…</option>
          </Select>
          {preset === "custom" ? (
            <div className="mt-2 flex items-center gap-2">
              <input
                aria-label="From month"
                type="month"
                className="h-11 lg:h-10 min-w-0 flex-1 rounded-lg border border-line-strong bg-surface px-2 text-sm text-ink"
                value={filters.from ?? ""}
                max={filters.to}
                onChange={(e) => e.target.value && go({ from: e.target.value })}
              />
              <span className="text-muted">–</span>
              <input
                aria-label="To month"
                type="month"
                className="h-11 lg:h-10 min-w-0 flex-1 rounded-lg border border-line-strong bg-surface px-2 text-sm text-ink"
                value={filters.to ?? ""}
                min={filters.from}
                onChange={(e) => e.target.value && go({ to: e.target.value })}
              />
            </div>
          ) : null}
        </div>
        <div>
          <label className={label} htmlFor="f-site">
            Removal site
          </label>
          {siteLimit ? (
            <p
              id="f-site"
              className="flex h-11 items-center rounded-lg border border-line bg-surface-2 px-3 text-sm text-ink-2 sm:h-10"
              title="Inspectors' tallies count their own shop only"
            >
              {siteLimit}
            </p>
          ) : (
            <Select id="f-site" value={filters.site ?? ""} onChange={(e) => go({ site: e.target.value || undefined })}>
              <option value="">All sites</option>
              {withCurrent(sites, filters.site).map((s) => (
                <option key={s.value} value={s.value}>
                  {s.label}
                </option>
              ))}
            </Select>
          )}
        </div>
        <div>
          <label className={label} htmlFor="f-class">
            Bearing class
          </label>
          <Select id="f-class" value={filters.class ?? ""} onChange={(e) => go({ class: e.target.value || undefined })}>
            <option value="">All classes</option>
            {withCurrent(classes, filters.class).map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </Select>
        </div>
        <div className="col-span-2 md:col-span-1">
          <label className={label} htmlFor="f-trigger">
            Trigger
          </label>
          <Select id="f-trigger" value={filters.trigger ?? ""} onChange={(e) => go({ trigger: e.target.value || undefined })}>
            <option value="">All triggers</option>
            {withCurrent(triggers, filters.trigger).map((t) => (
              <option key={t.value} value={t.value}>
                {t.label}
              </option>
            ))}
          </Select>
        </div>
        <div className="col-span-2 flex items-end justify-between gap-3 md:col-span-4 xl:col-span-1 xl:justify-end">
          <p aria-live="polite" className="text-xs text-muted">
            {pending ? "Updating…" : active ? `${active} filter${active === 1 ? "" : "s"} on` : "No filters"}
          </p>
          {active ? (
            <button
              type="button"
              className="h-11 rounded-lg px-3 text-sm font-medium text-accent lg:h-10 hover:bg-accent-soft"
              onClick={() => go({ from: undefined, to: undefined, site: undefined, class: undefined, trigger: undefined })}
            >
              Clear
            </button>
          ) : null}
        </div>
      </div>
    </form>
  );
}
