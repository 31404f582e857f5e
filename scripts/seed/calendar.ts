// Dates for the invented casebook: plain ISO days for the removal, timestamps for the stages.
import type { Rng } from "./prng";

/** The demo casebook ends here: every case was removed, received, proposed or signed before it. */
export const DEMO_NOW = new Date("2026-11-30T16:00:00Z");
export const DAY_MS = 86_400_000;
/** The mean month Tearline's service life uses (365.2425 / 12 days). */
export const DAYS_PER_MONTH = 30.436875;

export function isoDay(d: Date): string {
  return d.toISOString().slice(0, 10);
}

export function addDays(day: string, days: number): string {
  return isoDay(new Date(Date.parse(`${day}T00:00:00Z`) + Math.round(days) * DAY_MS));
}

export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / DAY_MS);
}

/** A day picked evenly between two days, both included. */
export function dayBetween(rng: Rng, from: string, to: string): string {
  return addDays(from, rng.int(0, daysBetween(from, to)));
}

/** A time during the shop's working day (06:00–17:59 UTC) on the given day. */
export function workTime(rng: Rng, day: string): Date {
  return new Date(Date.parse(`${day}T00:00:00Z`) + rng.int(6 * 60, 17 * 60 + 59) * 60_000);
}

/** A working-day time some days after `after`, never later than `limit`. */
export function laterTime(rng: Rng, after: Date, minDays: number, maxDays: number, limit: Date = DEMO_NOW): Date {
  const room = (limit.getTime() - after.getTime()) / DAY_MS;
  const days = Math.min(rng.int(minDays, maxDays), Math.max(0, Math.floor(room)));
  let t = workTime(rng, addDays(isoDay(after), days));
  if (t <= after) t = new Date(after.getTime() + rng.int(20, 180) * 60_000);
  return t > limit ? new Date(after.getTime() + (limit.getTime() - after.getTime()) / 2) : t;
}

export function yearMonth(day: string): string {
  return day.slice(0, 7);
}
