import jStat from "jstat";

/** Standard normal quantile: z such that P(Z <= z) = p. */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError("normalQuantile needs 0 < p < 1");
  return jStat.normal.inv(p, 0, 1);
}

/** Two-sided critical z for a confidence level, e.g. 0.95 -> 1.95996. */
export function twoSidedZ(confidence: number): number {
  return normalQuantile(1 - (1 - confidence) / 2);
}

export function chiSquareCdf(x: number, df: number): number {
  if (x <= 0) return 0;
  return jStat.chisquare.cdf(x, df);
}

/** Upper-tail probability P(X >= x), the p-value of a chi-square statistic. */
export function chiSquareSurvival(x: number, df: number): number {
  if (x <= 0) return 1;
  return Math.min(1, Math.max(0, 1 - jStat.chisquare.cdf(x, df)));
}

export function chiSquareQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError("chiSquareQuantile needs 0 < p < 1");
  return jStat.chisquare.inv(p, df);
}
