// SQL pieces of a search over case_search: who may see what, what each clause matches,
// how matches rank, and the facet filters. Kept apart so each reads on its own.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { namesFinding } from "@/lib/search/parse-query";
import type { MultiFacet, SearchParams } from "@/lib/search/query-schema";
import { FIXED_ROWS } from "@/lib/search/structured-words";
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

/** Clauses answered by a case's own field (trigger, class) rather than by its words alone. */
export const isCaseField = (c: PreparedClause) => c.triggers.length > 0 || c.classes.length > 0;

/** Every word clause at once, answered by the narrative index (or only those given). */
export function documentQuery(clauses: readonly PreparedClause[]): string {
  return clauses
    .filter((c) => c.kind !== "identifier" && !isCaseField(c))
    .map(clauseTsquery)
    .filter(Boolean)
    .join(" & ");
}

/** A trigger or class clause: the case's field, or (where the narrative is at hand) its words. */
export function caseFieldSql(c: PreparedClause, withText: boolean): SQL {
  const field = c.triggers.length
    ? sql`s.trigger = ANY(${param(c.triggers)}::text[])`
    : sql`s.bearing_class = ANY(${param(c.classes)}::text[])`;
  return withText && c.tsquery ? sql`(${field} OR s.document @@ ${c.tsquery}::tsquery)` : field;
}

const EFFECTIVE_ROW = `coalesce(fi.row, CASE fi.component ${FIXED_ROWS.map((f) => `WHEN '${f.component}' THEN '${f.row}'`).join(" ")} END)`;

/**
 * Cases holding one finding that is everything the words name together: the part, the row
 * (recorded, or the part's own), the zone and the damage, as a set of case ids. Null when the
 * words name no finding. Joined to the searched rows once (a hash join), never tested per row
 * against an array: a part word alone ("cup") names most of the casebook.
 */
export function structuredFindingIds(clauses: readonly PreparedClause[]): SQL | null {
  const named = clauses.filter(namesFinding);
  if (named.length === 0) return null;
  const conditions = named.map((c) => {
    const either: SQL[] = [];
    if (c.codes.length) either.push(sql`fi.damage_code = ANY(${param(c.codes)}::text[])`);
    if (c.components.length) either.push(sql`fi.component = ANY(${param(c.components)}::text[])`);
    if (c.rows.length) either.push(sql`${sql.raw(EFFECTIVE_ROW)} = ANY(${param(c.rows)}::text[])`);
    if (c.zones.length) either.push(sql`fi.zone = ANY(${param(c.zones)}::text[])`);
    return sql`(${sql.join(either, sql` OR `)})`;
  });
  return sql`SELECT DISTINCT fi.case_id FROM findings fi WHERE ${sql.join(conditions, sql` AND `)}`;
}

/** The join that brings the structured set in as sf (sf.case_id is null for the other rows). */
export const STRUCTURED_HIT = sql.raw("(sf.case_id IS NOT NULL)");

/**
 * What the words ask of a case: every word clause in its text (or its codes and parts), or a
 * finding that is what the part, row, zone and damage words name together, with the other
 * words still in its text.
 */
export function wordMatchSql(clauses: readonly PreparedClause[]): { match: SQL | null; structured: SQL | null; join: SQL | null } {
  const all = documentQuery(clauses);
  const ids = structuredFindingIds(clauses);
  const textAll = all ? sql`s.document @@ ${all}::tsquery` : null;
  if (!ids) return { match: textAll, structured: null, join: null };
  const rest = documentQuery(clauses.filter((c) => !namesFinding(c)));
  const byFinding = rest ? sql`(${STRUCTURED_HIT} AND s.document @@ ${rest}::tsquery)` : STRUCTURED_HIT;
  return {
    match: textAll ? sql`(${textAll} OR ${byFinding})` : byFinding,
    structured: STRUCTURED_HIT,
    join: sql`LEFT JOIN (${ids}) sf ON sf.case_id = s.case_id`,
  };
}

/** A serial, car or case number in part; or the same token in the narrative ("1/16"). */
export function identifierSql(c: PreparedClause): SQL {
  const patterns = identifierPatterns(c.text);
  return sql`s.case_id IN (
    SELECT i.case_id FROM case_search i WHERE i.identifiers ILIKE ANY(${param(patterns)}::text[])
    ${c.tsquery ? sql`UNION SELECT d.case_id FROM case_search_text d WHERE d.document @@ ${c.tsquery}::tsquery` : sql``})`;
}

/**
 * Text relevance, plus a lift for coded findings the query names and for serial or car hits;
 * a case holding the very finding the words name (part, row, zone and damage together) first.
 */
export function rankSql(clauses: readonly PreparedClause[], withText: boolean, structured: SQL | null = null): SQL {
  const tsqueries = clauses
    .filter((c) => c.kind !== "identifier")
    .map((c) => c.tsquery)
    .filter(Boolean);
  const codes = [...new Set(clauses.flatMap((c) => c.codes))];
  const components = [...new Set(clauses.flatMap((c) => c.components))];
  const pairs = components.flatMap((p) => codes.map((code) => `${p}|${code}`));
  const terms: SQL[] = [sql`0`];
  if (structured) terms.push(sql`2 * ${structured}::int`);
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
  const column = {
    trigger: "trigger",
    cause: "primary_cause",
    class: "bearing_class",
    site: "site_id::text",
    status: "status",
    severity: "max_severity::text",
    code: "damage_codes",
    component: "components",
  }[f];
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
