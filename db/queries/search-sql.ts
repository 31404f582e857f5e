// SQL pieces of a search over case_search: who may see what, what each clause matches,
// how matches rank, and the facet filters. Kept apart so each reads on its own.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import type { MultiFacet, SearchParams } from "@/lib/search/query-schema";
import type { PreparedClause } from "./search-terms";

export type SearchViewer = { id: string; role: string; siteId: string | null };

const param = (v: unknown) => sql.param(v);
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** "SRRX204518" is also tried as "SRRX 204518", the way marks and numbers are stored. */
function identifierPatterns(text: string): string[] {
  const split = text.match(/^([A-Za-z]{2,5})(\d{2,})$/);
  return [text, ...(split ? [`${split[1]} ${split[2]}`] : [])].map((p) => `%${likeEscape(p)}%`);
}

/** A verbatim lexeme in tsquery syntax: codes and parts are stored as "dc:…" and "pc:…". */
const lexeme = (text: string) => `'${text.replace(/\\/g, "\\\\").replace(/'/g, "''")}'`;

/** One clause as a tsquery: its words, or a finding coded as what they name, or a part they name. */
function clauseTsquery(c: PreparedClause): string {
  const parts = [
    ...(c.tsquery ? [`( ${c.tsquery} )`] : []),
    ...c.codes.map((code) => lexeme(`dc:${code}`)),
    ...c.components.map((part) => lexeme(`pc:${part}`)),
  ];
  return parts.length ? `( ${parts.join(" | ")} )` : "";
}

/** Every word clause at once, answered by the narrative index. */
export function documentQuery(clauses: readonly PreparedClause[]): string {
  return clauses.filter((c) => c.kind !== "identifier").map(clauseTsquery).filter(Boolean).join(" & ");
}

/** A serial, car or case number in part; or the same token in the narrative ("1/16"). */
export function identifierSql(c: PreparedClause): SQL {
  const patterns = identifierPatterns(c.text);
  return sql`s.case_id IN (
    SELECT i.case_id FROM case_search i WHERE i.identifiers ILIKE ANY(${param(patterns)}::text[])
    ${c.tsquery ? sql`UNION SELECT d.case_id FROM case_search_text d WHERE d.document @@ ${c.tsquery}::tsquery` : sql``})`;
}

/** Text relevance, plus a lift for coded findings the query names and for serial or car hits. */
export function rankSql(clauses: readonly PreparedClause[], withText: boolean): SQL {
  const tsqueries = clauses.filter((c) => c.kind !== "identifier").map((c) => c.tsquery).filter(Boolean);
  const codes = [...new Set(clauses.flatMap((c) => c.codes))];
  const components = [...new Set(clauses.flatMap((c) => c.components))];
  const pairs = components.flatMap((p) => codes.map((code) => `${p}|${code}`));
  const terms: SQL[] = [sql`0`];
  if (withText && tsqueries.length) terms.push(sql`ts_rank(s.document, ${tsqueries.map((q) => `( ${q} )`).join(" | ")}::tsquery, 1)`);
  if (codes.length) terms.push(sql`0.25 * (s.damage_codes && ${param(codes)}::text[])::int`);
  if (pairs.length) terms.push(sql`0.25 * (s.finding_keys && ${param(pairs)}::text[])::int`);
  for (const c of clauses.filter((x) => x.kind === "identifier")) {
    terms.push(sql`(s.identifiers ILIKE ${identifierPatterns(c.text)[0]})::int`);
  }
  return sql.join(terms, sql` + `);
}

export type FacetKey = MultiFacet | "severity";

/** The column each facet counts by, on case_search rows under the given alias. */
export function facetColumn(f: FacetKey, alias: string): SQL {
  const column = { trigger: "trigger", cause: "primary_cause", class: "bearing_class", site: "site_id::text", status: "status", severity: "max_severity::text", code: "damage_codes", component: "components" }[f];
  return sql.raw(`${alias}.${column}`);
}

export const ARRAY_FACETS: FacetKey[] = ["code", "component"];
export const SCALAR_FACETS: FacetKey[] = ["trigger", "cause", "class", "site", "status", "severity"];

/** Each facet's filter on case_search rows under the alias; siteIds are the ids of the site codes asked for. */
export function facetFilters(p: SearchParams, siteIds: string[], alias = "s"): Partial<Record<FacetKey, SQL>> {
  const a = sql.raw(alias);
  const out: Partial<Record<FacetKey, SQL>> = {};
  if (p.trigger.length) out.trigger = sql`${a}.trigger = ANY(${param(p.trigger)}::text[])`;
  if (p.cause.length) out.cause = sql`${a}.primary_cause = ANY(${param(p.cause)}::text[])`;
  if (p.code.length) out.code = sql`${a}.damage_codes && ${param(p.code)}::text[]`;
  if (p.component.length) out.component = sql`${a}.components && ${param(p.component)}::text[]`;
  if (p.class.length) out.class = sql`${a}.bearing_class = ANY(${param(p.class)}::text[])`;
  if (p.site.length) out.site = sql`${a}.site_id = ANY(${param(siteIds)}::uuid[])`;
  if (p.status.length) out.status = sql`${a}.status = ANY(${param(p.status)}::text[])`;
  if (p.severity !== undefined) out.severity = sql`${a}.max_severity >= ${p.severity}`;
  return out;
}

export function orderSql(sort: SearchParams["sort"], ranked: boolean, alias = "s"): SQL {
  const a = sql.raw(alias);
  if (sort === "oldest") return sql`${a}.sort_on ASC, ${a}.created_at ASC`;
  if (sort === "severity") return sql`${a}.max_severity DESC, ${a}.sort_on DESC, ${a}.created_at DESC`;
  if (ranked) return sql`rank DESC, ${a}.sort_on DESC, ${a}.created_at DESC`;
  return sql`${a}.sort_on DESC, ${a}.created_at DESC`;
}
