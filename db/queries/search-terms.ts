// Readies parsed clauses for the database in one round trip: each clause's words become a
// tsquery (English stemming, as the index was built), and a plain word the casebook never
// uses is joined by its nearest known words ("spaling" → spalling, spalled), found by
// trigram similarity over the words the narratives do use.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import type { SearchClause } from "@/lib/search/parse-query";

export interface PreparedClause extends SearchClause {
  /** tsquery text, already normalised; "" when PostgreSQL found no lexeme in it. */
  readonly tsquery: string;
  /** Known words swapped in for a word the casebook never uses. */
  readonly corrections: readonly string[];
}

// Below this trigram similarity a "correction" is a different word, not a typo; and only
// words nearly as close as the closest are kept ("spaling" → spalling, not spacing).
const MIN_SIMILARITY = 0.3;
const NEAR_BEST = 0.1;
const MAX_CORRECTIONS = 3;

type Row = { i: number; base: string; corrections: string[]; similarities: number[]; alternatives: string[] };

export async function prepareClauses(clauses: readonly SearchClause[]): Promise<PreparedClause[]> {
  if (clauses.length === 0) return [];
  const texts = clauses.map((c) => c.searchText);
  const kinds = clauses.map((c) => c.kind);
  const correctable = clauses.map((c) => c.correctable);
  const { rows } = await db.execute<Row>(sql`
    SELECT c.i::int AS i,
      (CASE c.kind WHEN 'phrase' THEN phraseto_tsquery('english', c.text) ELSE plainto_tsquery('english', c.text) END)::text AS base,
      k.words AS corrections,
      ARRAY(SELECT similarity(w, c.text) FROM unnest(k.words) AS w) AS similarities,
      ARRAY(SELECT plainto_tsquery('english', w)::text FROM unnest(k.words) AS w) AS alternatives
    FROM unnest(${sql.param(texts)}::text[], ${sql.param(kinds)}::text[], ${sql.param(correctable)}::boolean[])
      WITH ORDINALITY AS c(text, kind, correctable, i)
    CROSS JOIN LATERAL (
      SELECT CASE WHEN c.correctable AND NOT EXISTS (SELECT 1 FROM search_words sw WHERE sw.word = c.text)
        THEN ARRAY(
          SELECT sw.word FROM search_words sw
          WHERE sw.word % c.text AND similarity(sw.word, c.text) >= ${MIN_SIMILARITY}
          ORDER BY similarity(sw.word, c.text) DESC, sw.word LIMIT ${MAX_CORRECTIONS + 2})
        ELSE '{}'::text[] END AS words
    ) k
    ORDER BY c.i`);
  return rows.map((r) => {
    const clause = clauses[r.i - 1];
    const best = r.similarities[0] ?? 0;
    const kept = r.corrections
      .map((word, k) => ({ word, sim: r.similarities[k], tsquery: r.alternatives[k] }))
      .filter((x) => x.sim >= best - NEAR_BEST)
      .slice(0, MAX_CORRECTIONS);
    const parts = [r.base, ...kept.map((x) => x.tsquery)].filter((q) => q.trim() !== "");
    const tsquery = parts.length > 1 ? parts.map((q) => `( ${q} )`).join(" | ") : (parts[0] ?? "");
    return {
      ...clause,
      tsquery,
      corrections: kept.map((x) => x.word),
      highlight: [...clause.highlight, ...kept.map((x) => x.word)],
    };
  });
}

/** Clauses that can still match something: PostgreSQL may drop a word as a stop word. */
export const usableClauses = (prepared: readonly PreparedClause[]) =>
  prepared.filter(
    (c) =>
      c.kind === "identifier" ||
      c.tsquery !== "" ||
      c.codes.length > 0 ||
      c.components.length > 0 ||
      c.triggers.length > 0 ||
      c.classes.length > 0,
  );
