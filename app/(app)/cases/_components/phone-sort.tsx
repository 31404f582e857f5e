"use client";
// On a phone there are no headers to click: a column list and a direction button sort instead.
import { CASE_COLUMNS, type CaseColumnId } from "@/lib/cases/list-columns";
import type { CaseSort } from "@/lib/cases/list-query";
import { Icon } from "./icons";

export function PhoneSort({ sort, onChange }: { sort: CaseSort; onChange: (s: CaseSort) => void }) {
  const info = CASE_COLUMNS.find((c) => c.id === sort.field)!;
  return (
    <div className="flex items-center gap-1.5 md:hidden">
      <label className="sr-only" htmlFor="phone-sort">
        Sort by
      </label>
      <select
        id="phone-sort"
        value={sort.field}
        onChange={(e) => {
          const field = e.target.value as CaseColumnId;
          onChange({ field, dir: CASE_COLUMNS.find((c) => c.id === field)!.firstDir });
        }}
        className="h-11 max-w-[11rem] rounded-lg border border-line-strong bg-surface px-2 text-sm text-ink"
      >
        {CASE_COLUMNS.map((c) => (
          <option key={c.id} value={c.id}>
            Sort: {c.label}
          </option>
        ))}
      </select>
      <button
        type="button"
        onClick={() => onChange({ ...sort, dir: sort.dir === "asc" ? "desc" : "asc" })}
        aria-label={`${info.label}, ${sort.dir === "asc" ? "ascending" : "descending"}; change direction`}
        className="grid h-11 w-11 place-items-center rounded-lg border border-line-strong bg-surface text-ink-2"
      >
        <Icon name={sort.dir === "asc" ? "up" : "down"} />
      </button>
    </div>
  );
}
