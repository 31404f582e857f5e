// The search box. A plain GET form: the query and the current filters travel in the URL,
// so it works before any script loads and every search is a link that can be shared.
import { MULTI_FACETS, type SearchParams } from "@/lib/search/query-schema";

export function SearchForm({ params, autoFocus }: { params: SearchParams; autoFocus?: boolean }) {
  const kept: [string, string][] = [
    ...MULTI_FACETS.filter((f) => params[f].length).map((f) => [f, params[f].join(",")] as [string, string]),
    ...(params.severity !== undefined ? [["severity", String(params.severity)] as [string, string]] : []),
    ...(params.from ? [["from", params.from] as [string, string]] : []),
    ...(params.to ? [["to", params.to] as [string, string]] : []),
    ...(params.sort !== "relevance" ? [["sort", params.sort] as [string, string]] : []),
  ];
  return (
    <form action="/search" method="get" role="search" className="flex gap-2">
      <label className="relative min-w-0 flex-1">
        <span className="sr-only">Search the casebook</span>
        <svg
          viewBox="0 0 24 24"
          className="pointer-events-none absolute left-3.5 top-1/2 h-5 w-5 -translate-y-1/2 text-muted"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.8"
          strokeLinecap="round"
          aria-hidden
        >
          <path d="M11 18a7 7 0 100-14 7 7 0 000 14zM20 20l-4-4" />
        </svg>
        <input
          type="search"
          name="q"
          defaultValue={params.q}
          autoFocus={autoFocus}
          maxLength={200}
          placeholder="Damage, shop words, serial, car or case number"
          data-testid="search-input"
          className="h-12 w-full rounded-xl border border-line-strong bg-surface pl-11 pr-3 text-base text-ink shadow-sm placeholder:text-muted focus:border-transparent focus:outline-2 focus:outline-accent"
        />
      </label>
      {kept.map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <button
        type="submit"
        className="h-12 shrink-0 rounded-xl bg-accent px-5 text-sm font-semibold text-accent-ink shadow-sm hover:brightness-110 focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent"
      >
        Search
      </button>
    </form>
  );
}
