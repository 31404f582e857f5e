"use client";
// Share of each shop's remove calls confirmed at teardown, quarter by quarter.
import { CartesianGrid, Line, LineChart, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, THEME } from "@/components/charts/palette";
import type { YieldData } from "@/lib/tallies/yield-data";
import { SHOP_COLOURS } from "./yield-legends";

export function QuarterChart({ calls }: { calls: YieldData["calls"] }) {
  const data = calls.quarterList.map((q) => {
    const row: Record<string, string | number | null> = { quarter: q };
    for (const s of calls.quarters) {
      const p = s.points.find((x) => x.quarter === q);
      row[s.id] = p && p.p !== null ? Math.round(p.p * 1000) / 10 : null;
      row[`${s.id}:n`] = p?.n ?? 0;
    }
    return row;
  });
  return (
    <LineChart responsive style={{ width: "100%", height: 260 }} data={data} margin={{ top: 12, right: 16, bottom: 4, left: 0 }}>
      <CartesianGrid vertical={false} stroke={THEME.line} />
      <XAxis dataKey="quarter" tick={{ ...AXIS_TICK, fontSize: 11 }} minTickGap={12} />
      <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={AXIS_TICK} tickFormatter={(v: number) => `${v}%`} width={44} />
      <Tooltip
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
        formatter={(v, name, item) => {
          const s = calls.quarters.find((x) => x.label === name);
          const n = s ? (item.payload as Record<string, number>)[`${s.id}:n`] : 0;
          return [`${v}% of ${n}`, String(name)];
        }}
      />
      {calls.quarters.map((s, i) => (
        <Line
          key={s.id}
          type="linear"
          dataKey={s.id}
          name={s.label}
          stroke={SHOP_COLOURS[i % SHOP_COLOURS.length]}
          strokeWidth={2}
          dot={{ r: 3 }}
          connectNulls
          isAnimationActive={false}
        />
      ))}
    </LineChart>
  );
}
