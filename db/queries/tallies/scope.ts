// The WHERE clause every tally shares: the viewer's reach first, then the chosen filters.
// Inspectors count only the cases they may read, whatever filters they send.
import "server-only";
import { and, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { cases, sites, tallyCells } from "@/db/schema";
import { can } from "@/lib/auth/permissions";
import { canReadCase } from "@/lib/cases/access";
import { periodBounds, type TallyFilters } from "@/lib/tallies/filters";
import type { TallyViewer } from "@/lib/tallies/site-limit";

export type { TallyViewer };

/** The columns a tally filters on: the cases' own, or a roll-up's (whose day is the first of its month). */
type TallyColumns = { siteId: AnyPgColumn; day: AnyPgColumn; bearingClass: AnyPgColumn; trigger: AnyPgColumn };
const CASE_COLUMNS: TallyColumns = { siteId: cases.siteId, day: cases.removedOn, bearingClass: cases.bearingClass, trigger: cases.trigger };
const CELL_COLUMNS: TallyColumns = {
  siteId: tallyCells.siteId,
  day: tallyCells.month,
  bearingClass: tallyCells.bearingClass,
  trigger: tallyCells.trigger,
};

/**
 * Everyone else counts within the one read rule, and only their own shop: a tally is labelled with
 * that shop, so a case they filed elsewhere is readable but not counted. Within their own shop the
 * rule reads every case or none (canReadCase of a case at that shop), so the reach is one equality
 * on the site, which the planner can estimate and serve from an index. No home shop, nothing.
 */
export function viewerScope(viewer: TallyViewer, siteId: AnyPgColumn = cases.siteId): SQL | undefined {
  if (!can(viewer.role, "tallies:read")) return sql`false`;
  if (can(viewer.role, "tallies:read-all")) return undefined;
  if (!viewer.siteId || !canReadCase(viewer, { createdBy: null, siteId: viewer.siteId })) return sql`false`;
  return sql`${siteId} = ${viewer.siteId}::uuid`;
}

export type ScopeOptions = { signedOnly?: boolean; ignorePeriod?: boolean };

function whereOn(on: TallyColumns, filters: TallyFilters, viewer: TallyViewer, opts: ScopeOptions, signed?: SQL): SQL {
  const parts: (SQL | undefined)[] = [viewerScope(viewer, on.siteId)];
  if (opts.signedOnly) parts.push(signed);
  if (!opts.ignorePeriod) {
    // periods are whole months, so a roll-up's month compares exactly as the removal day does
    const { start, endExclusive } = periodBounds(filters);
    if (start) parts.push(gte(on.day, start));
    if (endExclusive) parts.push(lt(on.day, endExclusive));
  }
  if (filters.site) parts.push(sql`${on.siteId} = (select ${sites.id} from ${sites} where ${sites.code} = ${filters.site})`);
  if (filters.class) parts.push(eq(on.bearingClass, filters.class));
  if (filters.trigger) parts.push(eq(on.trigger, filters.trigger));
  return and(...parts) ?? sql`true`;
}

export function tallyWhere(filters: TallyFilters, viewer: TallyViewer, opts: ScopeOptions = {}): SQL {
  return whereOn(CASE_COLUMNS, filters, viewer, opts, eq(cases.status, "signed"));
}

/** tallyWhere over tally_cells (cells that net to no case left out). */
export function tallyCellWhere(filters: TallyFilters, viewer: TallyViewer, opts: ScopeOptions = {}): SQL {
  return sql`${whereOn(CELL_COLUMNS, filters, viewer, opts, eq(tallyCells.signed, true))} and ${tallyCells.n} > 0`;
}
