// Case search: free text over the narrative, serials and car numbers, shop words through the
// stored code lists, typo correction, facets with counts, one page of hits. The result set
// is found once for the page, the total and most facet counts; chosen facets count apart.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { parseSearchText } from "@/lib/search/parse-query";
import { PAGE_SIZE, type SearchParams } from "@/lib/search/query-schema";
import { loadHits, type SearchHit } from "./search-hits";
import { loadSearchLookups } from "./search-lookups";
import { prepareClauses, usableClauses, type PreparedClause } from "./search-terms";
import { ARRAY_FACETS, SCALAR_FACETS, documentQuery, facetColumn, identifierSql, facetFilters, orderSql, rankSql, scopeSql, type FacetKey, type SearchViewer } from "./search-sql";
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

type FacetRow = { facet: string; value: string | null; n: number };
type Filters = Partial<Record<FacetKey, SQL>>;
const and = (parts: SQL[]) => (parts.length ? sql.join(parts, sql` AND `) : sql`true`);

/** Counts within the result set m: facets nobody has chosen from, plus the total. */
function passiveFacetsSql(filters: Filters): SQL {
  const passive = SCALAR_FACETS.filter((f) => !filters[f]);
  const col = (f: FacetKey) => facetColumn(f, "m");
  const which = passive.map((f) => sql`WHEN GROUPING(${col(f)}) = 0 THEN ${f}`);
  const branches: SQL[] = [sql`
    SELECT ${passive.length ? sql`CASE ${sql.join(which, sql` `)} ELSE 'total' END` : sql`'total'`} AS facet,
      ${passive.length ? sql`COALESCE(${sql.join(passive.map(col), sql`, `)})` : sql`NULL::text`} AS value, count(*)::int AS n
    FROM m GROUP BY GROUPING SETS (${sql.join([...passive.map((f) => sql`(${col(f)})`), sql`()`], sql`, `)})`];
  for (const f of ARRAY_FACETS.filter((f) => !filters[f])) {
    branches.push(sql`SELECT ${f}, v, count(*)::int FROM (SELECT unnest(${facetColumn(f, "m")}) AS v FROM m) x GROUP BY 2`);
  }
  return sql.join(branches, sql` UNION ALL `);
}

/** A chosen facet counts over everything else asked, so more of its values can be added. */
function activeFacetSql(f: FacetKey, from: SQL, base: SQL[], filters: Filters): SQL {
  const others = Object.entries(filters).filter(([k]) => k !== f).map(([, v]) => v as SQL);
  const where = and([...base, ...others]);
  return ARRAY_FACETS.includes(f)
    ? sql`SELECT ${f} AS facet, v AS value, count(*)::int AS n FROM (SELECT unnest(${facetColumn(f, "s")}) AS v FROM ${from} WHERE ${where}) x GROUP BY 2`
    : sql`SELECT ${f} AS facet, ${facetColumn(f, "s")} AS value, count(*)::int AS n FROM ${from} WHERE ${where} GROUP BY 2`;
}

export async function searchCases(params: SearchParams, viewer: SearchViewer): Promise<SearchResult> {
  const lookups = await loadSearchLookups();
  const prepared: PreparedClause[] = usableClauses(await prepareClauses(parseSearchText(params.q, lookups.damageEntries)));
  const hasText = prepared.length > 0;
  const docQuery = documentQuery(prepared);
  const siteIds = lookups.sites.filter((s) => params.site.includes(s.code)).map((s) => s.id);
  const filters = facetFilters(params, siteIds, "s");
  const base = [
    scopeSql(viewer),
    docQuery ? sql`s.document @@ ${docQuery}::tsquery` : null,
    ...prepared.filter((c) => c.kind === "identifier").map(identifierSql),
    params.from ? sql`s.sort_on >= ${params.from}::date` : null,
    params.to ? sql`s.sort_on <= ${params.to}::date` : null,
  ].filter((x): x is SQL => x !== null);
  // Word searches read the row that carries the narrative; the rest the narrow one.
  const from = docQuery ? sql`case_search_text s` : sql`case_search s`;

  const where = and([...base, ...(Object.values(filters) as SQL[])]);
  const ranked = hasText && params.sort === "relevance";

  // Three kinds of statement at once, each on its own connection: the result set with the
  // total and the unchosen facets; the page (ranked, or straight off the date index); and
  // each chosen facet counted over everything else asked.
  const counts = db.execute<{ facets: FacetRow[] }>(sql`
    WITH m AS MATERIALIZED (
      SELECT s.status, s.trigger, s.primary_cause, s.bearing_class, s.site_id, s.damage_codes, s.components, s.max_severity
      FROM ${from} WHERE ${where}
    ),
    facets AS (${passiveFacetsSql(filters)})
    SELECT coalesce(json_agg(facets), '[]') AS facets FROM facets`);
  const pageRows = db.execute<{ id: string; rank: number }>(sql`
    SELECT s.case_id AS id, ${ranked ? rankSql(prepared, docQuery !== "") : sql`0`}::real AS rank
    FROM ${from} WHERE ${where}
    ORDER BY ${orderSql(params.sort, ranked)} LIMIT ${PAGE_SIZE} OFFSET ${(params.page - 1) * PAGE_SIZE}`);
  const active = (Object.keys(filters) as FacetKey[]).map((f) => db.execute<FacetRow>(activeFacetSql(f, from, base, filters)));
  const [{ rows: countRows }, { rows: page }, ...activeRows] = await Promise.all([counts, pageRows, ...active]);
  const facetRows = [...countRows[0].facets, ...activeRows.flatMap((r) => r.rows)];

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
