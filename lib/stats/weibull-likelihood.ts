// Right-censored Weibull log-likelihood on the time scale (density Jacobian included):
// sum over failures of log f(t) + sum over suspensions of log S(t).
import type { LifeUnit } from "./weibull-data";

export interface LikelihoodData {
  logTimes: number[];
  failed: boolean[];
  failures: number;
  sumLogFailureTimes: number;
  /** Largest ln t; used to keep exp(beta * (ln t - shift)) from overflowing. */
  maxLogTime: number;
}

export function prepareLikelihoodData(units: readonly LifeUnit[]): LikelihoodData {
  const logTimes = units.map((u) => Math.log(u.time));
  const failed = units.map((u) => u.failed);
  let sumLogFailureTimes = 0;
  let failures = 0;
  logTimes.forEach((lt, i) => {
    if (failed[i]) {
      failures++;
      sumLogFailureTimes += lt;
    }
  });
  return { logTimes, failed, failures, sumLogFailureTimes, maxLogTime: Math.max(...logTimes) };
}

export function weibullLogLik(d: LikelihoodData, beta: number, eta: number): number {
  const logEta = Math.log(eta);
  let cumulativeHazard = 0;
  for (const lt of d.logTimes) cumulativeHazard += Math.exp(beta * (lt - logEta));
  return (
    d.failures * (Math.log(beta) - beta * logEta) + (beta - 1) * d.sumLogFailureTimes - cumulativeHazard
  );
}

/** For a given beta the likelihood is maximised by eta = (sum t^beta / r)^(1/beta). */
export function etaGivenBeta(d: LikelihoodData, beta: number): number {
  let s = 0;
  for (const lt of d.logTimes) s += Math.exp(beta * (lt - d.maxLogTime));
  return Math.exp(d.maxLogTime + Math.log(s / d.failures) / beta);
}

export function profileLogLikBeta(d: LikelihoodData, beta: number): number {
  return weibullLogLik(d, beta, etaGivenBeta(d, beta));
}

/**
 * Profile score for beta, increasing in beta, zero at the MLE:
 * sum(t^b ln t)/sum(t^b) - 1/b - mean(ln t over failures). Also returns its derivative.
 */
export function betaProfileScore(d: LikelihoodData, beta: number): { value: number; slope: number } {
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  for (const lt of d.logTimes) {
    const x = lt - d.maxLogTime;
    const w = Math.exp(beta * x);
    s0 += w;
    s1 += w * x;
    s2 += w * x * x;
  }
  const meanX = s1 / s0;
  const meanFailX = d.sumLogFailureTimes / d.failures - d.maxLogTime;
  return {
    value: meanX - 1 / beta - meanFailX,
    slope: s2 / s0 - meanX * meanX + 1 / (beta * beta),
  };
}

/** Observed information matrix (minus the Hessian of logL) in (beta, eta), analytic. */
export function observedInformation(d: LikelihoodData, beta: number, eta: number): [[number, number], [number, number]] {
  const logEta = Math.log(eta);
  const r = d.failures;
  let sw = 0;
  let swl = 0;
  let swll = 0;
  for (const lt of d.logTimes) {
    const l = lt - logEta;
    const w = Math.exp(beta * l);
    sw += w;
    swl += w * l;
    swll += w * l * l;
  }
  const hBB = -r / (beta * beta) - swll;
  const hEE = (r * beta - beta * (beta + 1) * sw) / (eta * eta);
  const hBE = (-r + sw + beta * swl) / eta;
  return [
    [-hBB, -hBE],
    [-hBE, -hEE],
  ];
}
