"use client";
// Every tally as a card: chart first, its numbers one click away, CSV and PNG downloads.
import { useState } from "react";
import { ChartCard } from "@/components/charts/chart-card";
import { ChartLegend } from "@/components/charts/legend";
import { DamageMap } from "@/components/damage-map/damage-map";
import { Select } from "@/components/ui/field";
import { monthLabel } from "@/lib/tallies/labels";
import {
  causeSiteTable,
  clustersTable,
  confirmationView,
  controlLimitsTable,
  damageTable,
  monthlyTable,
  paretoTable,
  triggerVerdictTable,
} from "@/lib/tallies/tables";
import type { TalliesData } from "@/lib/tallies/types";
import { CauseSiteChart, ConfirmationChart, ControlChart, ParetoChart, TriggerVerdictChart } from "./charts";
import { causeLegend, CONFIRMATION_LEGEND, CONTROL_LEGEND, paretoHeadline, TRIGGER_VERDICT_LEGEND } from "./chart-words";
import { CauseSiteFindings, CauseSiteTable } from "./cause-site-table";
import { ClusterControls, ClustersList } from "./clusters-list";
import { HeadlineTiles } from "./headline-tiles";

const SIGNED = "Signed verdicts only";

export function TalliesBoard({ data, scopeWords }: { data: TalliesData; scopeWords: string }) {
  const [seriesId, setSeriesId] = useState(data.monthly.series[0]?.id ?? "");
  const series = data.monthly.series.find((s) => s.id === seriesId) ?? data.monthly.series[0];
  const noVerdicts = data.totals.signed === 0 ? "No signed verdicts match these filters yet." : null;
  const beyond = series
    ? series.beyond.map((b, i) => (b ? `${monthLabel(data.monthly.months[i])} (${series.counts[i]}, ${b})` : null)).filter(Boolean)
    : [];
  const lowShops = data.byShop.rows.filter((r) => r.standsOut === "below");

  return (
    <>
      <HeadlineTiles data={data} />
      <div className="grid grid-cols-1 items-start gap-5 lg:grid-cols-2">
        <ChartCard
          title="Root causes"
          subtitle={`${SIGNED} · ${scopeWords}`}
          imageSubtitle={`${SIGNED} · ${scopeWords}`}
          table={paretoTable(data)}
          empty={noVerdicts}
          footer={paretoHeadline(data.pareto) || undefined}
        >
          <ParetoChart rows={data.pareto} />
        </ChartCard>

        <ChartCard
          title="Trigger and teardown verdict"
          subtitle={`How often each trigger's removals were confirmed · ${SIGNED}`}
          imageSubtitle={SIGNED}
          table={triggerVerdictTable(data)}
          legend={TRIGGER_VERDICT_LEGEND}
          empty={noVerdicts}
        >
          <TriggerVerdictChart rows={data.triggerVerdict} />
          <ChartLegend items={TRIGGER_VERDICT_LEGEND} />
        </ChartCard>

        <ChartCard
          title="Confirmed share by trigger"
          subtitle={`95% Wilson intervals, lowest first · ${SIGNED}`}
          imageSubtitle={`95% Wilson intervals · ${SIGNED}`}
          table={confirmationView(data.byTrigger, "Trigger")}
          legend={CONFIRMATION_LEGEND}
          empty={data.byTrigger.rows.length ? null : "No teardown outcomes recorded yet."}
        >
          <ConfirmationChart table={data.byTrigger} />
          <ChartLegend items={CONFIRMATION_LEGEND} />
        </ChartCard>

        <ChartCard
          title="Confirmed share by shop"
          subtitle={`Shops whose removals teardown confirms less often come first · ${SIGNED}`}
          imageSubtitle={`95% Wilson intervals · ${SIGNED}`}
          table={confirmationView(data.byShop, "Removal site")}
          legend={CONFIRMATION_LEGEND}
          empty={data.byShop.rows.length ? null : "No teardown outcomes recorded yet."}
          footer={
            lowShops.length ? (
              <p>
                <span className="font-semibold text-danger">Training signal:</span> {lowShops.map((s) => s.label).join(", ")}{" "}
                {lowShops.length === 1 ? "has" : "have"} a confirmed share clearly below the rest.
              </p>
            ) : data.byShop.rows.length > 1 ? (
              <p className="text-muted">No shop&rsquo;s confirmed share differs clearly from the others.</p>
            ) : undefined
          }
        >
          <ConfirmationChart table={data.byShop} nameWidth={170} />
        </ChartCard>

        <div className="lg:col-span-2">
          <ChartCard
            title="Monthly trend with control limits"
            subtitle={series?.id === "all-removals" ? "Every removal, at any stage" : `${SIGNED} · c-chart limits c̄ ± 3√c̄`}
            imageSubtitle={series ? `${series.label} · c-chart limits c̄ ± 3√c̄` : undefined}
            table={
              series
                ? {
                    columns: ["Month", "Count", "Beyond limits"],
                    rows: data.monthly.months.map((m, i) => [monthLabel(m), series.counts[i], series.beyond[i] ?? ""]),
                  }
                : monthlyTable(data)
            }
            legend={CONTROL_LEGEND}
            empty={data.monthly.months.length ? null : "No removals with a date match these filters."}
            controls={
              <label className="flex w-full items-center gap-2 text-sm text-ink-2 sm:w-auto">
                <span className="shrink-0">Series</span>
                <Select aria-label="Series" value={series?.id ?? ""} onChange={(e) => setSeriesId(e.target.value)} className="sm:w-72">
                  {data.monthly.series.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.label}
                    </option>
                  ))}
                </Select>
              </label>
            }
            footer={
              series ? (
                <>
                  {beyond.length ? (
                    <p>
                      <span className="font-semibold text-danger">Beyond the limits:</span> {beyond.join("; ")}.
                    </p>
                  ) : (
                    <p className="text-muted">Every complete month of this series lies within its control limits.</p>
                  )}
                  {data.monthly.partialMonth ? (
                    <p className="mt-1 text-xs text-muted">
                      {monthLabel(data.monthly.partialMonth)} is still in progress: drawn hollow, not counted in the limits.
                    </p>
                  ) : null}
                </>
              ) : undefined
            }
          >
            {series ? <ControlChart months={data.monthly.months} series={series} partialMonth={data.monthly.partialMonth} /> : null}
            <ChartLegend items={CONTROL_LEGEND} />
            <details className="mt-3 text-sm">
              <summary className="flex min-h-11 cursor-pointer items-center text-accent lg:min-h-0">
                All series: limits and months beyond
              </summary>
              <div className="mt-2 overflow-x-auto">
                <table className="w-full text-sm">
                  <tbody>
                    {controlLimitsTable(data).rows.map((r) => (
                      <tr key={String(r[0])} className="border-b border-line">
                        <th scope="row" className="py-1 pr-3 text-left font-medium text-ink">
                          {r[0]}
                        </th>
                        <td className="py-1 text-right text-ink-2 tabular">c̄ {r[1]}</td>
                        <td className="py-1 text-right text-ink-2 tabular">UCL {r[3]}</td>
                        <td className={`py-1 text-right tabular ${Number(r[4]) ? "font-semibold text-danger" : "text-muted"}`}>
                          {r[4]} beyond
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            </details>
          </ChartCard>
        </div>

        <div className="lg:col-span-2">
          <ChartCard
            title="Causes by site"
            subtitle={`Each site's mix of root causes; test of independence · ${SIGNED}`}
            imageSubtitle={`Share of each site's signed verdicts by root cause`}
            table={causeSiteTable(data)}
            tableView={<CauseSiteTable tally={data.causeSite} />}
            legend={causeLegend(data.causeSite)}
            empty={data.causeSite.sites.length ? null : "No signed verdicts with a removal site match these filters."}
            footer={<CauseSiteFindings tally={data.causeSite} />}
          >
            <CauseSiteChart tally={data.causeSite} />
            <ChartLegend items={causeLegend(data.causeSite)} />
          </ChartCard>
        </div>

        <ChartCard
          id="recurrence"
          title="Recurring causes"
          subtitle={`Same cause, same place, close in time · ${SIGNED}`}
          table={clustersTable(data)}
          controls={<ClusterControls tally={data.clusters} />}
          empty={null}
          noImage
          chartLabel="List"
        >
          <ClustersList tally={data.clusters} />
        </ChartCard>

        <ChartCard
          title="Where damage sits"
          subtitle={`${data.damage.placed.toLocaleString("en-US")} findings on the raceways of ${data.totals.signed.toLocaleString("en-US")} cases · ${SIGNED}`}
          imageSubtitle={`${data.damage.placed} findings summed over ${data.totals.signed} cases`}
          table={damageTable(data)}
          empty={data.damage.placed ? null : "No findings with a clock position on the cup or cones match these filters."}
        >
          <DamageMap
            title="Damage over the filtered cases"
            sectors={data.damage.sectors}
            sectorDeg={data.damage.sectorDeg}
            caption="Findings on rollers, cages, seals and other parts, or without a clock position, are not drawn."
          />
        </ChartCard>
      </div>
    </>
  );
}
