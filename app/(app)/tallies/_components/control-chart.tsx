"use client";
// Monthly counts for one series with its c-chart centre line and limits; months beyond them are
// drawn large and red.
import { CartesianGrid, Line, LineChart, ReferenceLine, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, THEME } from "@/components/charts/palette";
import { monthLabel } from "@/lib/tallies/labels";
import type { ControlSeries } from "@/lib/tallies/types";

type Point = { month: string; label: string; count: number; beyond: "above" | "below" | null; partial: boolean };

function Dot(props: { cx?: number; cy?: number; payload?: Point }) {
  const { cx, cy, payload } = props;
  if (cx === undefined || cy === undefined || !payload) return null;
  if (payload.partial) return <circle cx={cx} cy={cy} r={4} fill="var(--surface)" stroke={THEME.accent} strokeWidth={2} />;
  if (payload.beyond) {
    return (
      <g>
        <circle cx={cx} cy={cy} r={6.5} fill="#dc2626" stroke="#ffffff" strokeWidth={1.5} />
        <text x={cx} y={payload.beyond === "above" ? cy - 11 : cy + 19} textAnchor="middle" fontSize={11} fontWeight={700} fill="#dc2626">
          {payload.count}
        </text>
      </g>
    );
  }
  return <circle cx={cx} cy={cy} r={2.5} fill={THEME.ink2} />;
}

export function ControlChart({ months, series, partialMonth }: { months: string[]; series: ControlSeries; partialMonth: string | null }) {
  const data: Point[] = months.map((m, i) => ({
    month: m,
    label: monthLabel(m),
    count: series.counts[i],
    beyond: series.beyond[i],
    partial: m === partialMonth,
  }));
  const top = Math.max(series.upperLimit, ...series.counts) * 1.12;
  return (
    <LineChart responsive style={{ width: "100%", height: 300 }} data={data} margin={{ top: 16, right: 72, bottom: 4, left: 0 }}>
      <CartesianGrid vertical={false} stroke={THEME.line} />
      <XAxis dataKey="label" tick={{ ...AXIS_TICK, fontSize: 11 }} minTickGap={18} />
      <YAxis tick={AXIS_TICK} allowDecimals={false} domain={[0, Math.ceil(top)]} width={48} />
      <Tooltip
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
        formatter={(v, _n, item) => {
          const p = item.payload as Point;
          return [`${v}${p.partial ? " (month in progress)" : p.beyond ? ` (${p.beyond} the limit)` : ""}`, series.label];
        }}
      />
      <ReferenceLine
        y={series.upperLimit}
        stroke="#dc2626"
        strokeDasharray="6 4"
        label={{ value: `UCL ${series.upperLimit.toFixed(1)}`, position: "right", fill: "#dc2626", fontSize: 11 }}
      />
      <ReferenceLine
        y={series.centre}
        stroke={THEME.muted}
        label={{ value: `c̄ ${series.centre.toFixed(1)}`, position: "right", fill: THEME.muted, fontSize: 11 }}
      />
      {series.lowerLimit > 0 ? (
        <ReferenceLine
          y={series.lowerLimit}
          stroke="#dc2626"
          strokeDasharray="6 4"
          label={{ value: `LCL ${series.lowerLimit.toFixed(1)}`, position: "right", fill: "#dc2626", fontSize: 11 }}
        />
      ) : null}
      <Line
        type="linear"
        dataKey="count"
        name={series.label}
        stroke={THEME.accent}
        strokeWidth={2}
        dot={<Dot />}
        activeDot={{ r: 5 }}
        isAnimationActive={false}
      />
    </LineChart>
  );
}
