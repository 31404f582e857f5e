// Facet counts of a search, kept until any search row changes (the revision sequence moves)
// and for half a minute at most, so paging, re-sorting and the search page's first view do
// not count the casebook again. Keys hold everything that decides the counts, the caller's
// scope included; the page of hits itself is always read fresh.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";

export type FacetRow = { facet: string; value: string | null; n: number };

const MAX_ENTRIES = 200;
const MAX_AGE_MS = 30_000;

type Entry = { revision: string; at: number; rows: FacetRow[] };
const store = new Map<string, Entry>();

export async function searchRevision(): Promise<string> {
  const { rows } = await db.execute<{ v: string }>(sql`SELECT last_value::text || ':' || is_called::text AS v FROM case_search_revision`);
  return rows[0].v;
}

export function cachedFacets(key: string, revision: string): FacetRow[] | null {
  const hit = store.get(key);
  if (!hit || hit.revision !== revision || Date.now() - hit.at > MAX_AGE_MS) return null;
  // Least recently used goes first when the store is full.
  store.delete(key);
  store.set(key, hit);
  return hit.rows;
}

export function keepFacets(key: string, revision: string, rows: FacetRow[]): void {
  store.set(key, { revision, at: Date.now(), rows });
  while (store.size > MAX_ENTRIES) store.delete(store.keys().next().value!);
}
