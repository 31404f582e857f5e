// What search needs to read a query and label its facets: the classification lists as
// stored (so codes and shop words an admin added count too) and the sites.
import "server-only";
import { asc } from "drizzle-orm";
import { db } from "@/db";
import { codeEntries, sites } from "@/db/schema";
import type { CodeSearchEntry } from "@/lib/classification/code-search";

export interface SearchLookups {
  readonly damageEntries: CodeSearchEntry[];
  readonly labels: { readonly trigger: Map<string, string>; readonly cause: Map<string, string>; readonly damage: Map<string, string> };
  readonly sites: { id: string; code: string; name: string }[];
}

export async function loadSearchLookups(): Promise<SearchLookups> {
  const [entries, siteRows] = await Promise.all([
    db
      .select({
        list: codeEntries.list,
        code: codeEntries.code,
        label: codeEntries.label,
        synonyms: codeEntries.synonyms,
        retiredAt: codeEntries.retiredAt,
      })
      .from(codeEntries)
      .orderBy(asc(codeEntries.list), asc(codeEntries.sortOrder)),
    db.select({ id: sites.id, code: sites.code, name: sites.name }).from(sites).orderBy(asc(sites.name)),
  ]);
  const labelsOf = (list: string) => new Map(entries.filter((e) => e.list === list).map((e) => [e.code, e.label]));
  return {
    // Retired codes stay searchable: old cases still carry them.
    damageEntries: entries
      .filter((e) => e.list === "damage")
      .map((e) => ({ code: e.code, label: e.label, synonyms: e.synonyms, retired: !!e.retiredAt })),
    labels: { trigger: labelsOf("trigger"), cause: labelsOf("cause"), damage: labelsOf("damage") },
    sites: siteRows,
  };
}
