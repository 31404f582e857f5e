"use client";
// The tally charts, each loaded on its own when first drawn (next/dynamic): the charting library
// never weighs on a page's first load, and pages without charts never fetch it at all.
import dynamic from "next/dynamic";

/** The space a chart takes while its code loads, so the page does not jump. */
export const chartPlaceholder = (height: number) =>
  function ChartLoading() {
    return <div style={{ height }} className="w-full animate-pulse rounded-md bg-slate-100/70" aria-hidden="true" />;
  };

export const ParetoChart = dynamic(() => import("./pareto-chart").then((m) => m.ParetoChart), {
  ssr: false,
  loading: chartPlaceholder(340),
});
export const TriggerVerdictChart = dynamic(() => import("./trigger-verdict-chart").then((m) => m.TriggerVerdictChart), {
  ssr: false,
  loading: chartPlaceholder(200),
});
export const ConfirmationChart = dynamic(() => import("./confirmation-chart").then((m) => m.ConfirmationChart), {
  ssr: false,
  loading: chartPlaceholder(200),
});
export const ControlChart = dynamic(() => import("./control-chart").then((m) => m.ControlChart), {
  ssr: false,
  loading: chartPlaceholder(300),
});
export const CauseSiteChart = dynamic(() => import("./cause-site-chart").then((m) => m.CauseSiteChart), {
  ssr: false,
  loading: chartPlaceholder(200),
});
