// Likelihood-ratio (profile likelihood) bounds:
// { theta : 2 * (logL_max - logL_profile(theta)) <= chi-square(1) quantile }.
import { chiSquareQuantile } from "./distributions";
import type { Interval, WeibullMle } from "./weibull-mle";
import { profileLogLikBeta, shiftedSums, type LikelihoodData } from "./weibull-likelihood";
import { brentRoot } from "./solve-1d";

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

/**
 * Where the deviance crosses the limit on each side of the estimate, searched on ln theta: steps
 * out from the estimate until the deviance passes the limit, then Brent's method inside that step.
 */
function boundsFor(estimate: number, deviance: (theta: number) => number, limit: number): Interval {
  const f = (logTheta: number) => deviance(Math.exp(logTheta)) - limit;
  const centre = Math.log(estimate);
  const fCentre = f(centre);
  const side = (dir: 1 | -1): number => {
    let step = 0.05;
    let inner = centre;
    let fInner = fCentre;
    while (step < 40) {
      const outer = centre + dir * step;
      const fOuter = f(outer);
      if (fOuter > 0) return Math.exp(brentRoot(f, inner, outer, fInner, fOuter, 1e-14));
      inner = outer;
      fInner = fOuter;
      step *= 2;
    }
    return dir > 0 ? Infinity : 0;
  };
  return [side(-1), side(1)];
}

/** The deviance with eta or B10 held, each profile's Newton search starting where the last one ended. */
function heldScaleDeviance(d: LikelihoodData, fit: WeibullMle, shift: number): (theta: number) => number {
  let start = fit.beta;
  return (theta) => {
    const p = profileOverBeta(d, Math.log(theta), shift, start);
    if (Number.isFinite(p.beta) && p.beta > 0) start = p.beta;
    return 2 * (fit.logLik - p.logLik);
  };
}

export function likelihoodRatioBounds(d: LikelihoodData, fit: WeibullMle, confidence = 0.95): LikelihoodRatioBounds {
  const limit = chiSquareQuantile(confidence, 1);
  return {
    confidence,
    beta: boundsFor(fit.beta, (beta) => 2 * (fit.logLik - profileLogLikBeta(d, beta)), limit),
    eta: boundsFor(fit.eta, heldScaleDeviance(d, fit, 0), limit),
    b10: boundsFor(fit.b10, heldScaleDeviance(d, fit, Math.log(-Math.log(0.9))), limit),
  };
}
