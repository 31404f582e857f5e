// Case search: free text over the narrative, serials and car numbers, shop words through the
// stored code lists, typo correction, facets with counts, one page of hits. One statement
// finds the matching set once and derives the page and every facet count from it.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { parseSearchText } from "@/lib/search/parse-query";
import { PAGE_SIZE, type SearchParams } from "@/lib/search/query-schema";
import { loadHits, type SearchHit } from "./search-hits";
import { loadSearchLookups } from "./search-lookups";
import { prepareClauses, usableClauses, type PreparedClause } from "./search-terms";
import { clauseSql, facetFilters, orderSql, rankSql, scopeSql, whereAll, type FacetKey, type SearchViewer } from "./search-sql";
import { labelFacets, type FacetValue } from "./search-facets";

export type { SearchViewer } from "./search-sql";
export type { SearchHit } from "./search-hits";

export interface SearchResult {
  readonly total: number;
  readonly page: number;
  readonly pageSize: number;
  readonly hits: SearchHit[];
  readonly facets: Record<FacetKey, FacetValue[]>;
  /** How the query was read: the clauses, the codes their shop words named, any corrections. */
  readonly understood: { text: string; kind: string; codes: { code: string; label: string }[]; corrections: string[] }[];
}

const SCALAR: Partial<Record<FacetKey, string>> = {
  trigger: "m.trigger", cause: "m.primary_cause", class: "m.bearing_class",
  site: "m.site_id::text", status: "m.status", severity: "m.max_severity::text",
};
const ARRAYS: Partial<Record<FacetKey, string>> = { code: "m.damage_codes", component: "m.components" };

function facetSql(filters: Partial<Record<FacetKey, SQL>>): SQL {
  const passive = Object.keys(SCALAR).filter((f) => !filters[f as FacetKey]) as FacetKey[];
  const col = (f: FacetKey) => sql.raw(SCALAR[f]!);
  const which = passive.map((f) => sql`WHEN GROUPING(${col(f)}) = 0 THEN ${f}`);
  const branches: SQL[] = [sql`
    SELECT ${passive.length ? sql`CASE ${sql.join(which, sql` `)} ELSE 'total' END` : sql`'total'`} AS facet,
      ${passive.length ? sql`COALESCE(${sql.join(passive.map(col), sql`, `)})` : sql`NULL::text`} AS value, count(*)::int AS n
    FROM m WHERE ${whereAll(filters)}
    GROUP BY GROUPING SETS (${sql.join([...passive.map((f) => sql`(${col(f)})`), sql`()`], sql`, `)})`];
  for (const f of Object.keys(SCALAR) as FacetKey[]) {
    if (filters[f]) branches.push(sql`SELECT ${f}, ${col(f)}, count(*)::int FROM m WHERE ${whereAll(filters, f)} GROUP BY 2`);
  }
  for (const [f, column] of Object.entries(ARRAYS) as [FacetKey, string][]) {
    branches.push(sql`SELECT ${f}, v, count(*)::int FROM m, unnest(${sql.raw(column)}) AS v WHERE ${whereAll(filters, f)} GROUP BY 2`);
  }
  return sql.join(branches, sql` UNION ALL `);
}

type Row = { facets: { facet: string; value: string | null; n: number }[]; page: { id: string; rank: number }[] };

export async function searchCases(params: SearchParams, viewer: SearchViewer): Promise<SearchResult> {
  const lookups = await loadSearchLookups();
  const prepared: PreparedClause[] = usableClauses(await prepareClauses(parseSearchText(params.q, lookups.damageEntries)));
  const hasText = prepared.length > 0;
  const siteIds = lookups.sites.filter((s) => params.site.includes(s.code)).map((s) => s.id);
  const filters = facetFilters(params, siteIds);
  const base = [
    scopeSql(viewer),
    ...prepared.map(clauseSql),
    params.from ? sql`s.sort_on >= ${params.from}::date` : null,
    params.to ? sql`s.sort_on <= ${params.to}::date` : null,
  ].filter((x): x is SQL => x !== null);

  const { rows } = await db.execute<Row>(sql`
    WITH m AS MATERIALIZED (
      SELECT s.case_id, s.status, s.trigger, s.primary_cause, s.bearing_class, s.site_id, s.damage_codes, s.components,
        s.max_severity, s.sort_on, s.created_at, ${hasText ? rankSql(prepared) : sql`0`}::real AS rank
      FROM case_search s WHERE ${base.length ? sql.join(base, sql` AND `) : sql`true`}
    ),
    facets AS (${facetSql(filters)}),
    page AS (
      SELECT m.case_id AS id, m.rank FROM m WHERE ${whereAll(filters)}
      ORDER BY ${orderSql(params.sort, hasText)} LIMIT ${PAGE_SIZE} OFFSET ${(params.page - 1) * PAGE_SIZE}
    )
    SELECT (SELECT coalesce(json_agg(facets), '[]') FROM facets) AS facets,
      (SELECT coalesce(json_agg(page), '[]') FROM page) AS page`);
  const { facets: facetRows, page } = rows[0];

  return {
    total: facetRows.find((r) => r.facet === "total")?.n ?? 0,
    page: params.page,
    pageSize: PAGE_SIZE,
    hits: await loadHits(page, prepared, lookups, params.q.trim() !== ""),
    facets: labelFacets(facetRows, params, lookups),
    understood: prepared.map((c) => ({
      text: c.text, kind: c.kind, corrections: [...c.corrections],
      codes: c.codes.map((code) => ({ code, label: lookups.labels.damage.get(code) ?? code })),
    })),
  };
}
