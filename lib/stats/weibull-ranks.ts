import type { LifeUnit } from "./weibull-data";

export interface RankedFailure {
  time: number;
  /** Johnson's adjusted rank (mean order number); equals the plain rank without suspensions. */
  adjustedRank: number;
  /** Benard's median-rank estimate of F at this time. */
  medianRank: number;
}

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
  const sorted = sortForRanking(units);
  const n = sorted.length;
  const out: RankedFailure[] = [];
  let previous = 0;
  sorted.forEach((u, index) => {
    if (!u.failed) return;
    const atOrAfter = n - index;
    previous += (n + 1 - previous) / (1 + atOrAfter);
    out.push({ time: u.time, adjustedRank: previous, medianRank: benardMedianRank(previous, n) });
  });
  return out;
}
