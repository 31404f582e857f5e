"use client";
// For each removal trigger: teardowns that confirmed it, found no defect, or recorded no outcome.
import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, OUTCOME_COLOURS, THEME } from "@/components/charts/palette";
import type { TriggerVerdictRow } from "@/lib/tallies/types";

export function TriggerVerdictChart({ rows }: { rows: TriggerVerdictRow[] }) {
  const height = Math.max(160, rows.length * 30 + 40);
  return (
    <BarChart
      responsive
      layout="vertical"
      style={{ width: "100%", height }}
      data={rows}
      margin={{ top: 4, right: 12, bottom: 4, left: 4 }}
      barCategoryGap={6}
    >
      <CartesianGrid horizontal={false} stroke={THEME.line} />
      <XAxis type="number" tick={AXIS_TICK} allowDecimals={false} />
      <YAxis type="category" dataKey="label" tick={{ ...AXIS_TICK, fontSize: 11 }} width={150} interval={0} />
      <Tooltip
        cursor={{ fill: "var(--surface-2)" }}
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
      />
      <Bar dataKey="confirmed" name="Confirmed" stackId="v" fill={OUTCOME_COLOURS.confirmed} isAnimationActive={false} />
      <Bar dataKey="noDefect" name="No defect found" stackId="v" fill={OUTCOME_COLOURS.noDefect} isAnimationActive={false} />
      <Bar
        dataKey="notRecorded"
        name="Outcome not recorded"
        stackId="v"
        fill={OUTCOME_COLOURS.notRecorded}
        radius={[0, 4, 4, 0]}
        isAnimationActive={false}
      />
    </BarChart>
  );
}
