"use client";
// Where you are in the list, how many a page shows, and the way to the next page.
import { PAGE_SIZES } from "@/lib/cases/list-query";
import { Icon } from "./icons";

type Props = { page: number; pageSize: number; total: number; onPage: (p: number) => void; onPageSize: (n: number) => void };

const stepClass =
  "inline-flex h-11 min-w-11 items-center justify-center gap-1 rounded-lg border border-line-strong bg-surface px-3 text-sm font-medium text-ink-2 hover:bg-surface-2 disabled:pointer-events-none disabled:opacity-40 sm:h-9";

export function Pager({ page, pageSize, total, onPage, onPageSize }: Props) {
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const first = total ? (page - 1) * pageSize + 1 : 0;
  const last = Math.min(total, page * pageSize);
  return (
    <nav
      aria-label="Pages"
      className="flex flex-col gap-3 border-t border-line px-4 py-3 sm:flex-row sm:items-center sm:justify-between sm:px-5"
      data-testid="case-pager"
    >
      <p className="text-sm text-ink-2 tabular" aria-live="polite">
        {total ? (
          <>
            Showing{" "}
            <strong className="font-semibold text-ink">
              {first.toLocaleString("en-US")}–{last.toLocaleString("en-US")}
            </strong>{" "}
            of <strong className="font-semibold text-ink">{total.toLocaleString("en-US")}</strong>
          </>
        ) : (
          "No cases"
        )}
      </p>
      <div className="flex items-center justify-between gap-3 sm:justify-end">
        <label className="flex items-center gap-2 text-sm text-muted">
          <span className="hidden sm:inline">Rows</span>
          <select
            value={pageSize}
            onChange={(e) => onPageSize(Number(e.target.value))}
            aria-label="Rows per page"
            className="h-11 rounded-lg border border-line-strong bg-surface px-2 text-sm text-ink sm:h-9"
          >
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <div className="flex items-center gap-2">
          <button type="button" className={stepClass} disabled={page <= 1} onClick={() => onPage(page - 1)} aria-label="Previous page">
            <Icon name="left" /> <span className="hidden sm:inline">Previous</span>
          </button>
          <span className="min-w-[5.5rem] text-center text-sm text-ink-2 tabular">
            Page {page} of {pageCount}
          </span>
          <button type="button" className={stepClass} disabled={page >= pageCount} onClick={() => onPage(page + 1)} aria-label="Next page">
            <span className="hidden sm:inline">Next</span> <Icon name="right" />
          </button>
        </div>
      </div>
    </nav>
  );
}
