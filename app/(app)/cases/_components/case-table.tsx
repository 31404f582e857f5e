"use client";
// The desk view: a sortable table. Sorting is the server's; a header click only changes the URL.
import { useRouter } from "next/navigation";
import { flexRender, type Table } from "@tanstack/react-table";
import type { CaseColumnId, CaseListRow } from "@/lib/cases/list-columns";
import type { CaseSort } from "@/lib/cases/list-query";
import { NUMERIC } from "./case-columns";
import { Icon } from "./icons";

type Props = { table: Table<CaseListRow>; sort: CaseSort; onSort: (field: CaseColumnId) => void; busy: boolean };

const ariaSort = (id: string, sort: CaseSort) => (sort.field !== id ? "none" : sort.dir === "asc" ? "ascending" : "descending");

export function CaseTable({ table, sort, onSort, busy }: Props) {
  const router = useRouter();
  return (
    <div className={`overflow-x-auto transition-opacity ${busy ? "opacity-60" : ""}`}>
      <table className="w-full border-separate border-spacing-0 text-left text-sm" data-testid="case-table" aria-busy={busy}>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const id = header.column.id as CaseColumnId;
                const active = sort.field === id;
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={ariaSort(id, sort)}
                    className={`sticky top-0 z-10 whitespace-nowrap border-b border-line bg-surface-2 px-2 py-0 text-[11px] font-semibold uppercase tracking-wide text-muted first:pl-5 last:pr-5 ${NUMERIC.has(id) ? "text-right" : ""}`}
                  >
                    <button
                      type="button"
                      onClick={() => onSort(id)}
                      className={`group inline-flex h-10 items-center gap-1 uppercase tracking-wide hover:text-ink ${active ? "text-ink" : ""} ${NUMERIC.has(id) ? "flex-row-reverse" : ""}`}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                      <Icon
                        name={active ? (sort.dir === "asc" ? "up" : "down") : "updown"}
                        className={`h-3.5 w-3.5 ${active ? "text-accent" : "opacity-0 transition group-hover:opacity-60 group-focus-visible:opacity-60"}`}
                      />
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr
              key={row.id}
              data-testid="case-row"
              onClick={(e) => {
                // The case number is the real link; the rest of the row is a convenience for the mouse.
                if ((e.target as HTMLElement).closest("a,button") || window.getSelection()?.toString()) return;
                router.push(`/cases/${row.original.number}`);
              }}
              className="cursor-pointer hover:bg-surface-2"
            >
              {row.getVisibleCells().map((cell) => (
                <td
                  key={cell.id}
                  className={`whitespace-nowrap border-b border-line px-2 py-2.5 align-middle text-[13px] text-ink-2 first:pl-5 last:pr-5 ${NUMERIC.has(cell.column.id) ? "text-right" : ""}`}
                >
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
