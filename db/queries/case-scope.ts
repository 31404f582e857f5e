// The one rule for "which cases may this person read", as SQL. lib/cases/access.ts holds the same
// rule as a pure function for rows already in hand; tests/api/security/case-scope.test.ts keeps the two equal.
// Every read path (case, list, export, search, facets, similar, links, history, report, photos,
// home) filters through readableCases, so nothing fetches a case and checks afterwards; the tallies,
// which count only the viewer's own shop, ask canReadCase of a case at that shop (db/queries/tallies/scope.ts).
import "server-only";
import { and, inArray, or, sql, type SQL } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { can } from "@/lib/auth/permissions";

export type CaseViewer = { id: string; role: string; siteId: string | null };
type ScopeColumns = { createdBy: AnyPgColumn | SQL; siteId: AnyPgColumn | SQL };

/** The viewer's reach over any table with a case's created_by and site_id; undefined means every case. */
export function readableCases(
  viewer: CaseViewer,
  on: ScopeColumns = { createdBy: cases.createdBy, siteId: cases.siteId },
): SQL | undefined {
  if (can(viewer.role, "case:read-all")) return undefined;
  if (!can(viewer.role, "case:read")) return sql`false`;
  const own = sql`${on.createdBy} = ${viewer.id}`;
  return viewer.siteId ? or(own, sql`${on.siteId} = ${viewer.siteId}::uuid`) : own;
}

/** readableCases for raw SQL over an alias ("s" for case_search, "related" for a joined case). */
export function readableIn(viewer: CaseViewer, alias: string): SQL | undefined {
  const a = sql.raw(`"${alias.replace(/"/g, "")}"`);
  return readableCases(viewer, { createdBy: sql`${a}.created_by`, siteId: sql`${a}.site_id` });
}

/** Which of these case numbers the viewer may read (for history lines that name another case). */
export async function readableNumbers(numbers: string[], viewer: CaseViewer): Promise<Set<string>> {
  if (numbers.length === 0) return new Set();
  const rows = await db
    .select({ number: cases.number })
    .from(cases)
    .where(and(inArray(cases.number, numbers), readableCases(viewer)));
  return new Set(rows.map((r) => r.number));
}
