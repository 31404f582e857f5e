// Case search as the search page and GET /api/search run it: one search, held to what the
// viewer may read (the reach is in the WHERE of db/queries/search.ts).
import "server-only";
import { searchCases as runSearch, type SearchResult, type SearchViewer } from "@/db/queries/search";
import type { SearchParams } from "./query-schema";

export type { SearchHit, SearchResult } from "@/db/queries/search";
export type { FacetValue } from "@/db/queries/search-facets";

export async function searchCases(params: SearchParams, viewer: SearchViewer): Promise<SearchResult> {
  return runSearch(params, viewer);
}
