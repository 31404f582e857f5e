// Funnel-plot limits for a share: where a unit with n trials would fall if its true rate were the
// whole group's rate p0. Exact binomial quantiles, interpolated so the limit moves smoothly with n
// (Spiegelhalter 2005, "Funnel plots for comparing institutional performance", Stat Med 24:1185,
// appendix A.1.1).
import jStat from "jstat";

/** P(R <= r) for R ~ Binomial(n, p), through the regularised incomplete beta function. */
export function binomialCdf(r: number, n: number, p: number): number {
  if (r < 0) return 0;
  if (r >= n) return 1;
  if (p <= 0) return 1;
  if (p >= 1) return 0;
  return jStat.ibeta(1 - p, n - r, r + 1);
}

/** Smallest whole r with P(R <= r) >= q. */
function binomialQuantile(q: number, n: number, p: number): number {
  let lo = 0;
  let hi = n;
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 2);
    if (binomialCdf(mid, n, p) >= q) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** The share a unit with n trials stays above (q < 0.5) or below (q > 0.5) with probability q under p0. */
export function funnelLimit(n: number, p0: number, q: number): number {
  if (!Number.isInteger(n) || n < 1) throw new RangeError("funnelLimit needs a whole n >= 1");
  if (!(p0 >= 0 && p0 <= 1)) throw new RangeError("funnelLimit needs 0 <= p0 <= 1");
  if (!(q > 0 && q < 1)) throw new RangeError("funnelLimit needs 0 < q < 1");
  if (p0 === 0 || p0 === 1) return p0;
  const r = binomialQuantile(q, n, p0);
  const at = binomialCdf(r, n, p0);
  const below = binomialCdf(r - 1, n, p0);
  const alpha = at === below ? 0 : (at - q) / (at - below);
  return Math.min(1, Math.max(0, (r - alpha) / n));
}

export type FunnelLimits = { n: number; lower95: number; upper95: number; lower998: number; upper998: number };

/** The two usual pairs of limits: 95% (2 sigma-like) and 99.8% (3 sigma-like). */
export function funnelLimits(n: number, p0: number): FunnelLimits {
  return {
    n,
    lower95: funnelLimit(n, p0, 0.025),
    upper95: funnelLimit(n, p0, 0.975),
    lower998: funnelLimit(n, p0, 0.001),
    upper998: funnelLimit(n, p0, 0.999),
  };
}

/**
 * Where a unit falls, by its exact binomial tail under p0 (two-sided 95% and 99.8%). The drawn limits
 * are interpolated and can sit just under 100% at small n, so a whole count is judged by its tail instead.
 */
export function funnelPosition(x: number, n: number, p0: number): "below-998" | "below-95" | "inside" | "above-95" | "above-998" {
  const lowerTail = binomialCdf(x, n, p0);
  const upperTail = 1 - binomialCdf(x - 1, n, p0);
  if (lowerTail < 0.001) return "below-998";
  if (lowerTail < 0.025) return "below-95";
  if (upperTail < 0.001) return "above-998";
  if (upperTail < 0.025) return "above-95";
  return "inside";
}

/** The n values to draw the funnel through, spaced evenly on a log scale from 1 to maxN. */
export function funnelCurve(maxN: number, p0: number, steps = 40): FunnelLimits[] {
  const top = Math.max(2, Math.ceil(maxN));
  const ns = new Set<number>();
  for (let i = 0; i <= steps; i++) ns.add(Math.max(1, Math.round(Math.exp((Math.log(top) * i) / steps))));
  return [...ns].sort((a, b) => a - b).map((n) => funnelLimits(n, p0));
}
