// The filters in force as removable chips, so it is always clear what narrowed the list.
import Link from "next/link";
import type { SearchResult } from "@/lib/search/search-service";
import { MULTI_FACETS, type SearchParams } from "@/lib/search/query-schema";
import { activeFilterCount, clearFilters, searchHref, toggleValue, withChange } from "@/lib/search/url-state";

export function ActiveFilters({ params, facets }: { params: SearchParams; facets: SearchResult["facets"] }) {
  if (activeFilterCount(params) === 0) return null;
  const chips: { key: string; label: string; href: string }[] = [];
  for (const f of MULTI_FACETS) {
    for (const v of params[f]) {
      const label = facets[f].find((x) => x.value === v)?.label ?? v;
      chips.push({ key: `${f}:${v}`, label, href: searchHref(toggleValue(params, f, v)) });
    }
  }
  if (params.severity !== undefined)
    chips.push({ key: "severity", label: `Severity ${params.severity}+`, href: searchHref(withChange(params, { severity: undefined })) });
  if (params.from) chips.push({ key: "from", label: `From ${params.from}`, href: searchHref(withChange(params, { from: undefined })) });
  if (params.to) chips.push({ key: "to", label: `To ${params.to}`, href: searchHref(withChange(params, { to: undefined })) });
  return (
    <div className="mb-3 flex flex-wrap items-center gap-1.5" data-testid="active-filters">
      {chips.map((c) => (
        <Link
          key={c.key}
          href={c.href}
          scroll={false}
          aria-label={`Remove filter ${c.label}`}
          className="inline-flex h-8 items-center gap-1 rounded-full border border-accent/40 bg-accent-soft pl-3 pr-2 text-xs font-medium text-ink hover:border-accent"
        >
          {c.label}
          <svg
            viewBox="0 0 24 24"
            className="h-3.5 w-3.5 text-muted"
            fill="none"
            stroke="currentColor"
            strokeWidth="2"
            strokeLinecap="round"
            aria-hidden
          >
            <path d="M6 6l12 12M18 6L6 18" />
          </svg>
        </Link>
      ))}
      <Link href={searchHref(clearFilters(params))} scroll={false} className="px-2 text-xs font-medium text-accent hover:underline">
        Clear all
      </Link>
    </div>
  );
}
