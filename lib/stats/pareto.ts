export interface ParetoRow {
  label: string;
  count: number;
  /** Share of the total, 0..1 (0 when the total is 0). */
  share: number;
  /** Running share including this row, 0..1. */
  cumulativeShare: number;
}

/** Sorts counts largest first (ties by label, for a stable display) with cumulative shares. */
export function pareto(items: readonly { label: string; count: number }[]): ParetoRow[] {
  for (const it of items) {
    if (!(Number.isFinite(it.count) && it.count >= 0)) throw new RangeError("Counts must be non-negative numbers.");
  }
  const total = items.reduce((s, it) => s + it.count, 0);
  const sorted = [...items].sort((a, b) => b.count - a.count || a.label.localeCompare(b.label));
  let running = 0;
  return sorted.map((it, i) => {
    running += it.count;
    const isLast = i === sorted.length - 1;
    return {
      label: it.label,
      count: it.count,
      share: total > 0 ? it.count / total : 0,
      // the last row is exactly 1, not 0.9999999
      cumulativeShare: total > 0 ? (isLast ? 1 : running / total) : 0,
    };
  });
}
