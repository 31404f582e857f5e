"use client";
// Everything that narrows the list. On a phone the less used filters fold behind one button.
import { useState } from "react";
import type { CaseListOptions } from "@/lib/cases/types";
import { BEARING_CLASS_OPTIONS } from "./labels";
import { activeFilterCount, type CaseFilters } from "@/lib/cases/list-query";
import { DateRange } from "./date-range";
import { Icon } from "./icons";
import { MultiSelect } from "./multi-select";
import { SearchBox } from "./search-box";
import { StageToggles } from "./stage-toggles";

type Props = {
  filters: CaseFilters;
  options: CaseListOptions;
  onChange: (patch: Partial<CaseFilters>, opts?: { replace?: boolean }) => void;
  onClear: () => void;
};

export function FilterBar({ filters, options, onChange, onClear }: Props) {
  const [open, setOpen] = useState(false);
  const count = activeFilterCount(filters);
  const folded = activeFilterCount({ ...filters, q: undefined, status: undefined });

  return (
    <div className="flex flex-col gap-3" data-testid="case-filters">
      <div className="flex flex-col gap-3 lg:flex-row lg:items-center">
        <div className="flex gap-2">
          <SearchBox value={filters.q ?? ""} onChange={(q) => onChange({ q: q || undefined }, { replace: true })} />
          <button
            type="button"
            aria-expanded={open}
            onClick={() => setOpen((o) => !o)}
            className="inline-flex h-11 shrink-0 items-center gap-1.5 rounded-lg border border-line-strong bg-surface px-3 text-sm font-medium text-ink-2 sm:hidden"
          >
            <Icon name="filter" />
            Filters
            {folded ? (
              <span className="grid h-5 min-w-5 place-items-center rounded-full bg-accent px-1 text-xs text-accent-ink">{folded}</span>
            ) : null}
          </button>
        </div>
        <StageToggles selected={filters.status ?? []} onChange={(status) => onChange({ status })} />
      </div>
      <div className={`${open ? "flex" : "hidden"} flex-wrap items-center gap-2 sm:flex`}>
        <MultiSelect
          label="Trigger"
          testId="filter-trigger"
          options={options.triggers}
          selected={filters.trigger ?? []}
          onChange={(trigger) => onChange({ trigger })}
        />
        <MultiSelect
          label="Cause"
          testId="filter-cause"
          options={options.causes}
          selected={filters.cause ?? []}
          onChange={(cause) => onChange({ cause })}
        />
        <MultiSelect
          label="Class"
          testId="filter-class"
          options={BEARING_CLASS_OPTIONS}
          selected={filters.class ?? []}
          onChange={(cls) => onChange({ class: cls })}
        />
        <MultiSelect
          label="Site"
          testId="filter-site"
          options={options.sites}
          selected={filters.site ?? []}
          onChange={(site) => onChange({ site })}
        />
        <DateRange value={{ from: filters.from, to: filters.to }} onChange={(r) => onChange(r)} />
        {count ? (
          <button
            type="button"
            onClick={onClear}
            className="inline-flex h-11 items-center gap-1 rounded-lg px-2.5 text-sm font-medium text-accent hover:bg-accent-soft sm:h-9"
          >
            <Icon name="x" className="h-3.5 w-3.5" />
            Clear all
          </button>
        ) : null}
      </div>
    </div>
  );
}
