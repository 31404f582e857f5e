import { weibullPlotY, type LifeUnit } from "./weibull-data";

export interface RankedFailure {
  time: number;
  /** Johnson's adjusted rank (mean order number); equals the plain rank without suspensions. */
  adjustedRank: number;
  /** Benard's median-rank estimate of F at this time. */
  medianRank: number;
}

/** Units sharing one life and outcome, with how many there are (as the database groups them). */
export type CountedUnit = LifeUnit & { count: number };

/** Benard's approximation to the median rank: (i - 0.3) / (n + 0.4). */
export function benardMedianRank(rank: number, n: number): number {
  return (rank - 0.3) / (n + 0.4);
}

/** Sort by time; at equal times failures come before suspensions (the usual convention). */
export function sortForRanking<T extends LifeUnit>(units: readonly T[]): T[] {
  return [...units].sort((a, b) => a.time - b.time || Number(b.failed) - Number(a.failed));
}

/**
 * Johnson's adjusted ranks for the failures among all units (suspensions included in n).
 * increment = (n + 1 - previous adjusted rank) / (1 + units at or after this one).
 */
export function johnsonAdjustedRanks(units: readonly LifeUnit[]): RankedFailure[] {
  return johnsonAdjustedRanksCounted(units.map((u) => ({ time: u.time, failed: u.failed, count: 1 })));
}

/** The same from counted units: sorting costs the distinct lives, not every unit. */
export function johnsonAdjustedRanksCounted(groups: readonly CountedUnit[]): RankedFailure[] {
  const out: RankedFailure[] = [];
  eachAdjustedRank(groups, (time, adjustedRank, medianRank) => out.push({ time, adjustedRank, medianRank }));
  return out;
}

/** Ranked failures with their Weibull-paper ordinate y = ln(-ln(1 - F)), built in the same pass. */
export function johnsonPlotPointsCounted(groups: readonly CountedUnit[]): PlottedFailure[] {
  const out: PlottedFailure[] = [];
  eachAdjustedRank(groups, (time, adjustedRank, medianRank) => out.push({ time, adjustedRank, medianRank, y: weibullPlotY(medianRank) }));
  return out;
}

export type PlottedFailure = RankedFailure & { y: number };

/** Calls `emit` for every failure in time order with its adjusted and median rank. */
export function eachAdjustedRank(
  groups: readonly CountedUnit[],
  emit: (time: number, adjustedRank: number, medianRank: number) => void,
): void {
  const sorted = sortForRanking(groups);
  const n = sorted.reduce((s, g) => s + g.count, 0);
  let previous = 0;
  let before = 0;
  for (const g of sorted) {
    if (g.failed) {
      // each failure of the group has its own place in the order
      for (let k = 0; k < g.count; k++) {
        const atOrAfter = n - before - k;
        previous += (n + 1 - previous) / (1 + atOrAfter);
        emit(g.time, previous, benardMedianRank(previous, n));
      }
    }
    before += g.count;
  }
}
