"use client";
// Confirmed share against the alarm's reading: banded rates with Wilson intervals, the fitted
// logistic curve with its 95% band, and where the curve crosses 50% and 80%.
import { Area, CartesianGrid, ComposedChart, ErrorBar, Line, ReferenceLine, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { AXIS_TICK, THEME } from "@/components/charts/palette";
import { percent, percentRange } from "@/lib/tallies/labels";
import type { ReadingFit } from "@/lib/tallies/yield-data";
import { READING_TONE } from "./yield-legends";

const { curve: CURVE, band: BAND, bins: BINS } = READING_TONE;

export function ReadingCurveChart({ fit }: { fit: ReadingFit }) {
  const curve = (fit.fit?.curve ?? []).map((c) => ({ x: c.x, p: c.p * 100, band: [c.lower * 100, c.upper * 100] as [number, number] }));
  const bins = fit.bins.map((b) => {
    const p = (b.rate.p ?? 0) * 100;
    return {
      x: (b.from + b.to) / 2,
      p,
      err: [p - b.rate.lower * 100, b.rate.upper * 100 - p] as [number, number],
      n: b.n,
      from: b.from,
      to: b.to,
      lower: b.rate.lower,
      upper: b.rate.upper,
    };
  });
  const xs = [...fit.bins.flatMap((b) => [b.from, b.to]), ...curve.map((c) => c.x)];
  const lo = Math.min(...xs);
  const hi = Math.max(...xs);
  const unit = fit.basis === "margin" ? "°F over threshold" : "°F";
  return (
    <ComposedChart responsive style={{ width: "100%", height: 300 }} data={curve} margin={{ top: 18, right: 16, bottom: 18, left: 0 }}>
      <CartesianGrid stroke={THEME.line} />
      <XAxis
        type="number"
        dataKey="x"
        domain={[lo, hi]}
        tick={AXIS_TICK}
        allowDecimals={false}
        label={{
          value: fit.basis === "margin" ? "Reading over the owner's threshold (°F)" : "Detector reading (°F)",
          position: "insideBottom",
          offset: -10,
          fill: THEME.muted,
          fontSize: 11,
        }}
      />
      <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tick={AXIS_TICK} tickFormatter={(v: number) => `${v}%`} width={44} />
      <Tooltip
        contentStyle={{ borderRadius: 8, borderColor: "var(--line)", background: "var(--surface)", color: "var(--ink)" }}
        labelFormatter={(v) => `${Math.round(Number(v))} ${unit}`}
        formatter={(v, name, item) => {
          const b = item.payload as (typeof bins)[number];
          if (name === "Band of readings" && b.n !== undefined)
            return [`${percent(b.p / 100)} of ${b.n} (95%: ${percentRange(b.lower, b.upper)}), ${b.from} to ${b.to} ${unit}`, "Confirmed"];
          if (Array.isArray(v)) return [`${Math.round(Number(v[0]))}–${Math.round(Number(v[1]))}%`, "95% band"];
          return [`${Math.round(Number(v))}%`, String(name)];
        }}
      />
      {curve.length ? (
        <Area type="monotone" dataKey="band" name="95% band" stroke="none" fill={BAND} fillOpacity={0.55} isAnimationActive={false} />
      ) : null}
      {curve.length ? (
        <Line type="monotone" dataKey="p" name="Fitted curve" stroke={CURVE} strokeWidth={2.5} dot={false} isAnimationActive={false} />
      ) : null}
      <ReferenceLine y={50} stroke={THEME.lineStrong} strokeDasharray="4 4" />
      <ReferenceLine y={80} stroke={THEME.lineStrong} strokeDasharray="4 4" />
      {fit.fit?.at50 && fit.fit.at50.x >= lo && fit.fit.at50.x <= hi ? (
        <ReferenceLine
          x={fit.fit.at50.x}
          stroke={CURVE}
          strokeDasharray="3 3"
          label={{ value: `50% at ${fit.fit.at50.x}`, position: "top", fill: CURVE, fontSize: 11 }}
        />
      ) : null}
      {fit.fit?.at80 && fit.fit.at80.x >= lo && fit.fit.at80.x <= hi ? (
        <ReferenceLine
          x={fit.fit.at80.x}
          stroke={CURVE}
          strokeDasharray="3 3"
          label={{ value: `80% at ${fit.fit.at80.x}`, position: "insideTopRight", fill: CURVE, fontSize: 11 }}
        />
      ) : null}
      <Scatter data={bins} dataKey="p" name="Band of readings" fill={BINS} isAnimationActive={false}>
        <ErrorBar dataKey="err" direction="y" width={5} stroke={BINS} strokeWidth={1.5} />
      </Scatter>
    </ComposedChart>
  );
}
