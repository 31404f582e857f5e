// Likelihood-ratio (profile likelihood) bounds:
// { theta : 2 * (logL_max - logL_profile(theta)) <= chi-square(1) quantile }.
import { chiSquareQuantile } from "./distributions";
import type { Interval, WeibullMle } from "./weibull-mle";
import { profileLogLikBeta, shiftedSums, type LikelihoodData } from "./weibull-likelihood";
import { bisectRoot } from "./solve-1d";

export interface LikelihoodRatioBounds {
  confidence: number;
  beta: Interval;
  eta: Interval;
  b10: Interval;
}

/**
 * Best logL over beta when ln eta = logScale - shift / beta (shift 0: eta held at e^logScale; shift
 * ln(-ln 0.9): B10 held at e^logScale). With u = ln t - logScale the log-likelihood is
 *   r ln b - r (b logScale - shift) + (b - 1) S - e^shift * sum c e^(b u),
 * whose second derivative -r/b^2 - e^shift * sum c u^2 e^(b u) is negative: one maximum, found by
 * safeguarded Newton steps from `start` in a handful of passes over the distinct lives.
 */
export function profileOverBeta(d: LikelihoodData, logScale: number, shift: number, start: number): { beta: number; logLik: number } {
  const r = d.failures;
  const gap = d.maxLogTime - logScale;
  // shiftedSums scales by e^(-b max ln t); e^(b gap) scales back to logScale
  const at = (b: number) => {
    const { s0, s1, s2 } = shiftedSums(d, b);
    const f = Math.exp(shift + b * gap);
    return {
      value: r * Math.log(b) - r * (b * logScale - shift) + (b - 1) * d.sumLogFailureTimes - f * s0,
      d1: r / b - r * logScale + d.sumLogFailureTimes - f * (s1 + gap * s0),
      d2: -r / (b * b) - f * (s2 + 2 * gap * s1 + gap * gap * s0),
    };
  };
  let lo = 0;
  let hi = Infinity;
  let beta = start;
  let p = at(beta);
  for (let i = 0; i < 100; i++) {
    if (p.d1 > 0) lo = beta;
    else hi = beta;
    let next = beta - p.d1 / p.d2;
    if (!(next > lo && next < hi)) next = Number.isFinite(hi) ? (lo + hi) / 2 : Math.max(2 * beta, lo * 2);
    if (Math.abs(next - beta) <= 1e-13 * beta) break;
    beta = next;
    p = at(beta);
  }
  return { beta, logLik: p.value };
}

/** Where the deviance crosses the limit on each side of the estimate, searched on ln theta. */
function boundsFor(estimate: number, deviance: (theta: number) => number, limit: number): Interval {
  const f = (logTheta: number) => deviance(Math.exp(logTheta)) - limit;
  const centre = Math.log(estimate);
  const side = (dir: 1 | -1): number => {
    let step = 0.05;
    let inner = centre;
    while (step < 40) {
      const outer = centre + dir * step;
      if (f(outer) > 0) return Math.exp(bisectRoot(f, inner, outer, 1e-14));
      inner = outer;
      step *= 2;
    }
    return dir > 0 ? Infinity : 0;
  };
  return [side(-1), side(1)];
}

export function likelihoodRatioBounds(d: LikelihoodData, fit: WeibullMle, confidence = 0.95): LikelihoodRatioBounds {
  const limit = chiSquareQuantile(confidence, 1);
  const dev = (logL: number) => 2 * (fit.logLik - logL);
  const logMinusLog09 = Math.log(-Math.log(0.9));
  return {
    confidence,
    beta: boundsFor(fit.beta, (beta) => dev(profileLogLikBeta(d, beta)), limit),
    eta: boundsFor(fit.eta, (eta) => dev(profileOverBeta(d, Math.log(eta), 0, fit.beta).logLik), limit),
    b10: boundsFor(fit.b10, (b10) => dev(profileOverBeta(d, Math.log(b10), logMinusLog09, fit.beta).logLik), limit),
  };
}
