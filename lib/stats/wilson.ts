import { twoSidedZ } from "./distributions";

export interface ProportionInterval {
  /** Observed proportion x/n; null when n = 0. */
  p: number | null;
  lower: number;
  upper: number;
  confidence: number;
}

/**
 * Wilson (1927) score interval for a binomial proportion, without continuity
 * correction (Newcombe 1998, method 3). With n = 0 nothing is known: [0, 1].
 */
export function wilsonInterval(x: number, n: number, confidence = 0.95): ProportionInterval {
  if (!Number.isInteger(x) || !Number.isInteger(n) || n < 0 || x < 0 || x > n) {
    throw new RangeError(`wilsonInterval needs whole numbers 0 <= x <= n (got x=${x}, n=${n}).`);
  }
  if (n === 0) return { p: null, lower: 0, upper: 1, confidence };
  const z = twoSidedZ(confidence);
  const p = x / n;
  const z2 = z * z;
  const denominator = 1 + z2 / n;
  const centre = p + z2 / (2 * n);
  const half = z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  return {
    p,
    // the formula gives exactly 0 and 1 at the extremes; pin them against rounding
    lower: x === 0 ? 0 : (centre - half) / denominator,
    upper: x === n ? 1 : (centre + half) / denominator,
    confidence,
  };
}
