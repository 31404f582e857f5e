// Lengths as the shop writes them: decimals from a dial, fractions from a tape.

/** Millimetres per inch, exact by definition (NIST SP 811). */
export const MM_PER_IN = 25.4;

export function inToMm(inches: number): number {
  return inches * MM_PER_IN;
}

export function mmToIn(mm: number): number {
  return mm / MM_PER_IN;
}

export type ParsedLength = { ok: true; value: number } | { ok: false; error: string };

const DECIMAL = /^([+-])?(\d+(?:[.,]\d*)?|[.,]\d+)$/;
// "3/64", "1 1/16", "1-1/16" (the hyphen joins whole and fraction, as on tape readings)
const FRACTION = /^([+-])?(?:(\d+)(?:\s+|-))?(\d+)\/(\d+)$/;

/**
 * Reads a length typed by a person. Accepts "0.031", ".031", "0,8" (comma decimal),
 * "3/64", "1 1/16" and "1-1/16". A leading "-" is kept so a dial reading below zero
 * can be reported as such rather than as unreadable.
 */
export function parseLength(input: number | string): ParsedLength {
  if (typeof input === "number") {
    return Number.isFinite(input) ? { ok: true, value: input } : { ok: false, error: "The value is not a finite number." };
  }
  const text = input.trim().replace(/\s+/g, " ");
  if (text === "") return { ok: false, error: "Nothing was entered." };

  const decimal = DECIMAL.exec(text);
  if (decimal) {
    const magnitude = Number(decimal[2].replace(",", "."));
    return { ok: true, value: decimal[1] === "-" ? -magnitude : magnitude };
  }

  const fraction = FRACTION.exec(text);
  if (fraction) {
    const [, sign, wholeText, numText, denText] = fraction;
    const numerator = Number(numText);
    const denominator = Number(denText);
    if (denominator === 0) {
      return { ok: false, error: `"${text}" divides by zero.` };
    }
    if (wholeText !== undefined && numerator >= denominator) {
      return { ok: false, error: `"${text}" is not a proper mixed number (write e.g. "1 1/16").` };
    }
    const magnitude = Number(wholeText ?? 0) + numerator / denominator;
    return { ok: true, value: sign === "-" ? -magnitude : magnitude };
  }

  return {
    ok: false,
    error: `"${text}" is not a length. Write a decimal such as 0.031 or 0,8, or a fraction such as 3/64 or 1 1/16.`,
  };
}

/** Rounds half away from zero at `decimals` places, on the decimal text (1.5875 → 1.588). */
export function roundTo(value: number, decimals: number): number {
  const magnitude = Math.abs(value);
  const factor = 10 ** decimals;
  // Shifting the decimal text avoids 1.5875 * 1000 = 1587.4999…; tiny or huge numbers print
  // in exponent form, where plain multiplication is exact enough.
  const rounded = String(magnitude).includes("e")
    ? Math.round(magnitude * factor) / factor
    : Number(`${Math.round(Number(`${magnitude}e${decimals}`))}e-${decimals}`);
  return value < 0 ? -rounded : rounded;
}

export function formatInches(inches: number): string {
  return `${roundTo(inches, 4).toFixed(4)} in`;
}

export function formatMm(mm: number): string {
  return `${roundTo(mm, 3).toFixed(3)} mm`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Nearest 1/64 in, reduced, as read off a tape: "3/64 in", "1/16 in", "1 1/32 in". */
export function nearestSixtyFourth(inches: number): string {
  const sixtyFourths = Math.round(Math.abs(inches) * 64);
  const sign = inches < 0 && sixtyFourths !== 0 ? "-" : "";
  const whole = Math.floor(sixtyFourths / 64);
  const rest = sixtyFourths % 64;
  if (rest === 0) return `${sign}${whole} in`;
  const divisor = gcd(rest, 64);
  const fraction = `${rest / divisor}/${64 / divisor}`;
  return whole === 0 ? `${sign}${fraction} in` : `${sign}${whole} ${fraction} in`;
}
