"use client";
// Were the removals right? Alarm readings, detectors, field calls and money against what teardown found.
import { useState } from "react";
import { ChartCard } from "@/components/charts/chart-card";
import { ChartLegend } from "@/components/charts/legend";
import { percent } from "@/lib/tallies/labels";
import { usd } from "@/lib/tallies/read-outs";
import type { ConfirmationTable } from "@/lib/tallies/types";
import type { RateRow, YieldData } from "@/lib/tallies/yield-data";
import { callTable, costTable, detectorTable, quarterTable, rateTable, readingBinsTable } from "@/lib/tallies/yield-tables";
import { ConfirmationChart } from "../../_components/charts";
import { CONFIRMATION_LEGEND } from "../../_components/chart-words";
import { CostChart, FunnelChart, MissedChart, QuarterChart, ReadingCurveChart } from "./yield-charts";
import { FUNNEL_LEGEND, missedLegend, quarterLegend, READING_LEGEND } from "./yield-legends";

const SIGNED = "Signed verdicts only";

/** The rows in the shape the shared confirmation chart draws, flagged against the overall rate. */
function asConfirmation(rows: RateRow[], overall: ConfirmationTable["overall"]): ConfirmationTable {
  return {
    overall,
    rows: rows
      .filter((r) => r.n > 0)
      .map((r) => ({
        id: r.id,
        label: r.small ? `${r.label} *` : r.label,
        confirmed: r.confirmed,
        n: r.n,
        rate: r.rate,
        standsOut: overall.p === null ? null : r.rate.upper < overall.p ? "below" : r.rate.lower > overall.p ? "above" : null,
      })),
  };
}

function overallOf(rows: RateRow[], overall: ConfirmationTable["overall"] | null): ConfirmationTable["overall"] {
  if (overall) return overall;
  const n = rows.reduce((s, r) => s + r.n, 0);
  const confirmed = rows.reduce((s, r) => s + r.confirmed, 0);
  const p = n ? confirmed / n : null;
  return { p, lower: 0, upper: 1, confidence: 0.95, confirmed, n };
}

const f1 = (x: number) => (Math.abs(x) < 0.01 ? x.toExponential(2) : x.toFixed(3));

export function YieldBoard({ data, scopeWords }: { data: YieldData; scopeWords: string }) {
  const [basis, setBasis] = useState<"margin" | "reading">("margin");
  const fit = data.hot[basis];
  const callsOverall = { ...data.calls.overall, confirmed: Math.round((data.calls.overall.p ?? 0) * data.calls.overall.n) };
  const money = data.cost.totalUsd > 0;
  const personWord = data.ownCallsOnly
    ? "Your calls"
    : data.namesShown
      ? "Per inspector"
      : "Per inspector (numbered; names go to managers)";

  return (
    <>
      <section aria-label="Summary" className="mb-5 rounded-xl border border-line bg-surface p-4 sm:p-5" data-yield-summary>
        <h2 className="text-[15px] font-semibold text-ink">In short</h2>
        {data.summary.length ? (
          <ul className="mt-2 flex list-disc flex-col gap-1.5 pl-5 text-sm leading-relaxed text-ink-2">
            {data.summary.map((s) => (
              <li key={s}>{s}</li>
            ))}
          </ul>
        ) : (
          <p className="mt-2 text-sm text-muted">No signed removals with a teardown outcome match these filters yet.</p>
        )}
        {data.cautions.length ? (
          <div role="note" className="mt-3 rounded-lg border border-warn/40 bg-warn-soft px-3.5 py-2.5 text-sm text-ink-2">
            <p className="font-semibold text-ink">Small counts</p>
            <ul className="mt-1 list-disc pl-5">
              {data.cautions.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          </div>
        ) : null}
        <p className="mt-3 text-xs text-muted">
          Tearline applies no alarm threshold of its own: these figures report what the owner&apos;s thresholds and detectors produced.
          Decisions on thresholds, detectors and set-outs stay with the owner&apos;s rules and procedures, the applicable interchange rules
          and local codes.
          {data.ownCallsOnly ? " You see your own shop's alarms and your own field calls." : ""}
        </p>
      </section>

      <div className="grid grid-cols-1 items-start gap-5 lg:grid-cols-2">
        <div className="lg:col-span-2">
          <ChartCard
            title="Hot-bearing alarms: reading against outcome"
            subtitle={`Share confirmed at teardown, banded with 95% Wilson intervals, and the fitted logistic curve with its 95% band · ${SIGNED} · ${scopeWords}`}
            imageSubtitle={`${basis === "margin" ? "Against the margin over the owner's threshold" : "Against the detector reading"} · ${SIGNED}`}
            table={readingBinsTable(fit)}
            legend={READING_LEGEND}
            empty={fit.n ? null : "No hot-bearing alarms with a reading and a teardown outcome match these filters."}
            controls={
              <div role="radiogroup" aria-label="Reading" className="inline-flex rounded-lg bg-surface-2 p-0.5 ring-1 ring-line">
                {(["margin", "reading"] as const).map((b) => (
                  <button
                    key={b}
                    type="button"
                    role="radio"
                    aria-checked={basis === b}
                    onClick={() => setBasis(b)}
                    className={`h-8 rounded-md px-3 text-sm font-medium ${basis === b ? "bg-surface text-ink shadow-sm" : "text-muted hover:text-ink"}`}
                  >
                    {b === "margin" ? "Over threshold" : "Reading"}
                  </button>
                ))}
              </div>
            }
            footer={
              fit.fit ? (
                <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-2">
                  <div>
                    <dt className="inline font-medium text-ink">Half confirmed at </dt>
                    <dd className="inline tabular">
                      {fit.fit.at50
                        ? `${fit.fit.at50.x} °F${fit.fit.at50.lower !== null ? ` (95%: ${fit.fit.at50.lower} to ${fit.fit.at50.upper})` : " (interval open)"}`
                        : "–"}
                    </dd>
                  </div>
                  <div>
                    <dt className="inline font-medium text-ink">80% confirmed at </dt>
                    <dd className="inline tabular">
                      {fit.fit.at80
                        ? `${fit.fit.at80.x} °F${fit.fit.at80.lower !== null ? ` (95%: ${fit.fit.at80.lower} to ${fit.fit.at80.upper})` : " (interval open)"}`
                        : "–"}
                    </dd>
                  </div>
                  <div className="text-xs text-muted sm:col-span-2">
                    Slope {f1(fit.fit.slope)} per °F on the log-odds scale (95% profile {f1(fit.fit.slopeProfile[0])} to{" "}
                    {f1(fit.fit.slopeProfile[1])}; Wald {f1(fit.fit.slopeWald[0])} to {f1(fit.fit.slopeWald[1])}) · likelihood-ratio{" "}
                    {fit.fit.pValue < 0.001 ? "p < 0.001" : `p = ${fit.fit.pValue.toFixed(3)}`} · {fit.n} alarms · intervals for the 50% and
                    80% points by Fieller&apos;s method
                  </div>
                </dl>
              ) : fit.noFit ? (
                <p className="text-muted">{fit.noFit}</p>
              ) : undefined
            }
          >
            <ReadingCurveChart fit={fit} />
            <ChartLegend items={READING_LEGEND} />
          </ChartCard>
        </div>

        <ChartCard
          title="Acoustic alarms by level"
          subtitle={`Share confirmed at each alarm level, 95% Wilson intervals · ${SIGNED}`}
          imageSubtitle={`95% Wilson intervals · ${SIGNED}`}
          table={rateTable(data.acoustic, "Alarm level")}
          legend={CONFIRMATION_LEGEND}
          empty={data.acoustic.length ? null : "No acoustic alarms with a teardown outcome match these filters."}
          footer={
            data.acoustic.some((r) => r.small) ? (
              <p className="text-xs text-muted">* fewer than 10 torn down: read the interval, not the dot.</p>
            ) : undefined
          }
        >
          <ConfirmationChart table={asConfirmation(data.acoustic, overallOf(data.acoustic, null))} nameWidth={110} />
          <ChartLegend items={CONFIRMATION_LEGEND} />
        </ChartCard>

        <ChartCard
          title="Detectors against the fleet"
          subtitle={`Each wayside detector's confirmed share inside binomial funnel limits around the fleet rate · ${SIGNED}`}
          imageSubtitle={`95% and 99.8% binomial limits around the fleet rate · ${SIGNED}`}
          table={detectorTable(data.detectors)}
          legend={FUNNEL_LEGEND}
          empty={data.detectors.fleet.n ? null : "No wayside alarms naming a detector have a teardown outcome yet."}
          footer={
            data.detectors.rows.some((r) => r.position === "below-998" || r.position === "below-95") ? (
              <p>
                <span className="font-semibold text-danger">Worth checking:</span>{" "}
                {data.detectors.rows
                  .filter((r) => r.position === "below-998" || r.position === "below-95")
                  .map((r) => `${r.label}${r.location ? ` (${r.location})` : ""}, ${percent(r.rate.p)} of ${r.n}`)
                  .join("; ")}
                .
              </p>
            ) : (
              <p className="text-muted">No detector&apos;s confirmed share lies outside what chance explains at its number of alarms.</p>
            )
          }
        >
          <FunnelChart detectors={data.detectors} />
          <ChartLegend items={FUNNEL_LEGEND} />
        </ChartCard>

        <ChartCard
          title="Remove calls confirmed, by shop"
          subtitle={`How often a shop's call to remove was confirmed at teardown · a training signal, not a league table · ${SIGNED}`}
          imageSubtitle={`95% Wilson intervals · ${SIGNED}`}
          table={callTable(data.calls.shops, "Shop", data.missWindow)}
          legend={CONFIRMATION_LEGEND}
          empty={data.calls.shops.some((r) => r.n) ? null : "No remove calls with a teardown outcome match these filters."}
        >
          <ConfirmationChart table={asConfirmation(data.calls.shops, callsOverall)} nameWidth={170} />
          <ChartLegend items={CONFIRMATION_LEGEND} />
        </ChartCard>

        <ChartCard
          title={data.ownCallsOnly ? "Your remove calls" : "Remove calls confirmed, by inspector"}
          subtitle={`${personWord} · ${SIGNED}`}
          imageSubtitle={`95% Wilson intervals · ${SIGNED}`}
          table={callTable(data.calls.inspectors, data.ownCallsOnly ? "Who" : "Inspector", data.missWindow)}
          legend={CONFIRMATION_LEGEND}
          empty={data.calls.inspectors.some((r) => r.n) ? null : "No remove calls with a teardown outcome match these filters."}
        >
          <ConfirmationChart table={asConfirmation(data.calls.inspectors, callsOverall)} nameWidth={170} />
          <ChartLegend items={CONFIRMATION_LEGEND} />
        </ChartCard>

        <ChartCard
          title="Remove calls confirmed over time"
          subtitle={`Each shop's confirmed share per quarter · ${SIGNED}`}
          imageSubtitle={`Confirmed share per quarter · ${SIGNED}`}
          table={quarterTable(data.calls)}
          legend={quarterLegend(data.calls)}
          empty={data.calls.quarterList.length ? null : "No remove calls with a teardown outcome match these filters."}
        >
          <QuarterChart calls={data.calls} />
          <ChartLegend items={quarterLegend(data.calls)} />
        </ChartCard>

        <ChartCard
          title="Keep calls followed by a removal"
          subtitle={`A keep call, then the same car, axle and side removed within ${data.missWindow} days · every stage`}
          imageSubtitle={`Same car and position removed within ${data.missWindow} days`}
          table={callTable(data.calls.shops, "Shop", data.missWindow)}
          legend={missedLegend(data.missWindow)}
          empty={data.calls.shops.some((r) => r.keeps) ? null : "No keep calls with a car and position match these filters."}
          footer={
            <p className="text-xs text-muted">
              Change the window above the figures. A later removal can have other causes; open the cases before drawing a lesson.
            </p>
          }
        >
          <MissedChart rows={data.calls.shops} window={data.missWindow} />
          <ChartLegend items={missedLegend(data.missWindow)} />
        </ChartCard>

        <ChartCard
          title="What no-defect removals cost, by trigger"
          subtitle={
            money
              ? `At each removal site's cost per removal (set by an admin under Sites) · ${SIGNED}`
              : `No site has a cost per removal set yet: counts of no-defect removals shown · ${SIGNED}`
          }
          imageSubtitle={money ? "USD at each site's cost per removal" : "No-defect removals"}
          table={costTable(data.cost.byTrigger, "Trigger")}
          empty={data.cost.noDefect ? null : "No signed removals found no defect under these filters."}
          footer={
            <p>
              {money ? (
                <>
                  <span className="font-semibold text-ink">{usd(data.cost.totalUsd)}</span> on {data.cost.noDefect} removals teardown did
                  not confirm
                </>
              ) : (
                `${data.cost.noDefect} removals teardown did not confirm`
              )}
              {data.cost.uncosted ? `; ${data.cost.uncosted} at sites with no cost set are not priced` : ""}.
            </p>
          }
        >
          <CostChart rows={data.cost.byTrigger.filter((r) => r.noDefect > 0)} money={money} />
        </ChartCard>

        <ChartCard
          title="What no-defect removals cost, by detector"
          subtitle={
            money
              ? `Wayside alarms that teardown did not confirm, priced at the removal site's cost · ${SIGNED}`
              : `Counts of no-defect removals per detector · ${SIGNED}`
          }
          imageSubtitle={money ? "USD at each site's cost per removal" : "No-defect removals"}
          table={costTable(data.cost.byDetector, "Detector")}
          empty={data.cost.byDetector.length ? null : "No wayside alarm naming a detector found no defect under these filters."}
        >
          <CostChart rows={data.cost.byDetector} money={money} />
        </ChartCard>
      </div>
    </>
  );
}
