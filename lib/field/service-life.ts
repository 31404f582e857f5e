// Service since mounting, wheel revolutions, and the ISO 281 basic rating life.

/** Mean Gregorian month: 365.2425 days / 12 (arithmetic). */
export const DAYS_PER_MEAN_MONTH = 30.436875;
const MS_PER_DAY = 86_400_000;
const INCHES_PER_MILE = 63_360;

function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive number; got ${value}.`);
  }
}

function requireNonNegative(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be zero or a positive number; got ${value}.`);
  }
}

/** Day number (UTC) of a "YYYY-MM-DD" date, refusing impossible dates such as 2023-02-30. */
function dayNumber(name: string, text: string): number {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
  if (!match) throw new RangeError(`${name} must be a date written YYYY-MM-DD; got "${text}".`);
  const [year, month, day] = match.slice(1).map(Number);
  const ms = Date.UTC(year, month - 1, day);
  const date = new Date(ms);
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day) {
    throw new RangeError(`${name} "${text}" is not a real calendar date.`);
  }
  return ms / MS_PER_DAY;
}

/** Months in service: whole days between the dates divided by the mean Gregorian month. */
export function monthsBetween(mounted: string, removed: string): number {
  const days = dayNumber("Date removed", removed) - dayNumber("Date mounted", mounted);
  if (days < 0) throw new RangeError(`Date removed (${removed}) is before date mounted (${mounted}).`);
  return days / DAYS_PER_MEAN_MONTH;
}

/** One wheel revolution rolls π·d inches; a mile is 63 360 in. */
export function wheelRevolutionsPerMile(diameterIn: number): number {
  requirePositive("Wheel diameter (in)", diameterIn);
  return INCHES_PER_MILE / (Math.PI * diameterIn);
}

export function wheelRevolutions(miles: number, diameterIn: number): number {
  requireNonNegative("Miles", miles);
  return miles * wheelRevolutionsPerMile(diameterIn);
}

export type RollingElement = "roller" | "ball";

/**
 * Basic rating life L10 in millions of revolutions, ISO 281:2007: (C/P)^p with
 * p = 10/3 for roller bearings and 3 for ball bearings. C and P in the same unit.
 */
export function basicRatingLifeL10(dynamicRatingC: number, equivalentLoadP: number, kind: RollingElement): number {
  requirePositive("Basic dynamic load rating C", dynamicRatingC);
  requirePositive("Equivalent dynamic load P", equivalentLoadP);
  const exponent = kind === "roller" ? 10 / 3 : 3;
  return (dynamicRatingC / equivalentLoadP) ** exponent;
}

/** L10 (millions of revolutions) as miles on a wheel of the given diameter. */
export function l10Miles(l10MillionRevs: number, diameterIn: number): number {
  requirePositive("L10 (millions of revolutions)", l10MillionRevs);
  return (l10MillionRevs * 1e6) / wheelRevolutionsPerMile(diameterIn);
}
