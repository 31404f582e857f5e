// The search lives in the URL, so a search can be shared, bookmarked and gone back to.
// These build the links the page offers: toggle a facet value, drop a filter, change page.
import { MULTI_FACETS, type MultiFacet, type SearchParams } from "./query-schema";

export const SEARCH_PATH = "/search";

/** The shortest query string for these parameters: defaults are left out. */
export function searchQueryString(p: Partial<SearchParams>): string {
  const sp = new URLSearchParams();
  if (p.q?.trim()) sp.set("q", p.q.trim());
  for (const f of MULTI_FACETS) {
    const values = p[f];
    if (values?.length) sp.set(f, values.join(","));
  }
  if (p.severity !== undefined) sp.set("severity", String(p.severity));
  if (p.from) sp.set("from", p.from);
  if (p.to) sp.set("to", p.to);
  if (p.sort && p.sort !== "relevance") sp.set("sort", p.sort);
  if (p.page && p.page > 1) sp.set("page", String(p.page));
  const s = sp.toString();
  return s ? `?${s}` : "";
}

export const searchHref = (p: Partial<SearchParams>) => `${SEARCH_PATH}${searchQueryString(p)}`;

/** Any change of criteria starts again at page 1. */
export function withChange(p: SearchParams, change: Partial<SearchParams>): SearchParams {
  return { ...p, page: 1, ...change };
}

export function toggleValue(p: SearchParams, facet: MultiFacet, value: string): SearchParams {
  const current = p[facet] as string[];
  const next = current.includes(value) ? current.filter((v) => v !== value) : [...current, value];
  return withChange(p, { [facet]: next } as Partial<SearchParams>);
}

export function clearFilters(p: SearchParams): SearchParams {
  return withChange(p, {
    ...Object.fromEntries(MULTI_FACETS.map((f) => [f, []])),
    severity: undefined,
    from: undefined,
    to: undefined,
  } as Partial<SearchParams>);
}

export function activeFilterCount(p: SearchParams): number {
  return MULTI_FACETS.reduce((n, f) => n + p[f].length, 0) + (p.severity !== undefined ? 1 : 0) + (p.from ? 1 : 0) + (p.to ? 1 : 0);
}
