// Months on one axis (gaps filled with zero) and a c-chart for all removals and for each cause.
import { cChart } from "@/lib/stats/c-chart";
import { monthRange } from "./filter-query";
import { causeLabel } from "./labels";
import type { ControlSeries, MonthCell, MonthlyTally } from "./types";

export { outOfControl } from "./read-outs";

export const ALL_REMOVALS = "all-removals";
export const ALL_SIGNED = "all-signed";

function series(id: string, label: string, months: string[], countOf: (m: string) => number, partial: number): ControlSeries {
  const counts = months.map(countOf);
  // A month still in progress is drawn but neither sets the limits nor is judged against them.
  const chart = cChart(counts.map((count, index) => ({ count, index })).filter((p) => p.index !== partial));
  const beyond: ControlSeries["beyond"] = counts.map(() => null);
  for (const p of chart.points) beyond[p.item.index] = p.beyond;
  return { id, label, counts, centre: chart.centre, upperLimit: chart.upperLimit, lowerLimit: chart.lowerLimit, beyond };
}

/**
 * `first`/`last` bound the axis (the filter's period); without them it runs from the first to the
 * last month with a removal. `inProgress` names the current month, which is not yet complete.
 * Causes are ordered by their total, largest first.
 */
export function monthlyTally(cells: readonly MonthCell[], first?: string, last?: string, inProgress?: string): MonthlyTally {
  const seen = cells
    .filter((c) => c.count > 0)
    .map((c) => c.month)
    .sort();
  const start = first ?? seen[0];
  const end = last ?? seen[seen.length - 1];
  if (!start || !end) return { months: [], series: [], partialMonth: null };
  const months = monthRange(start, end);
  const partial = inProgress ? months.indexOf(inProgress) : -1;

  const all = new Map<string, number>();
  const signed = new Map<string, number>();
  const byCause = new Map<string, Map<string, number>>();
  for (const c of cells) {
    all.set(c.month, (all.get(c.month) ?? 0) + c.count);
    if (!c.signed) continue;
    signed.set(c.month, (signed.get(c.month) ?? 0) + c.count);
    const key = c.cause ?? "";
    const m = byCause.get(key) ?? new Map<string, number>();
    m.set(c.month, (m.get(c.month) ?? 0) + c.count);
    byCause.set(key, m);
  }
  const causeTotals = [...byCause].map(([code, m]) => ({ code, m, total: months.reduce((s, mo) => s + (m.get(mo) ?? 0), 0) }));
  causeTotals.sort((a, b) => b.total - a.total || a.code.localeCompare(b.code));

  return {
    months,
    partialMonth: partial >= 0 ? months[partial] : null,
    series: [
      series(ALL_REMOVALS, "All removals (every stage)", months, (m) => all.get(m) ?? 0, partial),
      series(ALL_SIGNED, "All signed verdicts", months, (m) => signed.get(m) ?? 0, partial),
      ...causeTotals
        .filter((c) => c.total > 0)
        .map((c) => series(c.code, causeLabel(c.code || null), months, (m) => c.m.get(m) ?? 0, partial)),
    ],
  };
}
