"use client";
// Share of removals confirmed at teardown with its 95% Wilson interval, one line per trigger or
// shop, lowest first; the dashed line is the rate over all of them.
import { Bar, CartesianGrid, ComposedChart, ReferenceLine, Tooltip, XAxis, YAxis, type BarShapeProps } from "recharts";
import { AXIS_TICK, THEME } from "@/components/charts/palette";
import { percent, percentRange } from "@/lib/tallies/labels";
import { TONE } from "./chart-words";
import type { ConfirmationRow, ConfirmationTable } from "@/lib/tallies/types";

function IntervalShape(props: BarShapeProps) {
  const { x, y, width, height, payload } = props;
  const row = payload as ConfirmationRow & { range: [number, number] };
  const mid = y + height / 2;
  const span = row.rate.upper - row.rate.lower;
  const px = span > 0 && row.rate.p !== null ? x + (width * (row.rate.p - row.rate.lower)) / span : x;
  const colour = TONE[row.standsOut ?? "none"];
  return (
    <g>
      <line x1={x} x2={x + width} y1={mid} y2={mid} stroke={colour} strokeWidth={2} strokeOpacity={0.55} />
      <line x1={x} x2={x} y1={mid - 5} y2={mid + 5} stroke={colour} strokeWidth={1.5} strokeOpacity={0.7} />
      <line x1={x + width} x2={x + width} y1={mid - 5} y2={mid + 5} stroke={colour} strokeWidth={1.5} strokeOpacity={0.7} />
      {row.rate.p !== null ? <circle cx={px} cy={mid} r={5} fill={colour} stroke="#ffffff" strokeWidth={1.5} /> : null}
    </g>
  );
}

export function ConfirmationChart({ table, nameWidth = 150 }: { table: ConfirmationTable; nameWidth?: number }) {
  const data = table.rows.map((r) => ({ ...r, range: [r.rate.lower * 100, r.rate.upper * 100] as [number, number] }));
  const height = Math.max(140, data.length * 32 + 48);
  return (
    <ComposedChart
      responsive
      layout="vertical"
      style={{ width: "100%", height }}
      data={data}
      margin={{ top: 18, right: 16, bottom: 4, left: 4 }}
    >
      <CartesianGrid horizontal={false} stroke={THEME.line} />
      <XAxis type="number" domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={AXIS_TICK} tickFormatter={(v: number) => `${v}%`} />
      <YAxis type="category" dataKey="label" tick={{ ...AXIS_TICK, fontSize: 11 }} width={nameWidth} interval={0} />
      <Tooltip
        cursor={{ fill: "var(--surface-2)" }}
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
        formatter={(_v, _n, item) => {
          const r = item.payload as ConfirmationRow;
          return [`${percent(r.rate.p)} of ${r.n} (95%: ${percentRange(r.rate.lower, r.rate.upper)})`, "Confirmed"];
        }}
      />
      {table.overall.p !== null ? (
        <ReferenceLine
          x={table.overall.p * 100}
          stroke={THEME.accent}
          strokeDasharray="5 4"
          label={{ value: `All: ${percent(table.overall.p)}`, position: "top", fill: THEME.accent, fontSize: 11 }}
        />
      ) : null}
      <Bar dataKey="range" shape={IntervalShape} isAnimationActive={false} />
    </ComposedChart>
  );
}
