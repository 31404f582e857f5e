// The clock face's geometry, shared by every damage drawing (case page, tallies, printable
// report, PDF): 0° at 12 o'clock, angles growing clockwise as seen from the outboard end, in
// screen coordinates (y grows down). Paths are SVG path text, which browsers and pdfkit both draw.

/** A point on a circle at a clock angle. */
export function clockPoint(cx: number, cy: number, r: number, deg: number): [number, number] {
  const rad = (deg * Math.PI) / 180;
  return [cx + r * Math.sin(rad), cy - r * Math.cos(rad)];
}

/** Rounded to 0.01 so the server's and the browser's trigonometry write identical markup. */
const n = (v: number) => Number(v.toFixed(2));

/** Narrowest band drawn, so a zero-width finding still shows. */
const MIN_SWEEP_DEG = 0.5;

/** A band between two radii from `startDeg` clockwise to `endDeg`, as a closed SVG path. */
export function bandPath(cx: number, cy: number, rInner: number, rOuter: number, startDeg: number, endDeg: number): string {
  const sweep = Math.max(MIN_SWEEP_DEG, Math.min(360, endDeg - startDeg));
  if (sweep >= 359.99) {
    // A full ring: two half circles out, two back in (a single arc cannot close on itself).
    const ring = (r: number, dir: 0 | 1) => {
      const [x0, y0] = clockPoint(cx, cy, r, 0);
      const [x1, y1] = clockPoint(cx, cy, r, 180);
      return `M ${n(x0)} ${n(y0)} A ${n(r)} ${n(r)} 0 1 ${dir} ${n(x1)} ${n(y1)} A ${n(r)} ${n(r)} 0 1 ${dir} ${n(x0)} ${n(y0)} Z`;
    };
    return `${ring(rOuter, 1)} ${ring(rInner, 0)}`;
  }
  const large = sweep > 180 ? 1 : 0;
  const [ox0, oy0] = clockPoint(cx, cy, rOuter, startDeg);
  const [ox1, oy1] = clockPoint(cx, cy, rOuter, startDeg + sweep);
  const [ix1, iy1] = clockPoint(cx, cy, rInner, startDeg + sweep);
  const [ix0, iy0] = clockPoint(cx, cy, rInner, startDeg);
  return [
    `M ${n(ox0)} ${n(oy0)}`,
    `A ${n(rOuter)} ${n(rOuter)} 0 ${large} 1 ${n(ox1)} ${n(oy1)}`,
    `L ${n(ix1)} ${n(iy1)}`,
    `A ${n(rInner)} ${n(rInner)} 0 ${large} 0 ${n(ix0)} ${n(iy0)}`,
    "Z",
  ].join(" ");
}

/** Hour ticks 12, 1 … 11 as angles; the quarter hours (12, 3, 6, 9) are the labelled ones. */
export const HOUR_TICKS = Array.from({ length: 12 }, (_, h) => ({ deg: h * 30, label: h === 0 ? "12" : String(h), major: h % 3 === 0 }));

/** A clock position in the shop's words, to the nearest half hour with the degrees: 60° → "2 o'clock (60°)", 75° → "2:30 (75°)". */
export function clockWords(deg: number): string {
  const d = ((Math.round(deg) % 360) + 360) % 360;
  const halfHours = Math.round(d / 15) % 24;
  const hour = Math.floor(halfHours / 2) || 12;
  return halfHours % 2 === 0 ? `${hour} o'clock (${d}°)` : `${hour}:30 (${d}°)`;
}
