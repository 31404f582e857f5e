"use client";
// The yield charts, each loaded on its own when first drawn (next/dynamic), as the other tallies'
// charts are (../../_components/charts.tsx): the charting library never weighs on the first load.
import dynamic from "next/dynamic";
import { chartPlaceholder } from "../../_components/charts";

export const ReadingCurveChart = dynamic(() => import("./reading-curve-chart").then((m) => m.ReadingCurveChart), {
  ssr: false,
  loading: chartPlaceholder(300),
});
export const FunnelChart = dynamic(() => import("./funnel-chart").then((m) => m.FunnelChart), {
  ssr: false,
  loading: chartPlaceholder(300),
});
export const QuarterChart = dynamic(() => import("./quarter-chart").then((m) => m.QuarterChart), {
  ssr: false,
  loading: chartPlaceholder(260),
});
export const MissedChart = dynamic(() => import("./bar-charts").then((m) => m.MissedChart), { ssr: false, loading: chartPlaceholder(240) });
export const CostChart = dynamic(() => import("./bar-charts").then((m) => m.CostChart), { ssr: false, loading: chartPlaceholder(240) });
