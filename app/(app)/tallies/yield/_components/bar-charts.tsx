"use client";
// Horizontal bars: keep calls with and without a later removal, and money on removals teardown did not confirm.
import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, OUTCOME_COLOURS, THEME } from "@/components/charts/palette";
import { usd } from "@/lib/tallies/read-outs";
import type { CallRow, RateRow } from "@/lib/tallies/yield-data";

const tooltipStyle = { borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" };

export function MissedChart({ rows, window }: { rows: CallRow[]; window: number }) {
  const data = rows.filter((r) => r.keeps > 0).map((r) => ({ label: r.label, held: r.keeps - r.missed, missed: r.missed }));
  const height = Math.max(140, data.length * 30 + 44);
  return (
    <BarChart
      responsive
      layout="vertical"
      style={{ width: "100%", height }}
      data={data}
      margin={{ top: 4, right: 12, bottom: 4, left: 4 }}
      barCategoryGap={6}
    >
      <CartesianGrid horizontal={false} stroke={THEME.line} />
      <XAxis type="number" tick={AXIS_TICK} allowDecimals={false} />
      <YAxis type="category" dataKey="label" tick={{ ...AXIS_TICK, fontSize: 11 }} width={160} interval={0} />
      <Tooltip cursor={{ fill: "var(--surface-2)" }} contentStyle={tooltipStyle} />
      <Bar dataKey="held" name={`Not removed again within ${window} days`} stackId="k" fill="#94a3b8" isAnimationActive={false} />
      <Bar
        dataKey="missed"
        name={`Removed again within ${window} days`}
        stackId="k"
        fill={OUTCOME_COLOURS.noDefect}
        radius={[0, 4, 4, 0]}
        isAnimationActive={false}
      />
    </BarChart>
  );
}

/** Money when any site has a cost set; otherwise the count of no-defect removals. */
export function CostChart({ rows, money }: { rows: RateRow[]; money: boolean }) {
  const data = rows.slice(0, 12).map((r) => ({ label: r.label, value: money ? Math.round(r.costUsd) : r.noDefect }));
  const height = Math.max(140, data.length * 30 + 44);
  return (
    <BarChart
      responsive
      layout="vertical"
      style={{ width: "100%", height }}
      data={data}
      margin={{ top: 4, right: 16, bottom: 4, left: 4 }}
      barCategoryGap={6}
    >
      <CartesianGrid horizontal={false} stroke={THEME.line} />
      <XAxis
        type="number"
        tick={AXIS_TICK}
        allowDecimals={false}
        tickFormatter={(v: number) => (money ? (v >= 1000 ? `$${Math.round(v / 1000)}k` : `$${v}`) : String(v))}
      />
      <YAxis type="category" dataKey="label" tick={{ ...AXIS_TICK, fontSize: 11 }} width={170} interval={0} />
      <Tooltip
        cursor={{ fill: "var(--surface-2)" }}
        contentStyle={tooltipStyle}
        formatter={(v) => [money ? usd(Number(v)) : `${v} removals`, money ? "No-defect removals cost" : "No defect found"]}
      />
      <Bar dataKey="value" fill={OUTCOME_COLOURS.noDefect} radius={[0, 4, 4, 0]} isAnimationActive={false} />
    </BarChart>
  );
}
