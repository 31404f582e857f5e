"use client";
// Wheelset position as a picture: a four-axle car seen from above, A end at the left. Our own drawing.
type Props = { axle: number | null | undefined; side: "L" | "R" | null | undefined; onPick: (axle: number, side: "L" | "R") => void };

const AXLE_X = [70, 130, 290, 350];

export function AxlePicker({ axle, side, onPick }: Props) {
  return (
    <div>
      <svg viewBox="0 0 420 150" className="w-full max-w-md select-none" role="group" aria-label="Wheelset position: choose axle and side">
        <rect x="30" y="45" width="360" height="60" rx="8" className="fill-surface-2 stroke-line-strong" strokeWidth="2" />
        <text x="40" y="80" className="fill-muted text-[11px]">B end</text>
        <text x="350" y="80" className="fill-muted text-[11px]">A end</text>
        {[100, 320].map((x) => (
          <rect key={x} x={x - 50} y="55" width="100" height="40" rx="6" className="fill-none stroke-line-strong" strokeDasharray="4 3" />
        ))}
        {AXLE_X.map((x, i) => (
          <g key={x}>
            <line x1={x} y1="28" x2={x} y2="122" className="stroke-ink-2" strokeWidth="3" />
            <text x={x} y="146" textAnchor="middle" className="fill-ink-2 text-[12px] font-semibold">Axle {i + 1}</text>
            {(["L", "R"] as const).map((s) => {
              const y = s === "L" ? 6 : 118;
              const active = axle === i + 1 && side === s;
              return (
                <g key={s} onClick={() => onPick(i + 1, s)} className="cursor-pointer" role="button" aria-pressed={active} aria-label={`${i + 1}${s}: Axle ${i + 1} ${s === "L" ? "left" : "right"}`} tabIndex={0} onKeyDown={(e) => (e.key === "Enter" || e.key === " ") && onPick(i + 1, s)}>
                  <rect x={x - 22} y={y} width="44" height="26" rx="6" className={active ? "fill-accent stroke-accent" : "fill-surface stroke-line-strong hover:fill-accent-soft"} strokeWidth="2" />
                  <text x={x} y={y + 18} textAnchor="middle" className={`text-[13px] font-bold ${active ? "fill-accent-ink" : "fill-ink"}`}>
                    {i + 1}{s}
                  </text>
                </g>
              );
            })}
          </g>
        ))}
      </svg>
      <p className="mt-1 text-xs text-muted">Axles numbered from the B end; L and R seen standing at the B end facing the A end.</p>
    </div>
  );
}
