import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { codeEntries } from "@/lib/codes/code-service";
import { searchCases } from "@/lib/search/search-service";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { hasCriteria, readSearchParams } from "@/lib/search/query-schema";
import { activeFilterCount } from "@/lib/search/url-state";
import { ActiveFilters } from "./_components/active-filters";
import { FacetPanel } from "./_components/facet-panel";
import { FilterDrawer } from "./_components/filter-drawer";
import { HitCard } from "./_components/hit-card";
import { Pagination } from "./_components/pagination";
import { ResultsHeader } from "./_components/results-header";
import { SearchForm } from "./_components/search-form";
import { NoResults, SearchIntro } from "./_components/search-tips";

export const dynamic = "force-dynamic";

export async function generateMetadata({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}): Promise<Metadata> {
  const q = (await searchParams).q;
  return { title: typeof q === "string" && q.trim() ? `Search: ${q.trim().slice(0, 60)}` : "Search" };
}

// Everything the search is lives in the URL; the server reads it, runs the search within the
// caller's scope and renders the results, so a shared link shows the same list.
export default async function SearchPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser("case:read");
  const { params, dropped } = readSearchParams(await searchParams);
  const [result, damage] = await Promise.all([searchCases(params, user), codeEntries("damage", { includeRetired: true })]);
  const damageEntries = damage.map((d) => ({ code: d.code, label: d.label, synonyms: d.synonyms, retired: d.retiredAt !== null }));
  const criteria = hasCriteria(params);
  const scope = can(user.role, "case:read-all") ? "all sites" : "your shop's cases and the ones you filed";

  return (
    <div>
      <PageHeader title="Search the casebook" subtitle={`Free text, shop words and filters over ${scope}.`} />
      <SearchForm params={params} autoFocus={!criteria} />
      {dropped.length ? (
        <p role="status" className="mt-2 text-sm text-warn">
          Part of this link could not be read and was left out ({dropped.join(", ")}).
        </p>
      ) : null}
      <div className="mt-5 grid gap-5 lg:grid-cols-[260px_minmax(0,1fr)] lg:items-start">
        <FilterDrawer active={activeFilterCount(params)} total={result.total}>
          <FacetPanel params={params} facets={result.facets} damageEntries={damageEntries} />
        </FilterDrawer>
        <div className="min-w-0">
          {!criteria ? <SearchIntro /> : null}
          <ActiveFilters params={params} facets={result.facets} />
          {result.total ? (
            <>
              <ResultsHeader params={params} result={result} />
              {!criteria ? <h2 className="sr-only">Latest cases</h2> : null}
              <ol className="flex flex-col gap-3" data-testid="search-results">
                {result.hits.map((h) => (
                  <HitCard key={h.id} hit={h} />
                ))}
              </ol>
              <Pagination params={params} total={result.total} pageSize={result.pageSize} />
            </>
          ) : (
            <NoResults params={params} />
          )}
        </div>
      </div>
    </div>
  );
}
