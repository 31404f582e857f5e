// Share of removals that teardown confirmed, per group, with Wilson intervals; lowest first,
// so a group whose calls are often not confirmed (a training signal) heads the list.
import { wilsonInterval } from "@/lib/stats";
import { sumBy } from "./shape-verdicts";
import type { ConfirmationRow, ConfirmationTable, VerdictCell } from "./types";

export function confirmationTable(
  cells: readonly VerdictCell[],
  groupOf: (c: VerdictCell) => string | null,
  labelOf: (id: string) => string,
  confidence = 0.95,
): ConfirmationTable {
  const recorded = cells.filter((c) => c.outcome !== null);
  const confirmedAll = recorded.reduce((s, c) => s + (c.outcome === "confirmed" ? c.count : 0), 0);
  const nAll = recorded.reduce((s, c) => s + c.count, 0);
  const overall = { ...wilsonInterval(confirmedAll, nAll, confidence), confirmed: confirmedAll, n: nAll };

  const rows: ConfirmationRow[] = [];
  for (const [id, list] of sumBy(recorded, groupOf)) {
    if (id === null) continue;
    const confirmed = list.reduce((s, c) => s + (c.outcome === "confirmed" ? c.count : 0), 0);
    const n = list.reduce((s, c) => s + c.count, 0);
    const rate = wilsonInterval(confirmed, n, confidence);
    const p = overall.p;
    const standsOut = p === null ? null : rate.upper < p ? "below" : rate.lower > p ? "above" : null;
    rows.push({ id, label: labelOf(id), confirmed, n, rate, standsOut });
  }
  rows.sort((a, b) => (a.rate.p ?? 1) - (b.rate.p ?? 1) || a.rate.upper - b.rate.upper || a.label.localeCompare(b.label));
  return { overall, rows };
}
