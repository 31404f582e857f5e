// Pages of results as links, so a page of a search can be shared too.
import Link from "next/link";
import type { SearchParams } from "@/lib/search/query-schema";
import { searchHref } from "@/lib/search/url-state";

const MAX_PAGE = 500;

function pagesAround(page: number, count: number): (number | "…")[] {
  const want = new Set([1, count, page - 1, page, page + 1].filter((p) => p >= 1 && p <= count));
  const sorted = [...want].sort((a, b) => a - b);
  return sorted.flatMap((p, i) => (i > 0 && p - sorted[i - 1] > 1 ? ["…" as const, p] : [p]));
}

export function Pagination({ params, total, pageSize }: { params: SearchParams; total: number; pageSize: number }) {
  const count = Math.min(MAX_PAGE, Math.ceil(total / pageSize));
  if (count <= 1) return null;
  const step = "inline-flex h-11 min-w-11 items-center lg:h-10 lg:min-w-10 justify-center rounded-lg border px-3 text-sm tabular";
  const to = (p: number) => searchHref({ ...params, page: p });
  return (
    <nav aria-label="Pages" className="mt-5 flex flex-wrap items-center justify-center gap-1.5">
      {params.page > 1 ? (
        <Link href={to(params.page - 1)} className={`${step} border-line-strong bg-surface text-ink-2 hover:bg-surface-2`} rel="prev">
          Previous
        </Link>
      ) : null}
      {pagesAround(params.page, count).map((p, i) =>
        p === "…" ? (
          <span key={`gap-${i}`} className="px-1 text-muted">
            …
          </span>
        ) : (
          <Link
            key={p}
            href={to(p)}
            aria-current={p === params.page ? "page" : undefined}
            className={`${step} ${p === params.page ? "border-ink bg-ink text-surface" : "border-line-strong bg-surface text-ink-2 hover:bg-surface-2"}`}
          >
            {p}
          </Link>
        ),
      )}
      {params.page < count ? (
        <Link href={to(params.page + 1)} className={`${step} border-line-strong bg-surface text-ink-2 hover:bg-surface-2`} rel="next">
          Next
        </Link>
      ) : null}
    </nav>
  );
}
