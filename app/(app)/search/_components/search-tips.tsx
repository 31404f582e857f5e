// What to try: shown above the latest cases before anything is asked, and when nothing matched.
import Link from "next/link";
import type { SearchParams } from "@/lib/search/query-schema";
import { activeFilterCount, clearFilters, searchHref } from "@/lib/search/url-state";

const EXAMPLES = [
  { q: "spall cup outboard row", why: "damage on a part and row" },
  { q: "rust", why: "shop words find water etch" },
  { q: "milky grease", why: "grease condition" },
  { q: "arc burn welding", why: "electrical damage" },
  { q: '"torn lip"', why: "an exact phrase" },
];

export function ExampleSearches() {
  return (
    <ul className="flex flex-wrap gap-2">
      {EXAMPLES.map((e) => (
        <li key={e.q}>
          <Link
            href={searchHref({ q: e.q })}
            className="inline-flex flex-col rounded-lg border border-line bg-surface px-3 py-2 text-sm hover:border-accent"
          >
            <span className="font-medium text-ink">{e.q}</span>
            <span className="text-xs text-muted">{e.why}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}

export function SearchIntro() {
  return (
    <div className="mb-5 rounded-xl border border-line bg-surface p-4 sm:p-5" data-testid="search-intro">
      <p className="font-medium text-ink">Have we seen this before?</p>
      <p className="mt-1 text-sm text-muted">
        Search the notes of every case you can see, by damage, shop words, serial, car or case number. Typos are forgiven, and shop words
        find the damage code they mean. Narrow with the filters; the address bar keeps the search, so you can share it.
      </p>
      <div className="mt-3">
        <ExampleSearches />
      </div>
    </div>
  );
}

export function NoResults({ params }: { params: SearchParams }) {
  const filters = activeFilterCount(params);
  return (
    <div className="rounded-xl border border-dashed border-line-strong bg-surface px-5 py-8 text-center" data-testid="no-results">
      <p className="font-medium text-ink">
        No cases match{params.q ? <> “{params.q}”</> : null}
        {filters ? " with these filters" : ""}.
      </p>
      <ul className="mx-auto mt-3 max-w-md space-y-1 text-left text-sm text-muted">
        {filters ? (
          <li>
            •{" "}
            <Link className="font-medium text-accent hover:underline" href={searchHref(clearFilters(params))}>
              Search without the filters
            </Link>{" "}
            — they may be narrowing too far.
          </li>
        ) : null}
        {params.q.trim().split(/\s+/).length > 1 ? <li>• Use fewer words: every word has to match a case.</li> : null}
        <li>• Try the shop word or the damage name, e.g. “pitting” or “surface distress”.</li>
        <li>• Search a serial or car number in part, e.g. the last digits.</li>
      </ul>
      <div className="mt-5 flex justify-center">
        <ExampleSearches />
      </div>
    </div>
  );
}
