// What the case service needs to know about codes and sites a save names: do they exist, are they current.
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { codeEntries, sites, type CodeListName } from "@/db/schema";

/** code -> retired? for the given codes of one list; a code missing from the map is not in the list. */
export async function codeStates(list: CodeListName, codes: string[]): Promise<Map<string, boolean>> {
  if (codes.length === 0) return new Map();
  const rows = await db
    .select({ code: codeEntries.code, retiredAt: codeEntries.retiredAt })
    .from(codeEntries)
    .where(and(eq(codeEntries.list, list), inArray(codeEntries.code, codes)));
  return new Map(rows.map((r) => [r.code, r.retiredAt !== null]));
}

/** id -> kind for the given site ids that exist. */
export async function siteKinds(ids: string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await db.select({ id: sites.id, kind: sites.kind }).from(sites).where(inArray(sites.id, ids));
  return new Map(rows.map((r) => [r.id, r.kind]));
}
