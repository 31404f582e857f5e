// The life section's data: a quick fit for every cause and the full analysis for the chosen one.
import "server-only";
import { analyseCause, countedFromTotals, NOT_A_FAILURE, summariseTotals, type LifeMeasure } from "./life";
import type { TallyFilters } from "./filters";
import type { LifeData } from "./life-data";
import { causeLives, fleetCounts, latestFleetBatch, lifeTotals } from "@/db/queries/tallies/life-counts";
import { viewerSiteLimit, type TallyViewer } from "./site-limit";

export async function loadLife(filters: TallyFilters, viewer: TallyViewer, measure: LifeMeasure, cause?: string): Promise<LifeData> {
  const [totals, batch] = await Promise.all([lifeTotals(filters, viewer, measure, cause, [...NOT_A_FAILURE]), latestFleetBatch()]);
  // Fleet survivors belong to the whole fleet: adding them to one site's removals would bias the fit.
  const siteBound = Boolean(filters.site) || viewerSiteLimit(viewer).limited;
  const fleet = batch && !siteBound ? await fleetCounts(batch.batchId, measure, filters.class) : [];
  const used = fleet.reduce((s, f) => s + f.count, 0);
  const why = !batch
    ? "No fleet list uploaded yet."
    : siteBound
      ? "Fleet list not used while one site is in view: it covers the whole fleet."
      : null;

  // Every cause from the counts; the chosen one also gets its plot, ranks and bounds.
  const causes = summariseTotals(totals, fleet, 0.95, measure);
  const chosen = cause && causes.some((c) => c.cause === cause) ? cause : causes.find((c) => c.fit)?.cause;
  // The counts came with the lives of the cause the database expected to be chosen; rarely another.
  const own = !chosen ? null : totals.own?.cause === chosen ? totals.own.times : await causeLives(filters, viewer, measure, chosen);
  const selected =
    chosen && own
      ? analyseCause(chosen, countedFromTotals(own, totals.byTime, fleet), {
          unit: measure,
          summary: causes.find((c) => c.cause === chosen),
        })
      : null;
  return { measure, causes, selected, withoutLife: totals.withoutLife, fleet: { batch, used, why } };
}
