"use client";
// The life section: every cause at a glance, then the chosen cause on Weibull paper with its
// parameters, bounds and what the shape says.
import Link from "next/link";
import { usePathname, useSearchParams } from "next/navigation";
import { ChartCard } from "@/components/charts/chart-card";
import { ChartLegend } from "@/components/charts/legend";
import { WeibullPlot, WEIBULL_LEGEND } from "@/components/charts/weibull-plot";
import { Card } from "@/components/ui/card";
import type { LifeData } from "@/lib/tallies/life-data";
import { lifeTable, probabilityPlotTable } from "@/lib/tallies/tables";
import { CauseTable } from "./cause-table";
import { FleetUpload } from "./fleet-upload";
import { LifeCautions } from "./life-cautions";
import { ParameterTable } from "./parameter-table";
import { SHAPE_GUIDE, ShapeBadge } from "./shape-badge";

export function LifeBoard({ data, canUpload, scopeWords }: { data: LifeData; canUpload: boolean; scopeWords: string }) {
  const pathname = usePathname();
  const params = useSearchParams();
  const href = (change: Record<string, string | null>) => {
    const q = new URLSearchParams(params.toString());
    for (const [k, v] of Object.entries(change)) {
      if (v === null) q.delete(k);
      else q.set(k, v);
    }
    return `${pathname}${q.size ? `?${q}` : ""}`;
  };
  const unit = data.measure;
  const s = data.selected;
  const suspensionsFromFleet = data.fleet.used;

  return (
    <div className="grid grid-cols-1 items-start gap-5 xl:grid-cols-[minmax(0,1.15fr)_minmax(0,1fr)]">
      <div className="space-y-5">
        <ChartCard
          title={s ? `${s.label}: Weibull probability plot` : "Weibull probability plot"}
          subtitle={
            s
              ? `${s.failures.toLocaleString("en-US")} failures, ${s.suspensions.toLocaleString("en-US")} suspensions · ${scopeWords} · signed verdicts only`
              : undefined
          }
          imageSubtitle={s ? `${s.failures} failures, ${s.suspensions} suspensions · ${unit} in service` : undefined}
          table={probabilityPlotTable(data)}
          legend={WEIBULL_LEGEND}
          empty={
            s?.fit && s.mle
              ? null
              : "No root cause has enough removals with a service life to fit (at least two failures at different lives)."
          }
          controls={
            <div role="group" aria-label="Life measured in" className="inline-flex rounded-lg bg-surface-2 p-0.5 ring-1 ring-line">
              {(["months", "miles"] as const).map((m) => (
                <Link
                  key={m}
                  href={href({ measure: m === "months" ? null : m })}
                  scroll={false}
                  aria-current={unit === m ? "true" : undefined}
                  className={`inline-flex h-11 items-center rounded-md px-3 lg:h-8 text-sm font-medium ${unit === m ? "bg-surface text-ink shadow-sm" : "text-muted hover:text-ink"}`}
                >
                  {m === "months" ? "Months" : "Miles"}
                </Link>
              ))}
            </div>
          }
          footer={
            s?.fit ? (
              <div className="flex items-start gap-3">
                <ShapeBadge reading={s.fit.shapeReading} />
                <p>{s.shapeExplanation}</p>
              </div>
            ) : undefined
          }
        >
          {s?.mle ? (
            <WeibullPlot
              title={`${s.label}: life to removal`}
              points={s.plotPoints}
              line={s.fittedLine}
              beta={s.mle.beta}
              eta={s.mle.eta}
              b10={s.mle.b10}
              unit={unit}
            />
          ) : null}
          <ChartLegend items={WEIBULL_LEGEND} />
          {s?.thinnedFrom ? (
            <p className="mt-2 text-xs text-muted">{`${s.plotPoints.length} of ${s.thinnedFrom.toLocaleString("en-US")} failures plotted, evenly spread by rank; the fit uses all of them.`}</p>
          ) : null}
        </ChartCard>

        {s?.mle ? (
          <Card title="Parameters and 95% bounds">
            <div className="space-y-3">
              <LifeCautions cautions={s.cautions} />
              <ParameterTable detail={s} unit={unit} />
            </div>
          </Card>
        ) : null}
      </div>

      <div className="space-y-5">
        <ChartCard
          title="Life by root cause"
          subtitle="Maximum likelihood, 95% Fisher bounds in the table view; removals for other causes count as suspensions"
          table={lifeTable(data)}
          chartLabel="Causes"
          noImage
          empty={data.causes.length ? null : "No signed removals with a service life match these filters."}
        >
          <CauseTable causes={data.causes} selected={s?.cause ?? null} hrefFor={(cause) => href({ cause })} unit={unit} />
          <p className="mt-3 text-xs text-muted">
            {data.withoutLife
              ? `${data.withoutLife.toLocaleString("en-US")} signed removals have no service life in ${unit} and are left out. `
              : ""}
            {suspensionsFromFleet
              ? `${suspensionsFromFleet.toLocaleString("en-US")} fleet units still in service are counted as suspensions.`
              : (data.fleet.why ?? "")}
          </p>
        </ChartCard>

        <Card title="Reading the shape">
          <ul className="space-y-2.5 text-sm text-ink-2">
            {SHAPE_GUIDE.map((g) => (
              <li key={g.reading} className="flex items-start gap-3">
                <span className="w-20 shrink-0">
                  <ShapeBadge reading={g.reading} />
                </span>
                <span>{g.text}</span>
              </li>
            ))}
          </ul>
          <p className="mt-3 text-xs text-muted">
            The shape is read from its 95% Fisher bounds, in the table and the chart alike: when they include 1 the data cannot tell it from
            random, so it reads as random.
          </p>
        </Card>

        {canUpload ? (
          <Card title="Fleet still in service">
            <FleetUpload batch={data.fleet.batch} />
          </Card>
        ) : null}
      </div>
    </div>
  );
}
