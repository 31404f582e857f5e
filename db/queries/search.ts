// Case search: free text over the narrative, serials and car numbers, shop words through the
// stored code lists, typo correction, facets with counts, one page of hits. Facet counts of
// a search are reused until the casebook changes, so paging and re-sorting only read a page.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { parseSearchText, queryWithout, type SearchClause } from "@/lib/search/parse-query";
import { MULTI_FACETS, PAGE_SIZE, type SearchParams } from "@/lib/search/query-schema";
import { cachedFacets, keepFacets, searchRevision, type FacetRow } from "./search-facet-cache";
import { M_COLUMNS, activeFacetsSql, and, passiveArrayFacetsSql, passiveScalarFacetsSql } from "./search-facet-sql";
import { labelFacets, type FacetValue } from "./search-facets";
import { loadHits, type SearchHit } from "./search-hits";
import { loadSearchLookups } from "./search-lookups";
import {
  caseFieldSql,
  documentQuery,
  facetFilters,
  identifierSql,
  isCaseField,
  orderSql,
  rankSql,
  wordMatchSql,
  type FacetKey,
  type SearchViewer,
} from "./search-sql";
import { readableIn } from "./case-scope";
import { prepareClauses, usableClauses } from "./search-terms";

export type { SearchViewer } from "./search-sql";
export type { SearchHit } from "./search-hits";

export interface SearchResult {
  readonly total: number;
  readonly page: number;
  readonly pageSize: number;
  readonly hits: SearchHit[];
  readonly facets: Record<FacetKey, FacetValue[]>;
  /** How the query was read: the clauses, the codes their shop words named, any corrections. */
  readonly understood: {
    text: string;
    kind: string;
    codes: { code: string; label: string }[];
    corrections: string[];
    reading: string;
    role: string;
    without: string;
  }[];
}

type PageRow = { id: string; rank: number };

export async function searchCases(params: SearchParams, viewer: SearchViewer): Promise<SearchResult> {
  const [lookups, revision] = await Promise.all([loadSearchLookups(), searchRevision()]);
  const prepared = usableClauses(await prepareClauses(parseSearchText(params.q, lookups.damageEntries)));
  const docQuery = documentQuery(prepared);
  const words = wordMatchSql(prepared);
  const identifiers = prepared.filter((c) => c.kind === "identifier");
  const caseFields = prepared.filter(isCaseField);
  const siteIds = lookups.sites.filter((s) => params.site.includes(s.code)).map((s) => s.id);
  const filters = facetFilters(params, siteIds, "s");
  const base = [
    readableIn(viewer, "s") ?? null,
    words.match,
    ...identifiers.map(identifierSql),
    ...caseFields.map((c) => caseFieldSql(c, docQuery !== "")),
    params.from ? sql`s.sort_on >= ${params.from}::date` : null,
    params.to ? sql`s.sort_on <= ${params.to}::date` : null,
  ].filter((x): x is SQL => x !== null);
  // Word searches read the row that carries the narrative; the rest the narrow one.
  const from = sql`${docQuery ? sql`case_search_text s` : sql`case_search s`} ${words.join ?? sql``}`;
  const where = and([...base, ...(Object.values(filters) as SQL[])]);
  const ranked = prepared.length > 0 && params.sort === "relevance";
  const rank = ranked ? rankSql(prepared, docQuery !== "", words.structured) : sql`0`;
  const limit = sql`LIMIT ${PAGE_SIZE} OFFSET ${(params.page - 1) * PAGE_SIZE}`;

  const key = JSON.stringify([
    viewer.role,
    viewer.id,
    viewer.siteId,
    docQuery,
    prepared.map((c) => [c.rows, c.zones, c.triggers, c.classes, c.codes, c.components]),
    identifiers.map((c) => c.text),
    params.from,
    params.to,
    params.severity,
    MULTI_FACETS.map((f) => params[f]),
  ]);
  const cached = cachedFacets(key, revision);
  const pageOnly = () =>
    db
      .execute<PageRow>(
        sql`SELECT s.case_id AS id, ${rank}::real AS rank FROM ${from} WHERE ${where} ORDER BY ${orderSql(params.sort, ranked)} ${limit}`,
      )
      .then((r) => r.rows);

  let page: PageRow[];
  let facetRows: FacetRow[];
  if (cached) {
    [page, facetRows] = [await pageOnly(), cached];
  } else {
    // With words, one pass over the matching rows gives the ranked page and the single-valued
    // counts; without, the page comes straight off the date index. Codes and parts are counted
    // by a statement of their own, and each chosen facet too, all at once on their own connections.
    const scalars = docQuery
      ? db
          .execute<{ facets: FacetRow[]; page: PageRow[] }>(
            sql`
          WITH m AS MATERIALIZED (SELECT ${M_COLUMNS}, ${rank}::real AS rank FROM ${from} WHERE ${where}),
          facets AS (${passiveScalarFacetsSql(filters)}),
          page AS (SELECT m.case_id AS id, m.rank FROM m ORDER BY ${orderSql(params.sort, ranked, "m")} ${limit})
          SELECT (SELECT coalesce(json_agg(facets), '[]') FROM facets) AS facets, (SELECT coalesce(json_agg(page), '[]') FROM page) AS page`,
          )
          .then((r) => r.rows[0])
      : Promise.all([
          db.execute<{ facets: FacetRow[] }>(sql`
            WITH m AS MATERIALIZED (SELECT ${M_COLUMNS} FROM ${from} WHERE ${where}), facets AS (${passiveScalarFacetsSql(filters)})
            SELECT coalesce(json_agg(facets), '[]') AS facets FROM facets`),
          pageOnly(),
        ]).then(([c, p]) => ({ facets: c.rows[0].facets, page: p }));
    const arrays = passiveArrayFacetsSql(filters);
    const arrayCounts = arrays
      ? db
          .execute<FacetRow>(sql`WITH m AS MATERIALIZED (SELECT s.damage_codes, s.components FROM ${from} WHERE ${where}) ${arrays}`)
          .then((r) => r.rows)
      : Promise.resolve([]);
    const active = activeFacetsSql(from, base, filters).map((q) => db.execute<FacetRow>(q).then((r) => r.rows));
    const [first, ...counted] = await Promise.all([scalars, arrayCounts, ...active]);
    page = first.page;
    facetRows = [...first.facets, ...counted.flat()];
    keepFacets(key, revision, facetRows);
  }

  return {
    total: facetRows.find((r) => r.facet === "total")?.n ?? 0,
    page: params.page,
    pageSize: PAGE_SIZE,
    hits: await loadHits(page, prepared, lookups, params.q.trim() !== ""),
    facets: labelFacets(facetRows, params, lookups),
    understood: prepared.map((c, i) => ({
      text: c.text,
      kind: c.kind,
      corrections: [...c.corrections],
      reading: c.reading,
      role: roleOf(c),
      without: queryWithout(prepared, i),
      codes: c.codes.map((code) => ({ code, label: lookups.labels.damage.get(code) ?? code })),
    })),
  };
}

/** What kind of thing a clause names, for the "read as" line. */
function roleOf(c: SearchClause): string {
  if (c.kind !== "words") return c.kind;
  if (c.rows.length) return "row";
  if (c.zones.length) return "zone";
  if (c.triggers.length) return "trigger";
  if (c.classes.length) return "class";
  if (c.components.length) return "part";
  if (c.codes.length) return "damage";
  return "words";
}
