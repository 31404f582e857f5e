// What the life section receives: quick fits for every cause, the chosen cause in full, and
// which fleet list (units still in service) went in as suspensions.
import type { LifeDetail, LifeMeasure, LifeSummary } from "./life";

/** Above this many units the likelihood-ratio bounds (hundreds of profile fits) would slow the page. */
export const LR_LIMIT = 2500;

export type FleetBatch = { batchId: string; uploadedAt: string; uploadedBy: string | null; units: number };

export type LifeData = {
  measure: LifeMeasure;
  causes: LifeSummary[];
  selected: LifeDetail | null;
  /** Signed removals in view without a service life in this measure (left out). */
  withoutLife: number;
  fleet: { batch: FleetBatch | null; used: number; why: string | null };
};
