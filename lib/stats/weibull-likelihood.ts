// Right-censored Weibull log-likelihood on the time scale (density Jacobian included):
// sum over failures of log f(t) + sum over suspensions of log S(t).
// Units with the same time are summed once with their count: a casebook of 100,000 lives has only
// a few hundred distinct service lives, so every pass of the solver costs that many terms, not 100,000.
import type { LifeUnit } from "./weibull-data";

export interface LikelihoodData {
  /** Distinct ln t, each with how many units (failed or not) share it. */
  logTimes: number[];
  counts: number[];
  failures: number;
  sumLogFailureTimes: number;
  /** Largest ln t; used to keep exp(beta * (ln t - shift)) from overflowing. */
  maxLogTime: number;
}

export function prepareLikelihoodData(units: readonly LifeUnit[]): LikelihoodData {
  return prepareLikelihoodCounts(units.map((u) => ({ time: u.time, failed: u.failed, count: 1 })));
}

/** The same from units already counted by life and outcome (as the database groups them). */
export function prepareLikelihoodCounts(groups: readonly (LifeUnit & { count: number })[]): LikelihoodData {
  const byTime = new Map<number, number>();
  let sumLogFailureTimes = 0;
  let failures = 0;
  for (const u of groups) {
    byTime.set(u.time, (byTime.get(u.time) ?? 0) + u.count);
    if (u.failed) {
      failures += u.count;
      sumLogFailureTimes += u.count * Math.log(u.time);
    }
  }
  const logTimes: number[] = [];
  const counts: number[] = [];
  let maxLogTime = -Infinity;
  for (const [t, n] of byTime) {
    const lt = Math.log(t);
    logTimes.push(lt);
    counts.push(n);
    if (lt > maxLogTime) maxLogTime = lt;
  }
  return { logTimes, counts, failures, sumLogFailureTimes, maxLogTime };
}

export function weibullLogLik(d: LikelihoodData, beta: number, eta: number): number {
  const logEta = Math.log(eta);
  let cumulativeHazard = 0;
  for (let i = 0; i < d.logTimes.length; i++) cumulativeHazard += d.counts[i] * Math.exp(beta * (d.logTimes[i] - logEta));
  return d.failures * (Math.log(beta) - beta * logEta) + (beta - 1) * d.sumLogFailureTimes - cumulativeHazard;
}

/** For a given beta the likelihood is maximised by eta = (sum t^beta / r)^(1/beta). */
export function etaGivenBeta(d: LikelihoodData, beta: number): number {
  let s = 0;
  for (let i = 0; i < d.logTimes.length; i++) s += d.counts[i] * Math.exp(beta * (d.logTimes[i] - d.maxLogTime));
  return Math.exp(d.maxLogTime + Math.log(s / d.failures) / beta);
}

export function profileLogLikBeta(d: LikelihoodData, beta: number): number {
  return weibullLogLik(d, beta, etaGivenBeta(d, beta));
}

/**
 * Sums of w, w x and w x^2 with x = ln t - max ln t and w = count * e^(beta x): t^beta and its
 * derivatives in beta, scaled by e^(-beta max ln t) so nothing overflows.
 */
export function shiftedSums(d: LikelihoodData, beta: number): { s0: number; s1: number; s2: number } {
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  for (let i = 0; i < d.logTimes.length; i++) {
    const x = d.logTimes[i] - d.maxLogTime;
    const w = d.counts[i] * Math.exp(beta * x);
    s0 += w;
    s1 += w * x;
    s2 += w * x * x;
  }
  return { s0, s1, s2 };
}

/**
 * Profile score for beta, increasing in beta, zero at the MLE:
 * sum(t^b ln t)/sum(t^b) - 1/b - mean(ln t over failures). Also returns its derivative.
 */
export function betaProfileScore(d: LikelihoodData, beta: number): { value: number; slope: number } {
  const { s0, s1, s2 } = shiftedSums(d, beta);
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
  for (let i = 0; i < d.logTimes.length; i++) {
    const l = d.logTimes[i] - logEta;
    const w = d.counts[i] * Math.exp(beta * l);
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
