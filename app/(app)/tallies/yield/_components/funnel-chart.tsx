"use client";
// Each detector's confirmed share against its number of torn-down alarms, inside the funnel of
// binomial limits around the fleet's rate: few alarms may wander far, many may not.
import { CartesianGrid, ComposedChart, Line, ReferenceLine, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, THEME } from "@/components/charts/palette";
import { percent } from "@/lib/tallies/labels";
import { positionWords } from "@/lib/tallies/yield-tables";
import type { DetectorRow, YieldData } from "@/lib/tallies/yield-data";
import { FUNNEL_TONE as TONE } from "./yield-legends";

const toneOf = (p: DetectorRow["position"]) =>
  p === "below-998" || p === "below-95" ? TONE.low : p === "above-998" || p === "above-95" ? TONE.high : TONE.inside;

function Dot(props: { cx?: number; cy?: number; payload?: DetectorRow & { y: number } }) {
  const { cx, cy, payload } = props;
  if (cx === undefined || cy === undefined || !payload) return null;
  const colour = toneOf(payload.position);
  const flagged = colour !== TONE.inside;
  const named = colour === TONE.low;
  return (
    <g>
      <circle cx={cx} cy={cy} r={flagged ? 6 : 4.5} fill={colour} stroke="#ffffff" strokeWidth={1.5} />
      {named ? (
        <text x={cx + 9} y={cy + 4} fontSize={11} fontWeight={600} fill={colour}>
          {payload.label}
        </text>
      ) : null}
    </g>
  );
}

export function FunnelChart({ detectors }: { detectors: YieldData["detectors"] }) {
  const lines = detectors.funnel.map((f) => ({
    n: f.n,
    l95: f.lower95 * 100,
    u95: f.upper95 * 100,
    l998: f.lower998 * 100,
    u998: f.upper998 * 100,
  }));
  const points = detectors.rows.filter((r) => r.n > 0).map((r) => ({ ...r, y: (r.rate.p ?? 0) * 100 }));
  const maxN = Math.max(1, ...lines.map((l) => l.n));
  return (
    <ComposedChart responsive style={{ width: "100%", height: 300 }} data={lines} margin={{ top: 14, right: 24, bottom: 18, left: 0 }}>
      <CartesianGrid stroke={THEME.line} />
      <XAxis
        type="number"
        dataKey="n"
        domain={[0, Math.ceil(maxN)]}
        tick={AXIS_TICK}
        allowDecimals={false}
        label={{ value: "Alarms torn down", position: "insideBottom", offset: -10, fill: THEME.muted, fontSize: 11 }}
      />
      <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={AXIS_TICK} tickFormatter={(v: number) => `${v}%`} width={44} />
      <Tooltip
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
        formatter={(v, name, item) => {
          const p = item.payload as DetectorRow & { y?: number };
          if (p.label !== undefined && p.y !== undefined)
            return [`${percent(p.rate.p)} of ${p.n} · ${positionWords(p.position)}`, `${p.label}${p.location ? ` (${p.location})` : ""}`];
          return [`${Math.round(Number(v))}%`, String(name)];
        }}
        labelFormatter={() => ""}
      />
      {detectors.fleet.p !== null ? (
        <ReferenceLine
          y={detectors.fleet.p * 100}
          stroke={THEME.accent}
          strokeDasharray="5 4"
          label={{ value: `Fleet ${percent(detectors.fleet.p)}`, position: "insideTopRight", fill: THEME.accent, fontSize: 11 }}
        />
      ) : null}
      <Line type="monotone" dataKey="u95" name="95% limit" stroke="#64748b" strokeDasharray="5 3" dot={false} isAnimationActive={false} />
      <Line type="monotone" dataKey="l95" name="95% limit" stroke="#64748b" strokeDasharray="5 3" dot={false} isAnimationActive={false} />
      <Line type="monotone" dataKey="u998" name="99.8% limit" stroke="#94a3b8" dot={false} isAnimationActive={false} />
      <Line type="monotone" dataKey="l998" name="99.8% limit" stroke="#94a3b8" dot={false} isAnimationActive={false} />
      <Scatter data={points} dataKey="y" name="Detector" shape={<Dot />} isAnimationActive={false} />
    </ComposedChart>
  );
}
