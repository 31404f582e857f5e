// The WHERE clause every tally shares: the viewer's reach first, then the chosen filters.
// Inspectors count only the cases they may read, whatever filters they send.
import "server-only";
import { and, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import { cases, sites } from "@/db/schema";
import { can } from "@/lib/auth/permissions";
import { readableCases } from "../case-scope";
import { periodBounds, type TallyFilters } from "@/lib/tallies/filters";
import type { TallyViewer } from "@/lib/tallies/site-limit";

export type { TallyViewer };

export function viewerScope(viewer: TallyViewer): SQL | undefined {
  if (!can(viewer.role, "tallies:read")) return sql`false`;
  if (can(viewer.role, "tallies:read-all")) return undefined;
  // Everyone else counts within the one read rule, and only their own shop: a tally is labelled
  // with that shop, so a case they filed elsewhere is readable but not counted. No home shop, nothing.
  return viewer.siteId ? and(readableCases(viewer), eq(cases.siteId, viewer.siteId)) : sql`false`;
}

export type ScopeOptions = { signedOnly?: boolean; ignorePeriod?: boolean };

export function tallyWhere(filters: TallyFilters, viewer: TallyViewer, opts: ScopeOptions = {}): SQL {
  const parts: (SQL | undefined)[] = [viewerScope(viewer)];
  if (opts.signedOnly) parts.push(eq(cases.status, "signed"));
  if (!opts.ignorePeriod) {
    const { start, endExclusive } = periodBounds(filters);
    if (start) parts.push(gte(cases.removedOn, start));
    if (endExclusive) parts.push(lt(cases.removedOn, endExclusive));
  }
  if (filters.site) parts.push(sql`${cases.siteId} = (select ${sites.id} from ${sites} where ${sites.code} = ${filters.site})`);
  if (filters.class) parts.push(eq(cases.bearingClass, filters.class));
  if (filters.trigger) parts.push(eq(cases.trigger, filters.trigger));
  return and(...parts) ?? sql`true`;
}
