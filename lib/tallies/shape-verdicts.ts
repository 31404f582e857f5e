// Sums over the signed-verdict cube: totals, Pareto of causes, trigger x verdict.
import { pareto, wilsonInterval } from "@/lib/stats";
import { triggerLabel } from "@/lib/classification/labels";
import { causeLabel } from "./labels";
import type { ParetoBar, Totals, TriggerVerdictRow, VerdictCell } from "./types";

export function sumBy<K>(cells: readonly VerdictCell[], keyOf: (c: VerdictCell) => K): Map<K, VerdictCell[]> {
  const out = new Map<K, VerdictCell[]>();
  for (const c of cells) {
    const k = keyOf(c);
    const list = out.get(k) ?? [];
    list.push(c);
    out.set(k, list);
  }
  return out;
}

const count = (cells: readonly VerdictCell[], pick: (c: VerdictCell) => boolean = () => true) =>
  cells.reduce((s, c) => s + (pick(c) ? c.count : 0), 0);

export function verdictTotals(cells: readonly VerdictCell[], removals: number): Totals {
  return {
    removals,
    signed: count(cells),
    confirmed: count(cells, (c) => c.outcome === "confirmed"),
    noDefect: count(cells, (c) => c.outcome === "no-defect"),
    outcomeNotRecorded: count(cells, (c) => c.outcome === null),
  };
}

/** Pareto of primary causes over signed verdicts (a verdict without a cause is its own bar). */
export function causePareto(cells: readonly VerdictCell[]): ParetoBar[] {
  const groups = sumBy(cells, (c) => c.cause);
  const items = [...groups].map(([code, list]) => ({ code: code ?? "", label: causeLabel(code), count: count(list) }));
  const byLabel = new Map(items.map((i) => [i.label, i.code]));
  return pareto(items).map((row) => ({ ...row, code: byLabel.get(row.label) ?? "" }));
}

/** For each trigger: how many teardowns confirmed it, found no defect, or did not say; largest first. */
export function triggerVerdictRows(cells: readonly VerdictCell[], confidence = 0.95): TriggerVerdictRow[] {
  const rows = [...sumBy(cells, (c) => c.trigger)].map(([trigger, list]) => {
    const confirmed = count(list, (c) => c.outcome === "confirmed");
    const noDefect = count(list, (c) => c.outcome === "no-defect");
    const notRecorded = count(list, (c) => c.outcome === null);
    return {
      trigger,
      label: triggerLabel(trigger),
      confirmed,
      noDefect,
      notRecorded,
      total: confirmed + noDefect + notRecorded,
      rate: wilsonInterval(confirmed, confirmed + noDefect, confidence),
    };
  });
  return rows.sort((a, b) => b.total - a.total || a.label.localeCompare(b.label));
}
