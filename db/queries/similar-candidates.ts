// Candidate retrieval for similar cases: earlier cases that share a finding, a damage code,
// a damage family on the same part, the root cause, or trigger and class together. A cheap
// score in SQL (overlap and containment of the finding sets, plus the scalar matches, with
// the weights of lib/similarity) keeps the best few hundred for the full score in Node.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import type { SimilarityCase } from "@/lib/similarity";
import { SIMILARITY_WEIGHTS as W } from "@/lib/similarity";
import type { SearchViewer } from "./search-sql";
import { readableIn } from "./case-scope";

export const CANDIDATE_LIMIT = 150;

export type TargetKeys = {
  readonly caseId: string;
  readonly sortOn: string;
  readonly createdAt: string;
  readonly trigger: string;
  readonly bearingClass: string;
  readonly primaryCause: string | null;
  readonly codes: string[];
  readonly findingKeys: string[];
  readonly familyKeys: string[];
};

export async function targetKeys(caseId: string): Promise<TargetKeys | null> {
  const { rows } = await db.execute<TargetKeys>(sql`
    SELECT case_id AS "caseId", sort_on::text AS "sortOn", created_at::text AS "createdAt", trigger, bearing_class AS "bearingClass",
      primary_cause AS "primaryCause", array_remove(damage_codes, 'none') AS codes, finding_keys AS "findingKeys", family_keys AS "familyKeys"
    FROM case_search WHERE case_id = ${caseId}::uuid`);
  return rows[0] ?? null;
}

/** Our own weights, written into the statement as numeric literals. */
const w = (x: number) => sql.raw(`${Number(x)}::real`);

/** Overlap, "has all of mine" and "has nothing else" of two key sets: a Jaccard stand-in for SQL. */
function setScore(column: string, keys: string[], weight: number): SQL {
  if (keys.length === 0) return sql`0`;
  const k = sql`${sql.param(keys)}::text[]`;
  const c = sql.raw(column);
  return sql`(${w(weight / 2)} * (${c} && ${k})::int + ${w(weight / 4)} * (${c} @> ${k})::int + ${w(weight / 4)} * (${c} <@ ${k} AND cardinality(${c}) > 0)::int)`;
}

/** Earlier cases the caller may read that share what `shares` asks, best cheap score first. */
async function scoredCandidates(t: TargetKeys, viewer: SearchViewer, shares: SQL[], limit: number, skip: string[] = []): Promise<string[]> {
  const cause = t.primaryCause && t.primaryCause !== "undetermined" ? t.primaryCause : null;
  const scope = readableIn(viewer, "s");
  const { rows } = await db.execute<{ id: string }>(sql`
    SELECT s.case_id AS id FROM case_search s
    WHERE s.case_id <> ALL(${sql.param([t.caseId, ...skip])}::uuid[])
      AND (s.sort_on < ${t.sortOn}::date OR (s.sort_on = ${t.sortOn}::date AND s.created_at < ${t.createdAt}::timestamptz))
      AND (${sql.join(shares, sql` OR `)})
      ${scope ? sql`AND ${scope}` : sql``}
    ORDER BY ${setScore("s.finding_keys", t.findingKeys, W.sameFinding)} + ${setScore("s.damage_codes", t.codes, W.sameCode)}
      + ${setScore("s.family_keys", t.familyKeys, W.sameFamily)}
      + ${cause ? sql`${w(W.sameCause)} * (s.primary_cause = ${cause})::int` : sql`0`}
      + ${w(W.sameTrigger)} * (s.trigger = ${t.trigger})::int + ${w(W.sameBearingClass)} * (s.bearing_class = ${t.bearingClass})::int DESC,
      s.sort_on DESC, s.created_at DESC
    LIMIT ${limit}`);
  return rows.map((r) => r.id);
}

/**
 * First the cases sharing a finding on the same part, the root cause, or trigger and class
 * together; only when those are too few, the wider net of a shared code or damage family
 * (a family such as "grease condition" is in most cases and would swamp the first net).
 */
export async function candidateIds(t: TargetKeys, viewer: SearchViewer, limit = CANDIDATE_LIMIT): Promise<string[]> {
  const cause = t.primaryCause && t.primaryCause !== "undetermined" ? t.primaryCause : null;
  const strong: SQL[] = [sql`(s.trigger = ${t.trigger} AND s.bearing_class = ${t.bearingClass})`];
  if (t.findingKeys.length) strong.push(sql`s.finding_keys && ${sql.param(t.findingKeys)}::text[]`);
  if (cause) strong.push(sql`s.primary_cause = ${cause}`);
  const first = await scoredCandidates(t, viewer, strong, limit);
  const wide: SQL[] = [];
  if (t.codes.length) wide.push(sql`s.damage_codes && ${sql.param(t.codes)}::text[]`);
  if (t.familyKeys.length) wide.push(sql`s.family_keys && ${sql.param(t.familyKeys)}::text[]`);
  if (first.length >= limit || wide.length === 0) return first;
  return [...first, ...(await scoredCandidates(t, viewer, wide, limit - first.length, first))];
}

type CaseText = { id: string; bearingClass: string; trigger: string; primaryCause: string | null; text: string };
type FindingRow = { caseId: string; component: string; damageCode: string; severity: number };

/** The cases in the shape lib/similarity scores: findings plus all narrative in one text. */
export async function similarityCases(ids: string[]): Promise<SimilarityCase[]> {
  if (ids.length === 0) return [];
  const idList = sql`${sql.param(ids)}::uuid[]`;
  const [cases, findings] = await Promise.all([
    db.execute<CaseText>(sql`
      SELECT c.id, c.bearing_class AS "bearingClass", c.trigger, c.primary_cause AS "primaryCause",
        concat_ws(' ', c.field_notes, c.teardown_notes, c.verdict_notes,
          (SELECT string_agg(f.notes, ' ') FROM findings f WHERE f.case_id = c.id)) AS text
      FROM cases c WHERE c.id = ANY(${idList})`),
    db.execute<FindingRow>(sql`
      SELECT case_id AS "caseId", component, damage_code AS "damageCode", severity FROM findings WHERE case_id = ANY(${idList})`),
  ]);
  const byCase = new Map<string, FindingRow[]>();
  for (const f of findings.rows) byCase.set(f.caseId, [...(byCase.get(f.caseId) ?? []), f]);
  return cases.rows.map((c) => ({ ...c, findings: byCase.get(c.id) ?? [] }));
}
