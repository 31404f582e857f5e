"use client";
// A chart in a card: Chart/Table toggle, CSV and PNG downloads. The chart comes first; its numbers
// are one click away.
import { useId, useRef, useState, type ReactNode } from "react";
import { chartCsv, downloadName } from "@/lib/tallies/csv";
import type { DataTable } from "@/lib/tallies/tables";
import { downloadBlob, svgToPngBlob, type ImageLegend } from "./export-image";
import { DataTableView } from "./data-table-view";

type Props = {
  title: string;
  subtitle?: ReactNode;
  /** Plain subtitle for the image download. */
  imageSubtitle?: string;
  table: DataTable;
  legend?: ImageLegend;
  controls?: ReactNode;
  footer?: ReactNode;
  empty?: string | null;
  children: ReactNode;
  /** Custom table view (e.g. highlighted cells); defaults to the plain table. */
  tableView?: ReactNode;
  id?: string;
  /** Lists without a drawing offer no image download. */
  noImage?: boolean;
  /** Word on the first toggle; "List" for cards that show a list rather than a drawing. */
  chartLabel?: string;
};

const toggleClass = (on: boolean) =>
  `h-11 rounded-md px-3 text-sm lg:h-8 font-medium transition ${on ? "bg-surface text-ink shadow-sm" : "text-muted hover:text-ink"}`;

export function ChartCard({
  title,
  subtitle,
  imageSubtitle,
  table,
  legend,
  controls,
  footer,
  empty,
  children,
  tableView,
  id,
  noImage,
  chartLabel = "Chart",
}: Props) {
  const [view, setView] = useState<"chart" | "table">("chart");
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const chartRef = useRef<HTMLDivElement>(null);
  const headingId = useId();

  function downloadCsv() {
    // A byte-order mark lets spreadsheet programs read the file as UTF-8; the first line says
    // which filters (from the page address) made these numbers.
    const blob = new Blob(["\uFEFF", chartCsv(window.location.search, table.columns, table.rows)], { type: "text/csv;charset=utf-8" });
    downloadBlob(blob, downloadName(title, "csv"));
  }

  async function downloadPng() {
    setProblem(null);
    const wasTable = view === "table";
    if (wasTable) setView("chart");
    setBusy(true);
    try {
      await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
      const svg = chartRef.current?.querySelector<SVGSVGElement>("svg[data-export], svg.recharts-surface");
      if (!svg) throw new Error("Nothing to draw yet.");
      downloadBlob(await svgToPngBlob(svg, { title, subtitle: imageSubtitle, legend }), downloadName(title, "png"));
    } catch (err) {
      setProblem(err instanceof Error ? err.message : "The image could not be made.");
    } finally {
      setBusy(false);
      if (wasTable) setView("table");
    }
  }

  return (
    <section
      id={id}
      aria-labelledby={headingId}
      data-chart-card
      className="flex min-w-0 flex-col rounded-xl border border-line bg-surface shadow-[0_1px_2px_rgba(15,23,42,0.04)]"
    >
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-line px-4 py-3 sm:px-5">
        <div className="min-w-0">
          <h2 id={headingId} className="text-[15px] font-semibold text-ink">
            {title}
          </h2>
          {subtitle ? <p className="mt-0.5 text-xs text-muted">{subtitle}</p> : null}
        </div>
        <div className="flex items-center gap-2">
          <div role="group" aria-label="Show as" className="inline-flex rounded-lg bg-surface-2 p-0.5 ring-1 ring-line">
            <button
              type="button"
              aria-pressed={view === "chart"}
              className={toggleClass(view === "chart")}
              onClick={() => setView("chart")}
            >
              {chartLabel}
            </button>
            <button
              type="button"
              aria-pressed={view === "table"}
              className={toggleClass(view === "table")}
              onClick={() => setView("table")}
            >
              Table
            </button>
          </div>
          <div className="inline-flex">
            <button
              type="button"
              onClick={downloadCsv}
              disabled={table.rows.length === 0}
              className={`h-11 min-w-11 border lg:h-9 lg:min-w-0 ${noImage ? "rounded-lg" : "rounded-l-lg"} border-line-strong px-2.5 text-xs font-semibold text-ink-2 hover:bg-surface-2 disabled:opacity-40`}
              title={`Download ${title} as CSV`}
            >
              CSV
            </button>
            {noImage ? null : (
              <button
                type="button"
                onClick={downloadPng}
                disabled={busy || Boolean(empty)}
                className="-ml-px h-11 min-w-11 rounded-r-lg lg:h-9 lg:min-w-0 border border-line-strong px-2.5 text-xs font-semibold text-ink-2 hover:bg-surface-2 disabled:opacity-40"
                title={`Download ${title} as an image`}
              >
                {busy ? "…" : "PNG"}
              </button>
            )}
          </div>
        </div>
      </header>
      {controls ? <div className="flex flex-wrap items-center gap-2 border-b border-line px-4 py-2.5 sm:px-5">{controls}</div> : null}
      <div className="min-w-0 flex-1 p-4 sm:p-5">
        {empty ? (
          <p className="rounded-lg border border-dashed border-line-strong px-4 py-10 text-center text-sm text-muted">{empty}</p>
        ) : view === "chart" ? (
          <div ref={chartRef} className="min-w-0">
            {children}
          </div>
        ) : (
          (tableView ?? <DataTableView table={table} caption={title} />)
        )}
        {problem ? (
          <p role="alert" className="mt-2 text-sm text-danger">
            {problem}
          </p>
        ) : null}
      </div>
      {footer ? <div className="border-t border-line px-4 py-3 text-sm text-ink-2 sm:px-5">{footer}</div> : null}
    </section>
  );
}
