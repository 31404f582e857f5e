// SQL pieces of a search over case_search: who may see what, what each clause matches,
// how matches rank, and the facet filters. Kept apart so each reads on its own.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { can } from "@/lib/auth/permissions";
import type { MultiFacet, SearchParams } from "@/lib/search/query-schema";
import type { PreparedClause } from "./search-terms";

export type SearchViewer = { id: string; role: string; siteId: string | null };

const param = (v: unknown) => sql.param(v);
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** canReadCase as SQL: inspectors see their shop's cases and the ones they filed. */
export function scopeSql(viewer: SearchViewer, alias = "s"): SQL | null {
  const a = sql.raw(alias);
  if (can(viewer.role, "case:read-all")) return null;
  if (!can(viewer.role, "case:read")) return sql`false`;
  return viewer.siteId
    ? sql`(${a}.created_by = ${viewer.id} OR ${a}.site_id = ${param(viewer.siteId)}::uuid)`
    : sql`${a}.created_by = ${viewer.id}`;
}

/** "SRRX204518" is also tried as "SRRX 204518", the way marks and numbers are stored. */
function identifierPatterns(text: string): string[] {
  const split = text.match(/^([A-Za-z]{2,5})(\d{2,})$/);
  return [text, ...(split ? [`${split[1]} ${split[2]}`] : [])].map((p) => `%${likeEscape(p)}%`);
}

export function clauseSql(c: PreparedClause): SQL {
  const parts: SQL[] = [];
  if (c.kind === "identifier") {
    for (const p of identifierPatterns(c.text)) parts.push(sql`s.identifiers ILIKE ${p}`);
    parts.push(sql`${c.text} <% s.identifiers`);
  }
  if (c.tsquery) parts.push(sql`s.document @@ ${c.tsquery}::tsquery`);
  if (c.codes.length) parts.push(sql`s.damage_codes && ${param(c.codes)}::text[]`);
  if (c.components.length) parts.push(sql`s.components && ${param(c.components)}::text[]`);
  return sql`(${sql.join(parts, sql` OR `)})`;
}

/** Text relevance, plus a lift for coded findings the query names and for serial or car hits. */
export function rankSql(clauses: readonly PreparedClause[]): SQL {
  const tsqueries = clauses.map((c) => c.tsquery).filter(Boolean);
  const codes = [...new Set(clauses.flatMap((c) => c.codes))];
  const components = [...new Set(clauses.flatMap((c) => c.components))];
  const pairs = components.flatMap((p) => codes.map((code) => `${p}|${code}`));
  const terms: SQL[] = [sql`0`];
  if (tsqueries.length) terms.push(sql`ts_rank(s.document, ${tsqueries.map((q) => `( ${q} )`).join(" | ")}::tsquery, 1)`);
  if (codes.length) terms.push(sql`0.25 * (s.damage_codes && ${param(codes)}::text[])::int`);
  if (pairs.length) terms.push(sql`0.25 * (s.finding_keys && ${param(pairs)}::text[])::int`);
  for (const c of clauses.filter((x) => x.kind === "identifier")) {
    terms.push(sql`CASE WHEN s.identifiers ILIKE ${identifierPatterns(c.text)[0]} THEN 1 ELSE word_similarity(${c.text}, s.identifiers) END`);
  }
  return sql.join(terms, sql` + `);
}

export type FacetKey = MultiFacet | "severity";

/** Each facet's filter on the matched set m; siteIds are the ids of the site codes asked for. */
export function facetFilters(p: SearchParams, siteIds: string[]): Partial<Record<FacetKey, SQL>> {
  const out: Partial<Record<FacetKey, SQL>> = {};
  if (p.trigger.length) out.trigger = sql`m.trigger = ANY(${param(p.trigger)}::text[])`;
  if (p.cause.length) out.cause = sql`m.primary_cause = ANY(${param(p.cause)}::text[])`;
  if (p.code.length) out.code = sql`m.damage_codes && ${param(p.code)}::text[]`;
  if (p.component.length) out.component = sql`m.components && ${param(p.component)}::text[]`;
  if (p.class.length) out.class = sql`m.bearing_class = ANY(${param(p.class)}::text[])`;
  if (p.site.length) out.site = sql`m.site_id = ANY(${param(siteIds)}::uuid[])`;
  if (p.status.length) out.status = sql`m.status = ANY(${param(p.status)}::text[])`;
  if (p.severity !== undefined) out.severity = sql`m.max_severity >= ${p.severity}`;
  return out;
}

export function whereAll(filters: Partial<Record<FacetKey, SQL>>, except?: FacetKey): SQL {
  const parts = Object.entries(filters).filter(([k]) => k !== except).map(([, v]) => v as SQL);
  return parts.length ? sql.join(parts, sql` AND `) : sql`true`;
}

export function orderSql(sort: SearchParams["sort"], hasText: boolean): SQL {
  if (sort === "oldest") return sql`m.sort_on ASC, m.created_at ASC`;
  if (sort === "severity") return sql`m.max_severity DESC, m.sort_on DESC, m.created_at DESC`;
  if (sort === "relevance" && hasText) return sql`m.rank DESC, m.sort_on DESC, m.created_at DESC`;
  return sql`m.sort_on DESC, m.created_at DESC`;
}
