// Everything the tallies page shows for one set of filters: a handful of GROUP BY queries run
// side by side, then shaped by the pure functions in lib/tallies.
import "server-only";
import { recurringClusters } from "@/db/queries/tallies/clusters";
import { tallyCounts } from "@/db/queries/tallies/counts";
import { damageSectors } from "@/db/queries/tallies/damage-sectors";
import { allSites } from "@/db/queries/tallies/sites";
import { triggerLabel } from "@/lib/classification/labels";
import { causeLabel } from "./labels";
import type { TallyFilters } from "./filters";
import { confirmationTable } from "./shape-confirmation";
import { causeSiteTally } from "./shape-cause-site";
import { monthlyTally } from "./shape-monthly";
import { causePareto, triggerVerdictRows, verdictTotals } from "./shape-verdicts";
import { viewerSiteLimit, type TallyViewer } from "./site-limit";
import type { SiteInfo, TalliesData } from "./types";

/** Every site by id and code, for chart labels and the filter bar. */
export async function tallySites(): Promise<SiteInfo[]> {
  return allSites();
}

export async function loadTallies(filters: TallyFilters, viewer: TallyViewer): Promise<TalliesData> {
  const [{ cube, months }, clusters, damage, sites] = await Promise.all([
    tallyCounts(filters, viewer),
    recurringClusters(filters, viewer),
    damageSectors(filters, viewer),
    allSites(),
  ]);
  const siteById = new Map(sites.map((s) => [s.id, s]));
  const siteLabel = (id: string) => siteById.get(id)?.name ?? "Unknown site";
  const limit = viewerSiteLimit(viewer);
  const limitedTo = limit.limited && limit.siteId ? siteById.get(limit.siteId) : undefined;
  const removals = months.reduce((s, m) => s + m.count, 0);

  return {
    filters,
    siteLimit: limit.limited ? { code: limitedTo?.code ?? "", name: limitedTo?.name ?? "No home site" } : null,
    generatedAt: new Date().toISOString(),
    totals: verdictTotals(cube, removals),
    pareto: causePareto(cube),
    triggerVerdict: triggerVerdictRows(cube),
    byTrigger: confirmationTable(cube, (c) => c.trigger, triggerLabel),
    byShop: confirmationTable(cube, (c) => c.siteId, siteLabel),
    monthly: monthlyTally(months, filters.from, filters.to, new Date().toISOString().slice(0, 7)),
    causeSite: causeSiteTally(cube, siteLabel),
    clusters: {
      keyKind: filters.cluster,
      windowDays: filters.window,
      minSize: clusters.minSize,
      total: clusters.rows[0]?.total ?? 0,
      items: clusters.rows.map(({ total: _total, ...r }) => ({
        ...r,
        keyLabel: filters.cluster === "site" ? siteLabel(r.key) : filters.cluster === "lot" ? `Lot ${r.key}` : r.key,
        causeLabel: causeLabel(r.cause),
      })),
    },
    damage,
  };
}
