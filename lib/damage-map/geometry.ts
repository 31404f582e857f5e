// SVG geometry for clock-face drawings: 0° at 12 o'clock, angles growing clockwise.

export function clockPoint(cx: number, cy: number, r: number, deg: number): [number, number] {
  const rad = (deg * Math.PI) / 180;
  return [cx + r * Math.sin(rad), cy - r * Math.cos(rad)];
}

const f = (n: number) => Number(n.toFixed(2));

/** Path of an annular sector from `startDeg` clockwise to `endDeg` between two radii. */
export function annularSector(cx: number, cy: number, rInner: number, rOuter: number, startDeg: number, endDeg: number): string {
  let sweep = endDeg - startDeg;
  if (sweep >= 360) sweep = 359.99;
  if (sweep <= 0) sweep = 0.5;
  const end = startDeg + sweep;
  const large = sweep > 180 ? 1 : 0;
  const [x1, y1] = clockPoint(cx, cy, rOuter, startDeg);
  const [x2, y2] = clockPoint(cx, cy, rOuter, end);
  const [x3, y3] = clockPoint(cx, cy, rInner, end);
  const [x4, y4] = clockPoint(cx, cy, rInner, startDeg);
  return `M${f(x1)} ${f(y1)}A${f(rOuter)} ${f(rOuter)} 0 ${large} 1 ${f(x2)} ${f(y2)}L${f(x3)} ${f(y3)}A${f(rInner)} ${f(rInner)} 0 ${large} 0 ${f(x4)} ${f(y4)}Z`;
}

/** Clock-face hour for a position in degrees, e.g. 90 -> "3 o'clock", 45 -> "1:30". */
export function clockWords(deg: number): string {
  const minutes = Math.round((((deg % 360) + 360) % 360) * 2) % 720; // 0.5° per minute of the hour hand
  const hour = Math.floor(minutes / 60) || 12;
  const min = minutes % 60;
  return min === 0 ? `${hour} o'clock` : `${hour}:${String(min).padStart(2, "0")}`;
}
