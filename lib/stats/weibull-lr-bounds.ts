// Likelihood-ratio (profile likelihood) bounds:
// { theta : 2 * (logL_max - logL_profile(theta)) <= chi-square(1) quantile }.
import { chiSquareQuantile } from "./distributions";
import type { Interval, WeibullMle } from "./weibull-mle";
import { profileLogLikBeta, weibullLogLik, type LikelihoodData } from "./weibull-likelihood";
import { bisectRoot, maximize1d } from "./solve-1d";

export interface LikelihoodRatioBounds {
  confidence: number;
  beta: Interval;
  eta: Interval;
  b10: Interval;
}

/** Best logL over beta with eta set by `etaOf(beta)`; searched on ln beta around the MLE. */
function profileOverBeta(d: LikelihoodData, fit: WeibullMle, etaOf: (beta: number) => number): number {
  const centre = Math.log(fit.beta);
  return maximize1d((lb) => weibullLogLik(d, Math.exp(lb), etaOf(Math.exp(lb))), centre - 4, centre + 4).value;
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
    eta: boundsFor(fit.eta, (eta) => dev(profileOverBeta(d, fit, () => eta)), limit),
    b10: boundsFor(
      fit.b10,
      (b10) => dev(profileOverBeta(d, fit, (beta) => b10 * Math.exp(-logMinusLog09 / beta))),
      limit,
    ),
  };
}
