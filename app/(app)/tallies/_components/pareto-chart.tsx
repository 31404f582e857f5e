"use client";
// Root causes, most frequent first, with the running share of all signed verdicts.
import { Bar, CartesianGrid, Cell, ComposedChart, Line, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, causeColour, THEME } from "@/components/charts/palette";
import type { ParetoBar } from "@/lib/tallies/types";

const compact = (v: number) => (v >= 10_000 ? `${Math.round(v / 1000)}k` : v.toLocaleString("en-US"));
// Labels in full: steep enough (60°) that neighbours never overlap even with 13 bars on a phone.
const short = (s: string) => (s.length > 24 ? `${s.slice(0, 23)}…` : s);

export function ParetoChart({ rows }: { rows: ParetoBar[] }) {
  const data = rows.map((r) => ({ ...r, cumulativePct: r.cumulativeShare * 100 }));
  return (
    <ComposedChart responsive style={{ width: "100%", height: 340 }} data={data} margin={{ top: 8, right: 4, bottom: 8, left: 0 }}>
      <CartesianGrid vertical={false} stroke={THEME.line} />
      <XAxis
        dataKey="label"
        tick={{ ...AXIS_TICK, fontSize: 11 }}
        tickFormatter={short}
        interval={0}
        angle={-60}
        textAnchor="end"
        height={118}
      />
      <YAxis yAxisId="n" tick={AXIS_TICK} allowDecimals={false} width={52} tickFormatter={compact} />
      <YAxis yAxisId="pct" orientation="right" domain={[0, 100]} tick={AXIS_TICK} tickFormatter={(v: number) => `${v}%`} width={44} />
      <Tooltip
        cursor={{ fill: "var(--surface-2)" }}
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
        formatter={(value, name) => (name === "Running share" ? [`${Number(value).toFixed(1)}%`, name] : [value, name])}
      />
      <Bar yAxisId="n" dataKey="count" name="Verdicts" radius={[4, 4, 0, 0]} isAnimationActive={false}>
        {data.map((r, i) => (
          <Cell key={r.code || i} fill={causeColour(r.code, i)} />
        ))}
      </Bar>
      <Line
        yAxisId="pct"
        dataKey="cumulativePct"
        name="Running share"
        stroke={THEME.ink2}
        strokeWidth={2}
        dot={{ r: 3, fill: THEME.ink2 }}
        isAnimationActive={false}
      />
    </ComposedChart>
  );
}
