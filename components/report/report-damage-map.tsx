// The damage map as SVG on the printable report: the same kit (geometry, rings, colours, words) as the PDF.
import { bandPath, clockPoint, HOUR_TICKS } from "@/lib/damage-map/geometry";
import {
  LOAD_ZONE_INK,
  offMapWords,
  READING_NOTE,
  RING_BANDS,
  RING_NAMES,
  ROW_NAMES,
  SEVERITY_COLOURS,
  SEVERITY_KEYS,
  severityColour,
} from "@/lib/damage-map/look";
import type { DamageArc } from "@/lib/report/types";

const R = 66;

function Rings({ arcs, row, cx, cy }: { arcs: DamageArc[]; row: "inboard" | "outboard"; cx: number; cy: number }) {
  return (
    <g>
      {(["cup", "cone"] as const).map((ring) => (
        <path
          key={ring}
          d={bandPath(cx, cy, RING_BANDS[ring][0] * R, RING_BANDS[ring][1] * R, 0, 360)}
          fill="#f1f5f9"
          fillRule="evenodd"
          stroke="#cbd5e1"
          strokeWidth={0.8}
        />
      ))}
      {arcs
        .filter((a) => a.row === row)
        .map((a, i) => (
          <path
            key={i}
            d={bandPath(cx, cy, RING_BANDS[a.ring][0] * R, RING_BANDS[a.ring][1] * R, a.startDeg, a.endDeg)}
            fill={severityColour(a.severity)}
            fillOpacity={0.92}
          >
            <title>{`${a.label} · severity ${a.severity}${a.estimated ? " · extent not recorded" : ""}`}</title>
          </path>
        ))}
      {HOUR_TICKS.map((t) => {
        const [x0, y0] = clockPoint(cx, cy, R * 0.98, t.deg);
        const [x1, y1] = clockPoint(cx, cy, R * (t.major ? 1.07 : 1.03), t.deg);
        const [lx, ly] = clockPoint(cx, cy, R * 1.19, t.deg);
        return (
          <g key={t.deg}>
            <line x1={x0} y1={y0} x2={x1} y2={y1} stroke="#64748b" strokeWidth={0.8} />
            {t.major ? (
              <text x={lx} y={ly + 3} textAnchor="middle" fontSize={8} fontWeight={700} fill="#334155">
                {t.label}
              </text>
            ) : null}
          </g>
        );
      })}
      <text x={cx + 8} y={cy - R * 1.2} fontSize={6.5} fill={LOAD_ZONE_INK}>
        load zone
      </text>
      <text x={cx} y={cy + R * 0.85 + 2.5} textAnchor="middle" fontSize={6.5} fontWeight={700} fill="#334155">
        {RING_NAMES.cup}
      </text>
      <text x={cx} y={cy + R * 0.53 + 2.5} textAnchor="middle" fontSize={6.5} fontWeight={700} fill="#334155">
        {RING_NAMES.cone}
      </text>
      <text x={cx} y={cy + 2.5} textAnchor="middle" fontSize={7} letterSpacing={0.6} fill="#64748b">
        {row.toUpperCase()}
      </text>
    </g>
  );
}

export function ReportDamageMap({ arcs, offMap }: { arcs: DamageArc[]; offMap: number }) {
  return (
    <div className="tl-keep flex flex-col gap-4 sm:flex-row sm:items-start">
      <svg
        viewBox="0 0 360 194"
        className="w-full max-w-[30rem]"
        role="img"
        aria-label={`Damage map: ${arcs.length} arcs on the cup and cone raceways`}
      >
        <Rings arcs={arcs} row="inboard" cx={90} cy={88} />
        <Rings arcs={arcs} row="outboard" cx={270} cy={88} />
        <text x={90} y={189} textAnchor="middle" fontSize={9.5} fontWeight={700} fill="#0f172a">
          {ROW_NAMES.inboard}
        </text>
        <text x={270} y={189} textAnchor="middle" fontSize={9.5} fontWeight={700} fill="#0f172a">
          {ROW_NAMES.outboard}
        </text>
      </svg>
      <div className="min-w-0 text-xs text-muted sm:w-56">
        <p className="mb-1.5 font-semibold uppercase tracking-wide">Severity</p>
        <ul className="mb-3 space-y-1">
          {SEVERITY_COLOURS.map((c, i) => (
            <li key={c} className="flex items-center gap-2 text-ink-2">
              <span className="inline-block h-2.5 w-4 rounded-sm" style={{ background: c }} aria-hidden />
              {SEVERITY_KEYS[i]}
            </li>
          ))}
        </ul>
        <p>{READING_NOTE} Each arc is centred on the recorded clock position; a finding without an extent shows as a short mark.</p>
        <p className="mt-1.5">{offMapWords(offMap)}</p>
      </div>
    </div>
  );
}
