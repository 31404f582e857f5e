"use client";
// Pick the table's columns; the choice stays in this browser.
import type { Table } from "@tanstack/react-table";
import type { CaseListRow } from "@/lib/cases/list-columns";
import { Icon } from "./icons";
import { Popover } from "./popover";

export function ColumnChooser({ table, onReset }: { table: Table<CaseListRow>; onReset: () => void }) {
  const hideable = table.getAllLeafColumns().filter((c) => c.getCanHide());
  const shown = hideable.filter((c) => c.getIsVisible()).length;
  return (
    <Popover
      title="Choose columns"
      align="end"
      testId="column-chooser"
      label={
        <>
          <Icon name="columns" className="h-4 w-4 text-muted" />
          Columns <span className="text-muted tabular">{shown + 1}</span>
        </>
      }
    >
      {() => (
        <div>
          <p className="px-2.5 pb-1 pt-1.5 text-xs text-muted">Case number always shows.</p>
          <ul className="max-h-80 overflow-y-auto py-1">
            {hideable.map((c) => (
              <li key={c.id}>
                <label className="flex min-h-9 cursor-pointer items-center gap-2.5 rounded-lg px-2.5 text-sm text-ink hover:bg-surface-2">
                  <input
                    type="checkbox"
                    checked={c.getIsVisible()}
                    onChange={c.getToggleVisibilityHandler()}
                    className="h-4 w-4 accent-[var(--accent)]"
                  />
                  {typeof c.columnDef.header === "string" ? c.columnDef.header : c.id}
                </label>
              </li>
            ))}
          </ul>
          <div className="border-t border-line p-1">
            <button type="button" onClick={onReset} className="h-9 w-full rounded-lg text-sm font-medium text-ink-2 hover:bg-surface-2">
              Back to the usual columns
            </button>
          </div>
        </div>
      )}
    </Popover>
  );
}
