// Facet counting in SQL. Unchosen facets are counted inside the result set m in one pass
// (grouping sets for single values, unnest for codes and parts); a chosen facet is counted
// over everything else asked, so more of its values can still be added.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { ARRAY_FACETS, SCALAR_FACETS, facetColumn, type FacetKey } from "./search-sql";

export type Filters = Partial<Record<FacetKey, SQL>>;
export const and = (parts: SQL[]) => (parts.length ? sql.join(parts, sql` AND `) : sql`true`);

/** Counts within the result set m of the single-valued facets nobody has chosen from, plus the total. */
export function passiveScalarFacetsSql(filters: Filters): SQL {
  const passive = SCALAR_FACETS.filter((f) => !filters[f]);
  const col = (f: FacetKey) => facetColumn(f, "m");
  const which = passive.map((f) => sql`WHEN GROUPING(${col(f)}) = 0 THEN ${f}`);
  const branches: SQL[] = [
    sql`
    SELECT ${passive.length ? sql`CASE ${sql.join(which, sql` `)} ELSE 'total' END` : sql`'total'`} AS facet,
      ${passive.length ? sql`COALESCE(${sql.join(passive.map(col), sql`, `)})` : sql`NULL::text`} AS value, count(*)::int AS n
    FROM m GROUP BY GROUPING SETS (${sql.join([...passive.map((f) => sql`(${col(f)})`), sql`()`], sql`, `)})`,
  ];
  return branches[0];
}

/** Counts within the result set m of the codes and parts, when nobody has chosen from them; null when both are chosen. */
export function passiveArrayFacetsSql(filters: Filters): SQL | null {
  const branches = ARRAY_FACETS.filter((f) => !filters[f]).map(
    (f) => sql`SELECT ${f} AS facet, v AS value, count(*)::int AS n FROM (SELECT unnest(${facetColumn(f, "m")}) AS v FROM m) x GROUP BY 2`,
  );
  return branches.length ? sql.join(branches, sql` UNION ALL `) : null;
}

const othersThan = (f: FacetKey, filters: Filters) =>
  and(
    Object.entries(filters)
      .filter(([k]) => k !== f)
      .map(([, v]) => v as SQL),
  );

/** Chosen facets, each counted over everything else asked: the single-valued ones in one pass, codes and parts apart. */
export function activeFacetsSql(from: SQL, base: SQL[], filters: Filters): SQL[] {
  const chosen = Object.keys(filters) as FacetKey[];
  const arrays = chosen
    .filter((f) => ARRAY_FACETS.includes(f))
    .map(
      (f) =>
        sql`SELECT ${f} AS facet, v AS value, count(*)::int AS n FROM (SELECT unnest(${facetColumn(f, "s")}) AS v FROM ${from} WHERE ${and([...base, othersThan(f, filters)])}) x GROUP BY 2`,
    );
  const scalars = chosen.filter((f) => SCALAR_FACETS.includes(f));
  if (scalars.length === 0) return arrays;
  // A row counts for facet f when it passes every filter but f's; one scan serves them all.
  const col = (f: FacetKey) => facetColumn(f, "s");
  const when = (pick: (f: FacetKey) => SQL) =>
    sql`CASE ${sql.join(
      scalars.map((f) => sql`WHEN GROUPING(${col(f)}) = 0 THEN ${pick(f)}`),
      sql` `,
    )} END`;
  const counted = sql`
    SELECT * FROM (
      SELECT ${when((f) => sql`${f}`)} AS facet, COALESCE(${sql.join(scalars.map(col), sql`, `)}) AS value,
        ${when((f) => sql`count(*) FILTER (WHERE ${othersThan(f, filters)})::int`)} AS n
      FROM ${from} WHERE ${and([
        ...base,
        sql`(${sql.join(
          scalars.map((f) => sql`(${othersThan(f, filters)})`),
          sql` OR `,
        )})`,
      ])}
      GROUP BY GROUPING SETS (${sql.join(
        scalars.map((f) => sql`(${col(f)})`),
        sql`, `,
      )})
    ) c WHERE c.n > 0`;
  return [counted, ...arrays];
}

/** Columns m needs for the single-valued counts and, with words, for the ranked page. */
export const M_COLUMNS = sql.raw(
  "s.case_id, s.status, s.trigger, s.primary_cause, s.bearing_class, s.site_id, s.max_severity, s.sort_on, s.created_at",
);
