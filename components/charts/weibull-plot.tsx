// A Weibull probability plot on our own paper: log life across, ln(-ln(1-F)) up, so a Weibull
// population falls on a straight line whose slope is the shape. Points are median ranks of the
// failures (suspensions shift the ranks); the line is the maximum-likelihood fit.
const W = 640;
const H = 400;
// Text sized for the plot drawn at phone width (about half its 640 units), still legible there.
const M = { left: 64, right: 18, top: 16, bottom: 54 };
const F_TICKS = [0.01, 0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.632, 0.8, 0.9, 0.95, 0.99];
const r2 = (v: number) => Math.round(v * 100) / 100;

export type WeibullPlotProps = {
  points: readonly { time: number; medianRank: number }[];
  line: readonly { time: number; y: number }[];
  beta: number;
  eta: number;
  b10: number;
  unit: string;
  title: string;
};

const yOfF = (f: number) => Math.log(-Math.log(1 - f));

function fmtTime(v: number): string {
  if (v >= 1_000_000) return `${v / 1_000_000}M`;
  if (v >= 1000) return `${v / 1000}k`;
  return String(v);
}

export function WeibullPlot({ points, line, beta, eta, b10, unit, title }: WeibullPlotProps) {
  const times = [...points.map((p) => p.time), ...line.map((l) => l.time), b10, eta].filter((t) => t > 0);
  const lo = Math.floor(Math.log10(Math.min(...times)));
  const hi = Math.ceil(Math.log10(Math.max(...times)));
  const xMin = lo;
  const xMax = hi === lo ? lo + 1 : hi;
  const yMin = yOfF(0.005);
  const yMax = yOfF(0.999);
  const px = (t: number) => r2(M.left + ((Math.log10(t) - xMin) / (xMax - xMin)) * (W - M.left - M.right));
  const py = (y: number) => r2(H - M.bottom - ((y - yMin) / (yMax - yMin)) * (H - M.top - M.bottom));
  const inside = (y: number) => y >= yMin && y <= yMax;
  const decades = Array.from({ length: xMax - xMin + 1 }, (_, i) => 10 ** (xMin + i));
  const minors = decades.slice(0, -1).flatMap((d) => [2, 3, 5, 7].map((k) => d * k));
  const fit = line.filter((l) => inside(l.y));
  const b10y = py(yOfF(0.1));
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className="h-auto w-full"
      role="img"
      aria-label={`${title}: shape ${beta.toFixed(2)}, scale ${eta.toFixed(1)} ${unit}, B10 ${b10.toFixed(1)} ${unit}`}
      data-export
      data-weibull-plot
    >
      <title>{title}</title>
      <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} fill="var(--surface-2, #f8fafc)" />
      {minors.map((t) => (
        <line key={`m${t}`} x1={px(t)} x2={px(t)} y1={M.top} y2={H - M.bottom} stroke="var(--line, #e2e8f0)" strokeWidth={0.6} />
      ))}
      {decades.map((t) => (
        <g key={`d${t}`}>
          <line x1={px(t)} x2={px(t)} y1={M.top} y2={H - M.bottom} stroke="var(--line-strong, #cbd5e1)" />
          <text x={px(t)} y={H - M.bottom + 19} textAnchor="middle" fontSize={14} fill="var(--muted, #64748b)">
            {fmtTime(t)}
          </text>
        </g>
      ))}
      {F_TICKS.map((f) => (
        <g key={f}>
          <line
            x1={M.left}
            x2={W - M.right}
            y1={py(yOfF(f))}
            y2={py(yOfF(f))}
            stroke={f === 0.632 ? "var(--muted, #64748b)" : "var(--line-strong, #cbd5e1)"}
            strokeDasharray={f === 0.632 ? "4 3" : undefined}
            strokeWidth={f === 0.632 ? 0.8 : 0.6}
          />
          <text x={M.left - 6} y={py(yOfF(f)) + 4} textAnchor="end" fontSize={14} fill="var(--muted, #64748b)">
            {f === 0.632 ? "63.2" : Math.round(f * 100)}
          </text>
        </g>
      ))}
      <text
        x={(M.left + W - M.right) / 2}
        y={H - 8}
        textAnchor="middle"
        fontSize={15}
        fill="var(--ink-2, #334155)"
      >{`Life at removal (${unit}, log scale)`}</text>
      <text
        transform={`translate(14 ${(M.top + H - M.bottom) / 2}) rotate(-90)`}
        textAnchor="middle"
        fontSize={15}
        fill="var(--ink-2, #334155)"
      >
        Share failed F (%, Weibull scale)
      </text>
      {fit.length > 1 ? (
        <polyline points={fit.map((l) => `${px(l.time)},${py(l.y)}`).join(" ")} fill="none" stroke="#b45309" strokeWidth={2.2} />
      ) : null}
      {b10 > 10 ** xMin ? (
        <g>
          <line x1={M.left} x2={px(b10)} y1={b10y} y2={b10y} stroke="#dc2626" strokeDasharray="5 4" strokeWidth={1.2} />
          <line x1={px(b10)} x2={px(b10)} y1={b10y} y2={H - M.bottom} stroke="#dc2626" strokeDasharray="5 4" strokeWidth={1.2} />
          <text
            x={px(b10) + 5}
            y={H - M.bottom - 6}
            fontSize={14}
            fontWeight={600}
            fill="#dc2626"
          >{`B10 ${b10 < 100 ? b10.toFixed(1) : Math.round(b10).toLocaleString("en-US")}`}</text>
        </g>
      ) : null}
      {points
        .filter((p) => inside(yOfF(p.medianRank)))
        .map((p, i) => (
          <circle
            key={i}
            cx={px(p.time)}
            cy={py(yOfF(p.medianRank))}
            r={3.4}
            fill="var(--surface, #ffffff)"
            stroke="var(--ink-2, #334155)"
            strokeWidth={1.4}
          >
            <title>{`${p.time.toLocaleString("en-US")} ${unit}: median rank ${(p.medianRank * 100).toFixed(1)}%`}</title>
          </circle>
        ))}
      <rect
        x={M.left}
        y={M.top}
        width={W - M.left - M.right}
        height={H - M.top - M.bottom}
        fill="none"
        stroke="var(--line-strong, #cbd5e1)"
      />
    </svg>
  );
}

export const WEIBULL_LEGEND = [
  { label: "Failures at their median ranks", colour: "#334155" },
  { label: "Maximum-likelihood line", colour: "#b45309" },
  { label: "B10: life by which 10% have failed", colour: "#dc2626" },
];
