// A chart's numbers as an accessible table that scrolls sideways on a phone.
import type { DataTable } from "@/lib/tallies/tables";

export function DataTableView({ table, caption }: { table: DataTable; caption: string }) {
  if (table.rows.length === 0) return <p className="text-sm text-muted">No rows.</p>;
  const numeric = table.columns.map((_, j) => table.rows.every((r) => r[j] === null || r[j] === "" || typeof r[j] === "number"));
  return (
    <div className="max-h-[26rem] overflow-auto rounded-lg border border-line">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="sticky top-0 bg-surface-2">
          <tr>
            {table.columns.map((c, j) => (
              <th
                key={j}
                scope="col"
                className={`whitespace-nowrap border-b border-line px-3 py-2 text-xs font-semibold text-muted ${numeric[j] ? "text-right" : "text-left"}`}
              >
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row, i) => (
            <tr key={i} className="odd:bg-surface even:bg-surface-2/60">
              {row.map((cell, j) => (
                <td
                  key={j}
                  className={`border-b border-line px-3 py-1.5 ${numeric[j] ? "text-right tabular" : "text-left"} ${j === 0 ? "font-medium text-ink" : "text-ink-2"}`}
                >
                  {cell === null || cell === undefined ? "–" : typeof cell === "number" ? cell.toLocaleString("en-US") : String(cell)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
