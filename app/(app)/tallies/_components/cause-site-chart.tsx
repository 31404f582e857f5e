"use client";
// Each site's mix of root causes as a 100% bar, so shops of different sizes compare directly.
import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, causeColour, THEME } from "@/components/charts/palette";
import type { CauseSiteTally } from "@/lib/tallies/types";

export function CauseSiteChart({ tally }: { tally: CauseSiteTally }) {
  const data = tally.sites.map((s, i) => {
    const row: Record<string, string | number> = { site: s.label };
    tally.causes.forEach((c, j) => (row[c.code || "none"] = tally.counts[i][j]));
    return row;
  });
  const height = Math.max(140, data.length * 40 + 48);
  return (
    <BarChart
      responsive
      layout="vertical"
      stackOffset="expand"
      style={{ width: "100%", height }}
      data={data}
      margin={{ top: 4, right: 12, bottom: 4, left: 4 }}
      barCategoryGap={8}
    >
      <CartesianGrid horizontal={false} stroke={THEME.line} />
      <XAxis type="number" tick={AXIS_TICK} tickFormatter={(v: number) => `${Math.round(v * 100)}%`} />
      <YAxis type="category" dataKey="site" tick={{ ...AXIS_TICK, fontSize: 11 }} width={150} interval={0} />
      <Tooltip
        cursor={{ fill: "var(--surface-2)" }}
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)", fontSize: 12 }}
      />
      {tally.causes.map((c, j) => (
        <Bar
          key={c.code || "none"}
          dataKey={c.code || "none"}
          name={c.label}
          stackId="mix"
          fill={causeColour(c.code, j)}
          isAnimationActive={false}
        />
      ))}
    </BarChart>
  );
}
