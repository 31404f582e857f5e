// Where damage sits on the raceways, drawn as seen from the outboard end: one disc per row, the
// cup raceway as the outer band and the cone raceway as the inner band, 12 o'clock at the top,
// the load zone marked on the cup. Give `findings` for one case (each finding its own arc), or
// `sectors` for many cases summed (shaded by how many findings touch each clock sector).
import { damageLabel } from "@/lib/classification/labels";
import { bandPath, clockPoint, clockWords, HOUR_TICKS } from "@/lib/damage-map/geometry";
import {
  arcOf,
  HEAT_COLOURS,
  heatColour,
  LOAD_ZONE_COLOUR,
  LOAD_ZONE_HALF_DEG,
  LOAD_ZONE_INK,
  offMapWords,
  RING_BANDS,
  RING_LABELS,
  RING_NAMES,
  ringKindOf,
  SEVERITY_COLOURS,
  SEVERITY_KEYS,
  severityColour,
  severityWord,
} from "@/lib/damage-map/look";
import { ringsOf, type RingId, type SectorCell } from "@/lib/damage-map/rings";

export type DamageMapFinding = {
  component: string;
  row?: string | null;
  clockDeg?: number | null;
  arcDeg?: number | null;
  severity: number;
  damageCode?: string | null;
};

export type DamageMapProps = {
  title: string;
  findings?: readonly DamageMapFinding[];
  sectors?: readonly SectorCell[];
  sectorDeg?: number;
  /** Extra words under the drawing. */
  caption?: string;
  className?: string;
};

const R = 78;
const DISCS = [
  { row: "inboard", cx: 106, cup: "cup-inboard", cone: "cone-inboard" },
  { row: "outboard", cx: 324, cup: "cup-outboard", cone: "cone-outboard" },
] as const;
// Rounded so the server's and the browser's trigonometry draw identical markup.
const at = (cx: number, r: number, deg: number) => clockPoint(cx, CY, r, deg).map((v) => Math.round(v * 100) / 100);
const BANDS = RING_BANDS;
const CY = 112;

const bandOf = (ring: RingId): readonly [number, number] => RING_BANDS[ringKindOf(ring)];
function discOf(ring: RingId) {
  return DISCS.find((d) => d.cup === ring || d.cone === ring)!;
}

function Disc({ cx, row }: { cx: number; row: string }) {
  const zone = bandPath(cx, CY, R * 0.985, R * 1.06, -LOAD_ZONE_HALF_DEG, LOAD_ZONE_HALF_DEG);
  return (
    <g>
      <path d={zone} fill={LOAD_ZONE_COLOUR} fillOpacity={0.35} />
      {(["cup", "cone"] as const).map((b) => (
        <g key={b}>
          <circle
            cx={cx}
            cy={CY}
            r={((BANDS[b][0] + BANDS[b][1]) / 2) * R}
            fill="none"
            stroke="var(--surface-2, #f1f5f9)"
            strokeWidth={(BANDS[b][1] - BANDS[b][0]) * R}
          />
          <circle cx={cx} cy={CY} r={BANDS[b][1] * R} fill="none" stroke="var(--line-strong, #cbd5e1)" strokeWidth={0.8} />
          <circle cx={cx} cy={CY} r={BANDS[b][0] * R} fill="none" stroke="var(--line-strong, #cbd5e1)" strokeWidth={0.8} />
        </g>
      ))}
      {HOUR_TICKS.map((t) => {
        const [x0, y0] = at(cx, R * 0.97, t.deg);
        const [x1, y1] = at(cx, R * (t.major ? 1.09 : 1.04), t.deg);
        const [lx, ly] = at(cx, R * 1.19, t.deg);
        return (
          <g key={t.deg}>
            <line x1={x0} y1={y0} x2={x1} y2={y1} stroke="var(--muted, #64748b)" strokeWidth={0.8} />
            {t.major ? (
              <text x={lx} y={ly + 4} textAnchor="middle" fontSize={11} fontWeight={700} fill="var(--ink-2, #334155)">
                {t.label}
              </text>
            ) : null}
          </g>
        );
      })}
      <text x={cx} y={CY + 4} textAnchor="middle" fontSize={10} fontWeight={600} fill="var(--ink-2, #334155)">
        {row === "inboard" ? "Inboard" : "Outboard"}
      </text>
      <text x={cx} y={CY + 16} textAnchor="middle" fontSize={8} fill="var(--muted, #64748b)">
        row
      </text>
    </g>
  );
}

/** Ring names drawn over the damage, with a halo so they stay legible. */
function RingNames({ cx }: { cx: number }) {
  const halo = { stroke: "var(--surface, #ffffff)", strokeWidth: 2.5, paintOrder: "stroke" as const, strokeLinejoin: "round" as const };
  // Each name sits on its own band: the cup's outer ring, the cone's inner one.
  const at = [
    ["cup", 0.85],
    ["cone", 0.53],
  ] as const;
  return (
    <g>
      {at.map(([ring, radius]) => (
        <text
          key={ring}
          x={cx}
          y={CY + R * radius + 3}
          textAnchor="middle"
          fontSize={8}
          fontWeight={700}
          letterSpacing={0.6}
          fill="var(--muted, #64748b)"
          {...halo}
        >
          {RING_NAMES[ring]}
        </text>
      ))}
    </g>
  );
}

const LEGEND_WORDS = SEVERITY_KEYS;
// Each key as wide as its words (about 4.9 px a character at 9 px), so long words never overlap.
const LEGEND_X = LEGEND_WORDS.reduce<number[]>((xs, w, i) => [...xs, i === 0 ? 0 : xs[i - 1] + 24 + LEGEND_WORDS[i - 1].length * 4.9], []);

function describe(f: DamageMapFinding): string {
  const code = f.damageCode ? damageLabel(f.damageCode) : "Finding";
  const at = f.clockDeg === null || f.clockDeg === undefined ? "" : ` at ${clockWords(f.clockDeg)}`;
  const arc = f.arcDeg ? `, ${f.arcDeg}° arc` : ", extent not recorded";
  return `${code}${at}${arc} · severity ${f.severity} (${severityWord(f.severity)})`;
}

export function DamageMap({ title, findings, sectors, sectorDeg = 10, caption, className = "" }: DamageMapProps) {
  const summed = sectors !== undefined;
  const max = summed ? Math.max(0, ...sectors.map((s) => s.findings)) : 0;
  const offMap = findings
    ? findings.filter((f) => ringsOf(f.component, f.row).length === 0 || f.clockDeg === null || f.clockDeg === undefined).length
    : 0;
  const placed = findings ? findings.length - offMap : 0;
  const label = summed
    ? `${title}: ${sectors.reduce((s, c) => s + c.findings, 0)} finding-sectors on the cup and cone raceways`
    : `${title}: ${placed} findings placed on the cup and cone raceways${offMap ? `, ${offMap} elsewhere` : ""}`;
  return (
    <figure className={`min-w-0 ${className}`}>
      <svg viewBox="0 0 430 262" className="h-auto w-full max-w-[36rem]" role="img" aria-label={label} data-export data-damage-map>
        <title>{title}</title>
        {DISCS.map((d) => (
          <Disc key={d.row} cx={d.cx} row={d.row} />
        ))}
        {summed
          ? sectors.map((s) => {
              const d = discOf(s.ring);
              const [a, b] = bandOf(s.ring);
              return (
                <path
                  key={`${s.ring}-${s.sector}`}
                  d={bandPath(d.cx, CY, a * R, b * R, s.sector * sectorDeg, (s.sector + 1) * sectorDeg)}
                  fill={heatColour(s.findings, max)}
                >
                  <title>{`${RING_LABELS[s.ring]}, ${clockWords(s.sector * sectorDeg)} to ${clockWords((s.sector + 1) * sectorDeg)}: ${s.findings} finding${s.findings === 1 ? "" : "s"}, worst severity ${s.maxSeverity}`}</title>
                </path>
              );
            })
          : (findings ?? []).flatMap((f, i) =>
              f.clockDeg === null || f.clockDeg === undefined
                ? []
                : ringsOf(f.component, f.row).map((ring) => {
                    const d = discOf(ring);
                    const [a, b] = bandOf(ring);
                    const { startDeg, endDeg } = arcOf(f.clockDeg!, f.arcDeg);
                    return (
                      <path
                        key={`${i}-${ring}`}
                        d={bandPath(d.cx, CY, a * R + 1, b * R - 1, startDeg, endDeg)}
                        fill={severityColour(f.severity)}
                        fillOpacity={0.9}
                        stroke="#ffffff"
                        strokeWidth={0.6}
                      >
                        <title>{describe(f)}</title>
                      </path>
                    );
                  }),
            )}
        {DISCS.map((d) => (
          <RingNames key={d.row} cx={d.cx} />
        ))}
        {DISCS.map((d) => (
          <text key={d.row} x={Math.round(d.cx + R * 0.5)} y={Math.round(CY - R * 1.1)} fontSize={8} fill={LOAD_ZONE_INK}>
            load zone
          </text>
        ))}
        <g transform="translate(12 236)">
          {summed
            ? [
                <text key="l" x={0} y={9} fontSize={9} fill="var(--muted, #64748b)">
                  Fewer
                </text>,
                ...HEAT_COLOURS.map((c, i) => <rect key={c} x={34 + i * 22} y={1} width={20} height={10} rx={2} fill={c} />),
                <text
                  key="r"
                  x={34 + HEAT_COLOURS.length * 22 + 4}
                  y={9}
                  fontSize={9}
                  fill="var(--muted, #64748b)"
                >{`more findings (most: ${max})`}</text>,
              ]
            : SEVERITY_COLOURS.map((c, i) => (
                <g key={c} transform={`translate(${Math.round(LEGEND_X[i])} 0)`}>
                  <rect x={0} y={1} width={12} height={10} rx={2} fill={c} />
                  <text x={16} y={9.5} fontSize={9} fill="var(--muted, #64748b)">
                    {LEGEND_WORDS[i]}
                  </text>
                </g>
              ))}
        </g>
      </svg>
      <figcaption className="mt-2 max-w-[34rem] text-xs leading-relaxed text-muted">
        Seen from the outboard end, 12 o&apos;clock at the top, clockwise.{" "}
        {summed ? `Each ${sectorDeg}° sector is shaded by how many findings touch it.` : "Each arc is centred on its clock position."}
        {!summed && offMap ? ` ${offMapWords(offMap)}` : ""}
        {caption ? ` ${caption}` : ""}
      </figcaption>
    </figure>
  );
}
