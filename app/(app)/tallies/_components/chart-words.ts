// The words and colours around the tally charts (legends, headlines), kept apart from the charts
// themselves so the page can show them while the charting code loads on its own (./charts.tsx).
import { causeColour, OUTCOME_COLOURS } from "@/components/charts/palette";
import { percent } from "@/lib/tallies/labels";
import type { CauseSiteTally, ParetoBar } from "@/lib/tallies/types";

export const TONE = { below: "#dc2626", above: "#047857", none: "#334155" } as const;

export const CONFIRMATION_LEGEND = [
  { label: "Confirmed share with 95% interval", colour: TONE.none },
  { label: "Interval wholly below all", colour: TONE.below },
  { label: "Interval wholly above all", colour: TONE.above },
  { label: "Rate over all (dashed)", colour: "#b45309" },
];

export const CONTROL_LEGEND = [
  { label: "Count per month", colour: "#b45309" },
  { label: "Centre line c̄", colour: "#64748b" },
  { label: "Control limits c̄ ± 3√c̄", colour: "#dc2626" },
  { label: "Month beyond a limit", colour: "#dc2626" },
];

export const TRIGGER_VERDICT_LEGEND = [
  { label: "Confirmed at teardown", colour: OUTCOME_COLOURS.confirmed },
  { label: "No defect found", colour: OUTCOME_COLOURS.noDefect },
  { label: "Outcome not recorded", colour: OUTCOME_COLOURS.notRecorded },
];

/** "The top 3 causes make up 71% of verdicts." */
export function paretoHeadline(rows: ParetoBar[]): string {
  if (rows.length === 0) return "";
  const k = Math.min(3, rows.length);
  return `The top ${k === 1 ? "cause" : `${k} causes`} make${k === 1 ? "s" : ""} up ${percent(rows[k - 1].cumulativeShare)} of signed verdicts.`;
}

export function causeLegend(tally: CauseSiteTally) {
  return tally.causes.map((c, j) => ({ label: c.label, colour: causeColour(c.code, j) }));
}
