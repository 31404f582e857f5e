// The Tallies WHERE clause over the yield roll-ups (db/schema/yield-cells.ts): the same reach and
// filters as tallyWhere over cases, on the roll-ups' own columns. Cells compare their month, which
// is exact because Tallies periods are whole months; keep calls their removal day.
import "server-only";
import { and, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import { keepGaps, sites, yieldAlarmCells, yieldCells } from "@/db/schema";
import { can } from "@/lib/auth/permissions";
import { periodBounds, type TallyFilters } from "@/lib/tallies/filters";
import { readableCases } from "../case-scope";
import type { TallyViewer } from "./scope";

type Cells = typeof yieldCells | typeof yieldAlarmCells | typeof keepGaps;

/** viewerScope on a roll-up: everyone else counts only readable cells at their own shop. */
function cellScope(t: Cells, viewer: TallyViewer): SQL | undefined {
  if (!can(viewer.role, "tallies:read")) return sql`false`;
  if (can(viewer.role, "tallies:read-all")) return undefined;
  return viewer.siteId ? and(readableCases(viewer, { createdBy: t.createdBy, siteId: t.siteId }), eq(t.siteId, viewer.siteId)) : sql`false`;
}

export function cellWhere(t: Cells, filters: TallyFilters, viewer: TallyViewer): SQL {
  const { start, endExclusive } = periodBounds(filters);
  const day = "month" in t ? t.month : t.removedOn;
  return (
    and(
      cellScope(t, viewer),
      start ? gte(day, start) : undefined,
      endExclusive ? lt(day, endExclusive) : undefined,
      filters.site ? sql`${t.siteId} = (select ${sites.id} from ${sites} where ${sites.code} = ${filters.site})` : undefined,
      filters.class ? eq(t.bearingClass, filters.class) : undefined,
      filters.trigger ? eq(t.trigger, filters.trigger) : undefined,
      "n" in t ? sql`${t.n} > 0` : undefined,
    ) ?? sql`true`
  );
}
