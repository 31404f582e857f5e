"use client";
// Wheelset position as a picture: a four-axle car seen from above, B end at the left. Our own drawing.
// The eight positions are real buttons (44 px and more, for gloves) placed over the axles; the drawing
// between them only shows where they are, so nothing in it can cover a label at any width.
type Side = "L" | "R";
type Props = { axle: number | null | undefined; side: Side | null | undefined; onPick: (axle: number, side: Side) => void };

/** Axle centres across the picture, percent of its width (two trucks of two axles). */
const AXLE_AT = [12, 32, 68, 88];

function Chip({ n, s, active, onPick }: { n: number; s: Side; active: boolean; onPick: (axle: number, side: Side) => void }) {
  return (
    <button
      type="button"
      aria-pressed={active}
      aria-label={`${n}${s}: Axle ${n} ${s === "L" ? "left" : "right"}`}
      onClick={() => onPick(n, s)}
      style={{ left: `${AXLE_AT[n - 1]}%` }}
      className={`absolute top-0 h-12 w-12 -translate-x-1/2 rounded-lg border-2 text-sm font-bold transition focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent ${
        active
          ? "border-accent bg-accent text-accent-ink"
          : "border-line-strong bg-surface text-ink hover:border-accent hover:bg-accent-soft"
      }`}
    >
      {n}
      {s}
    </button>
  );
}

function ChipRow({ s, axle, side, onPick }: Props & { s: Side }) {
  return (
    <div className="relative h-12">
      {AXLE_AT.map((_, i) => (
        <Chip key={i} n={i + 1} s={s} active={axle === i + 1 && side === s} onPick={onPick} />
      ))}
    </div>
  );
}

export function AxlePicker(props: Props) {
  return (
    <div role="group" aria-label="Wheelset position: choose axle and side" className="w-full max-w-md select-none">
      <div className="mb-1 flex justify-between text-xs font-medium text-muted" aria-hidden>
        <span>◀ B end</span>
        <span>A end ▶</span>
      </div>
      <ChipRow s="L" {...props} />
      <svg className="block h-24 w-full overflow-visible" aria-hidden>
        <rect x="1%" y="14" width="98%" height="68" rx="8" className="fill-surface-2 stroke-line-strong" strokeWidth="2" />
        {[
          [4, 40],
          [60, 96],
        ].map(([from, to]) => (
          <rect
            key={from}
            x={`${from}%`}
            y="24"
            width={`${to - from}%`}
            height="48"
            rx="6"
            className="fill-none stroke-line-strong"
            strokeDasharray="4 3"
          />
        ))}
        {AXLE_AT.map((x, i) => (
          <g key={x}>
            <line x1={`${x}%`} y1="2" x2={`${x}%`} y2="94" className="stroke-ink-2" strokeWidth="3" />
            {[14, 76].map((y) => (
              <rect key={y} x={`${x - 2.5}%`} y={y} width="5%" height="6" rx="2" className="fill-ink-2" />
            ))}
            {/* A halo in the body colour keeps the axle line from crossing its label. */}
            <text
              x={`${x}%`}
              y="52"
              textAnchor="middle"
              className="fill-ink-2 stroke-surface-2 text-[11px] font-semibold"
              strokeWidth="5"
              paintOrder="stroke"
              strokeLinejoin="round"
            >
              Axle {i + 1}
            </text>
          </g>
        ))}
      </svg>
      <ChipRow s="R" {...props} />
      <p className="mt-2 text-xs text-muted">Axles numbered from the B end; L and R seen standing at the B end facing the A end.</p>
    </div>
  );
}
