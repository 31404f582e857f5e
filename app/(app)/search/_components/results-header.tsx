// How many cases matched, how the query was read (part, row, damage…; corrections, shop words),
// and the sort. Each part of the reading can be dropped with one click.
import Link from "next/link";
import type { SearchResult } from "@/lib/search/search-service";
import { SORTS, type SearchParams, type SearchSort } from "@/lib/search/query-schema";
import { searchHref, withChange } from "@/lib/search/url-state";

const SORT_LABELS: Record<SearchSort, string> = { relevance: "Best match", newest: "Newest", oldest: "Oldest", severity: "Most severe" };

export function ResultsHeader({ params, result }: { params: SearchParams; result: SearchResult }) {
  const first = result.total ? (result.page - 1) * result.pageSize + 1 : 0;
  const last = Math.min(result.total, result.page * result.pageSize);
  const corrections = result.understood.filter((u) => u.corrections.length);
  const shopWords = result.understood.filter((u) => u.codes.length);
  return (
    <div className="mb-3 flex flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-2 tabular" aria-live="polite" data-testid="result-count">
          {result.total ? (
            <>
              <strong className="font-semibold text-ink">
                {first.toLocaleString("en-US")}–{last.toLocaleString("en-US")}
              </strong>{" "}
              of <strong className="font-semibold text-ink">{result.total.toLocaleString("en-US")}</strong>{" "}
              {result.total === 1 ? "case" : "cases"}
            </>
          ) : (
            "No cases"
          )}
        </p>
        <nav aria-label="Sort" className="inline-flex rounded-lg border border-line-strong bg-surface p-0.5 text-sm">
          {SORTS.filter((s) => s !== "relevance" || params.q).map((s) => {
            const on = params.sort === s || (s === "newest" && !params.q && params.sort === "relevance");
            return (
              <Link
                key={s}
                href={searchHref(withChange(params, { sort: s }))}
                scroll={false}
                aria-current={on ? "true" : undefined}
                className={`inline-flex min-h-11 items-center rounded-md px-2.5 lg:min-h-0 lg:py-1 ${on ? "bg-ink text-surface" : "text-ink-2 hover:bg-surface-2"}`}
              >
                {SORT_LABELS[s]}
              </Link>
            );
          })}
        </nav>
      </div>
      <ReadAs params={params} result={result} />
      {corrections.length || shopWords.length ? (
        <p className="text-sm text-muted" data-testid="understood">
          {corrections.map((u) => (
            <span key={u.text} className="mr-3">
              Also searched <em className="not-italic font-medium text-ink-2">{u.corrections.join(", ")}</em> for “{u.text}”.
            </span>
          ))}
          {shopWords.map((u) => (
            <span key={`c-${u.text}`} className="mr-3">
              “{u.text}” includes cases coded <span className="font-medium text-ink-2">{u.codes.map((c) => c.label).join(", ")}</span>.
            </span>
          ))}
        </p>
      ) : null}
    </div>
  );
}

const STRUCTURED = new Set(["part", "row", "zone", "damage", "trigger", "class"]);

/** "Read as: cup · outboard row · subsurface spall", each with a link that drops it. */
function ReadAs({ params, result }: { params: SearchParams; result: SearchResult }) {
  const parts = result.understood;
  if (!parts.some((u) => STRUCTURED.has(u.role))) return null;
  return (
    <div className="flex flex-wrap items-center gap-1.5 text-sm" data-testid="read-as">
      <span className="text-muted">Read as</span>
      {parts.map((u, i) => (
        <span key={`${u.text}-${i}`} className="inline-flex items-center gap-1">
          {i > 0 ? (
            <span aria-hidden className="text-muted">
              ·
            </span>
          ) : null}
          <span
            className={`inline-flex items-center gap-1 rounded-full py-0.5 pl-2.5 pr-1 ring-1 ${STRUCTURED.has(u.role) ? "bg-accent-soft text-ink ring-accent/30" : "bg-surface-2 text-ink-2 ring-line"}`}
          >
            {u.reading}
            <Link
              href={searchHref(withChange(params, { q: u.without }))}
              scroll={false}
              aria-label={`Search without “${u.reading}”`}
              className="inline-flex h-11 w-11 items-center justify-center rounded-full text-muted lg:h-6 lg:w-6 hover:bg-surface hover:text-ink"
            >
              <span aria-hidden>×</span>
            </Link>
          </span>
        </span>
      ))}
    </div>
  );
}
