// Input checks and small formulas shared by the Weibull fits.
// Model: F(t) = 1 - exp(-(t/eta)^beta), two parameters, location 0.

export interface LifeUnit {
  /** Service life at removal or at the end of observation (any consistent unit, > 0). */
  time: number;
  /** true = failed at `time`; false = still running (a suspension, right-censored). */
  failed: boolean;
}

export class WeibullInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "WeibullInputError";
  }
}

/** Throws a WeibullInputError unless the data can support a two-parameter fit. */
export function assertFittable(units: readonly LifeUnit[]): void {
  let failures = 0;
  let firstFailureTime = NaN;
  let allFailureTimesEqual = true;
  for (const u of units) {
    if (!Number.isFinite(u.time)) throw new WeibullInputError("Every time must be a finite number.");
    if (u.time <= 0) throw new WeibullInputError(`Times must be greater than zero (got ${u.time}).`);
    if (!u.failed) continue;
    if (failures === 0) firstFailureTime = u.time;
    else if (u.time !== firstFailureTime) allFailureTimesEqual = false;
    failures++;
  }
  const reason = unfittableReason(failures, allFailureTimesEqual);
  if (reason) throw new WeibullInputError(reason);
}

/** Why failures counted this way cannot support a two-parameter fit, in words; null when they can. */
export function unfittableReason(failures: number, allTimesEqual: boolean): string | null {
  if (failures < 2) return `At least two failures are needed to fit a Weibull distribution (got ${failures}).`;
  if (allTimesEqual) return "All failure times are equal, so the spread of lives (the Weibull shape) cannot be estimated.";
  return null;
}

/** Life by which a fraction p of the population has failed; p = 0.1 gives B10. */
export function weibullBLife(beta: number, eta: number, p = 0.1): number {
  return eta * Math.pow(-Math.log(1 - p), 1 / beta);
}

export function weibullCdf(t: number, beta: number, eta: number): number {
  return t <= 0 ? 0 : 1 - Math.exp(-Math.pow(t / eta, beta));
}

/** Weibull-plot ordinate ln(-ln(1-F)). */
export function weibullPlotY(f: number): number {
  return Math.log(-Math.log(1 - f));
}
