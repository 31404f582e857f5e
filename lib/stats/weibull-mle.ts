import { twoSidedZ } from "./distributions";
import { assertFittable, weibullBLife, type LifeUnit } from "./weibull-data";
import {
  betaProfileScore,
  etaGivenBeta,
  observedInformation,
  prepareLikelihoodData,
  weibullLogLik,
  type LikelihoodData,
} from "./weibull-likelihood";

export type Interval = [lower: number, upper: number];

export interface WeibullMle {
  beta: number;
  eta: number;
  b10: number;
  logLik: number;
}

export interface FisherBounds {
  confidence: number;
  seBeta: number;
  seEta: number;
  beta: Interval;
  eta: Interval;
  b10: Interval;
}

/** Solves the profile score equation for beta: Newton steps, kept inside a sign-change bracket. */
export function solveBetaMle(d: LikelihoodData): number {
  let lo = 1;
  let hi = 1;
  while (betaProfileScore(d, lo).value > 0 && lo > 1e-8) lo /= 2;
  while (betaProfileScore(d, hi).value < 0 && hi < 1e8) hi *= 2;
  let beta = (lo + hi) / 2;
  for (let i = 0; i < 200; i++) {
    const { value, slope } = betaProfileScore(d, beta);
    if (value === 0) return beta;
    if (value > 0) hi = beta;
    else lo = beta;
    let next = beta - value / slope;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    if (Math.abs(next - beta) <= 1e-14 * beta) return next;
    beta = next;
  }
  return beta;
}

export function weibullMleFromData(d: LikelihoodData): WeibullMle {
  const beta = solveBetaMle(d);
  const eta = etaGivenBeta(d, beta);
  return { beta, eta, b10: weibullBLife(beta, eta), logLik: weibullLogLik(d, beta, eta) };
}

/** Maximum-likelihood fit of a two-parameter Weibull to right-censored data. */
export function weibullMle(units: readonly LifeUnit[]): WeibullMle {
  assertFittable(units);
  return weibullMleFromData(prepareLikelihoodData(units));
}

/**
 * Fisher-matrix bounds from the observed information at the MLE, on the log scale
 * (so bounds stay positive); B10 by the delta method on ln B10.
 */
export function fisherBounds(d: LikelihoodData, fit: WeibullMle, confidence = 0.95): FisherBounds {
  const { beta, eta, b10 } = fit;
  const [[a, b], [, c]] = observedInformation(d, beta, eta);
  const det = a * c - b * b;
  const varBeta = c / det;
  const varEta = a / det;
  const covBetaEta = -b / det;
  const z = twoSidedZ(confidence);
  const seBeta = Math.sqrt(varBeta);
  const seEta = Math.sqrt(varEta);
  // ln B10 = ln eta + ln(-ln 0.9) / beta
  const gBeta = -Math.log(-Math.log(0.9)) / (beta * beta);
  const gEta = 1 / eta;
  const seLogB10 = Math.sqrt(gBeta * gBeta * varBeta + 2 * gBeta * gEta * covBetaEta + gEta * gEta * varEta);
  const logBound = (value: number, seLog: number): Interval => [value * Math.exp(-z * seLog), value * Math.exp(z * seLog)];
  return {
    confidence,
    seBeta,
    seEta,
    beta: logBound(beta, seBeta / beta),
    eta: logBound(eta, seEta / eta),
    b10: logBound(b10, seLogB10),
  };
}
