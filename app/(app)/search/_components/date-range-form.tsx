// Removal dates from and to: a small GET form that keeps everything else in the search.
import { MULTI_FACETS, type SearchParams } from "@/lib/search/query-schema";

export function DateRangeForm({ params }: { params: SearchParams }) {
  const hidden: [string, string][] = [
    ...(params.q ? [["q", params.q] as [string, string]] : []),
    ...MULTI_FACETS.filter((f) => params[f].length).map((f) => [f, params[f].join(",")] as [string, string]),
    ...(params.severity !== undefined ? [["severity", String(params.severity)] as [string, string]] : []),
    ...(params.sort !== "relevance" ? [["sort", params.sort] as [string, string]] : []),
  ];
  const input =
    "h-10 w-full rounded-lg border border-line-strong bg-surface px-2 text-sm text-ink focus:outline-2 focus:outline-accent lg:h-9";
  return (
    <form action="/search" method="get" className="grid grid-cols-2 gap-2 px-2">
      {hidden.map(([n, v]) => (
        <input key={n} type="hidden" name={n} value={v} />
      ))}
      <label className="text-xs text-muted">
        From
        <input type="date" name="from" defaultValue={params.from} className={input} />
      </label>
      <label className="text-xs text-muted">
        To
        <input type="date" name="to" defaultValue={params.to} className={input} />
      </label>
      <button
        type="submit"
        className="col-span-2 h-9 rounded-lg border border-line-strong bg-surface text-sm font-medium text-ink-2 hover:bg-surface-2"
      >
        Apply dates
      </button>
    </form>
  );
}
