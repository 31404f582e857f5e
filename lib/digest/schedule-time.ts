// When the weekly digest is due: the most recent Monday 07:00 (server time) that has passed.
export const DIGEST_WEEKDAY = 1; // Monday (Date.getDay numbering)
export const DIGEST_HOUR = 7;

export function lastDigestSlot(now: Date, weekday = DIGEST_WEEKDAY, hour = DIGEST_HOUR): Date {
  const slot = new Date(now);
  slot.setHours(hour, 0, 0, 0);
  const back = (slot.getDay() - weekday + 7) % 7;
  slot.setDate(slot.getDate() - back);
  if (slot > now) slot.setDate(slot.getDate() - 7);
  return slot;
}

/** Due when no digest has gone out since the last slot. */
export function digestDue(now: Date, lastSent: Date | null): boolean {
  const slot = lastDigestSlot(now);
  return lastSent === null || lastSent < slot;
}
