// Clock positions on a ring: 0° = 12 o'clock, clockwise seen from the outboard end (as findings use).
// Their words are clockWords in lib/damage-map/geometry.ts.

export function normaliseDeg(deg: number): number {
  return ((Math.round(deg) % 360) + 360) % 360;
}

/** 3 o'clock → 90°, 12 o'clock → 0°. */
export function oClockToDeg(hour: number): number {
  if (!Number.isInteger(hour) || hour < 1 || hour > 12) throw new RangeError(`an o'clock hour is 1–12, not ${hour}`);
  return (hour % 12) * 30;
}

/** The nearest whole hour on the clock face: 95° → 3, 350° → 12. */
export function degToOClock(deg: number): number {
  const hour = Math.round(normaliseDeg(deg) / 30) % 12;
  return hour === 0 ? 12 : hour;
}
