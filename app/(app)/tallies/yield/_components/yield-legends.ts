// The yield charts' colours and legends, apart from the charts so the board can draw a legend (and
// offer its image download) without loading the charting library before a chart is drawn.
import { OUTCOME_COLOURS } from "@/components/charts/palette";
import type { YieldData } from "@/lib/tallies/yield-data";

export const SHOP_COLOURS = ["#0f766e", "#b45309", "#4f46e5", "#db2777", "#0284c7", "#65a30d"];
export const FUNNEL_TONE = { low: "#dc2626", high: "#047857", inside: "#334155" } as const;
export const READING_TONE = { curve: "#0f766e", band: "#99f6e4", bins: "#334155" } as const;

export const missedLegend = (window: number) => [
  { label: `Keep call, not removed again within ${window} days`, colour: "#94a3b8" },
  { label: `Keep call, same car and position removed within ${window} days`, colour: OUTCOME_COLOURS.noDefect },
];

export const FUNNEL_LEGEND = [
  { label: "Detector within the limits", colour: FUNNEL_TONE.inside },
  { label: "Confirmed less often than the fleet", colour: FUNNEL_TONE.low },
  { label: "Confirmed more often", colour: FUNNEL_TONE.high },
  { label: "95% limits (dashed), 99.8% limits", colour: "#64748b" },
  { label: "Fleet rate (dashed)", colour: "#b45309" },
];

export const quarterLegend = (calls: YieldData["calls"]) =>
  calls.quarters.map((s, i) => ({ label: s.label, colour: SHOP_COLOURS[i % SHOP_COLOURS.length] }));

export const READING_LEGEND = [
  { label: "Confirmed share per band, 95% Wilson interval", colour: READING_TONE.bins },
  { label: "Fitted logistic curve", colour: READING_TONE.curve },
  { label: "95% band of the curve", colour: READING_TONE.band },
];
