// Showing and reading a site's end-play limits in either unit; the stored value is always inches.
import { inToMm, mmToIn, nearestSixtyFourth, parseLength, roundTo } from "@/lib/field/units";

export type PolicyUnit = "in" | "mm";

/** Plain decimal text without trailing zeros: 0.06250 → "0.0625". */
function trimmed(value: number, decimals: number): string {
  return roundTo(value, decimals)
    .toFixed(decimals)
    .replace(/\.?0+$/, "");
}

/** Inches to 5 places (the stored scale); millimetres to 4 (1/16 in = 1.5875 mm exactly). */
export function formatIn(inches: number): string {
  return trimmed(inches, 5);
}

export function formatMmFromIn(inches: number): string {
  return trimmed(inToMm(inches), 4);
}

/** The text an input shows for a stored limit in the chosen unit. */
export function limitText(inches: number, unit: PolicyUnit): string {
  return unit === "in" ? formatIn(inches) : formatMmFromIn(inches);
}

export type ReadLimit = { ok: true; inches: number } | { ok: false; error: string };

/** Reads what a person typed ("0.0625", "1/16", "1,5875") in the chosen unit, as inches. */
export function readLimit(text: string, unit: PolicyUnit): ReadLimit {
  const parsed = parseLength(text);
  if (!parsed.ok) return { ok: false, error: parsed.error };
  return { ok: true, inches: unit === "in" ? parsed.value : mmToIn(parsed.value) };
}

/** "0.0625 in · 1.5875 mm" */
export function bothUnits(inches: number): string {
  return `${formatIn(inches)} in · ${formatMmFromIn(inches)} mm`;
}

/** "1/16" when a limit sits on a 64th of an inch (to the stored 5 places), else null. */
export function tapeFraction(inches: number): string | null {
  const sixtyFourths = inches * 64;
  if (Math.round(sixtyFourths) === 0 || Math.abs(inches - Math.round(sixtyFourths) / 64) > 0.000005 + 1e-12) return null;
  return nearestSixtyFourth(inches).replace(/ in$/, "");
}
