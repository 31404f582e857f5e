// c-chart for counts per period (NIST/SEMATECH e-Handbook 6.3.3):
// centre c-bar, limits c-bar +/- 3 sqrt(c-bar), lower limit floored at 0.

export interface CChartPoint<T> {
  item: T;
  count: number;
  /** "above" beyond the upper limit, "below" beyond the lower one, null inside. */
  beyond: "above" | "below" | null;
}

export interface CChart<T> {
  centre: number;
  upperLimit: number;
  lowerLimit: number;
  points: CChartPoint<T>[];
}

export function cChart<T extends { count: number }>(periods: readonly T[]): CChart<T> {
  for (const p of periods) {
    if (!(Number.isFinite(p.count) && p.count >= 0)) throw new RangeError("Counts must be non-negative numbers.");
  }
  if (periods.length === 0) return { centre: 0, upperLimit: 0, lowerLimit: 0, points: [] };
  const centre = periods.reduce((s, p) => s + p.count, 0) / periods.length;
  const spread = 3 * Math.sqrt(centre);
  const upperLimit = centre + spread;
  const lowerLimit = Math.max(0, centre - spread);
  return {
    centre,
    upperLimit,
    lowerLimit,
    points: periods.map((item) => ({
      item,
      count: item.count,
      beyond: item.count > upperLimit ? "above" : item.count < lowerLimit ? "below" : null,
    })),
  };
}

/** Convenience for plain arrays of counts. */
export function cChartOfCounts(counts: readonly number[]): CChart<{ count: number; index: number }> {
  return cChart(counts.map((count, index) => ({ count, index })));
}
