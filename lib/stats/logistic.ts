// Logistic regression of a yes/no outcome on one reading: P(yes | x) = 1 / (1 + exp(-(a + b x))).
// Points are grouped (n trials at x, y of them yes), so counts straight from a GROUP BY fit
// without expanding them. Maximum likelihood by Newton-Raphson (for the logit link this is IRLS),
// with step halving so a poor start never lowers the likelihood.
import { chiSquareQuantile, twoSidedZ } from "./distributions";
import { bisectRoot } from "./solve-1d";

export type BinomialPoint = { x: number; n: number; y: number };

export type LogisticFit = {
  intercept: number;
  slope: number;
  /** Inverse Fisher information at the estimate: [[v_aa, v_ab], [v_ab, v_bb]]. */
  covariance: [[number, number], [number, number]];
  seIntercept: number;
  seSlope: number;
  loglik: number;
  nullLoglik: number;
  /** 2 (logL - logL_null): the likelihood-ratio statistic for "the reading matters", 1 df. */
  lrStatistic: number;
  trials: number;
  successes: number;
  iterations: number;
  /** True when the outcomes split perfectly by x: the estimate runs off to infinity and is not reported as a fit. */
  separated: boolean;
};

export type CoefficientInterval = { lower: number; upper: number; confidence: number };

/** log(1 + e^t) without overflow. */
function softplus(t: number): number {
  return t > 0 ? t + Math.log1p(Math.exp(-t)) : Math.log1p(Math.exp(t));
}

function logistic(t: number): number {
  return t >= 0 ? 1 / (1 + Math.exp(-t)) : Math.exp(t) / (1 + Math.exp(t));
}

export function logLikelihood(points: readonly BinomialPoint[], a: number, b: number): number {
  let ll = 0;
  for (const p of points) {
    const eta = a + b * p.x;
    ll += p.y * eta - p.n * softplus(eta);
  }
  return ll;
}

function checkPoints(points: readonly BinomialPoint[]): void {
  for (const p of points) {
    if (!Number.isFinite(p.x) || !Number.isInteger(p.n) || !Number.isInteger(p.y) || p.n < 0 || p.y < 0 || p.y > p.n) {
      throw new RangeError(`Each point needs a finite x and whole counts 0 <= y <= n (got x=${p.x}, n=${p.n}, y=${p.y}).`);
    }
  }
}

/** Information matrix entries (sum n p (1-p) [1, x; x, x^2]) and the score at (a, b). */
function scoreAndInformation(points: readonly BinomialPoint[], a: number, b: number) {
  let g0 = 0,
    g1 = 0,
    i00 = 0,
    i01 = 0,
    i11 = 0;
  for (const p of points) {
    const mu = logistic(a + b * p.x);
    const r = p.y - p.n * mu;
    const w = p.n * mu * (1 - mu);
    g0 += r;
    g1 += r * p.x;
    i00 += w;
    i01 += w * p.x;
    i11 += w * p.x * p.x;
  }
  return { g0, g1, i00, i01, i11 };
}

/** Maximum-likelihood fit, or null when there is nothing to fit (no trials, all yes, all no, or one x only). */
export function fitLogistic(points: readonly BinomialPoint[]): LogisticFit | null {
  checkPoints(points);
  const used = points.filter((p) => p.n > 0);
  const trials = used.reduce((s, p) => s + p.n, 0);
  const successes = used.reduce((s, p) => s + p.y, 0);
  if (trials === 0 || successes === 0 || successes === trials) return null;
  if (new Set(used.map((p) => p.x)).size < 2) return null;

  // Centre and scale x so the Newton steps are well conditioned; transform back at the end.
  const mean = used.reduce((s, p) => s + p.n * p.x, 0) / trials;
  const spread = Math.sqrt(used.reduce((s, p) => s + p.n * (p.x - mean) ** 2, 0) / trials) || 1;
  const scaled = used.map((p) => ({ ...p, x: (p.x - mean) / spread }));

  const rate = successes / trials;
  let a = Math.log(rate / (1 - rate));
  let b = 0;
  let ll = logLikelihood(scaled, a, b);
  const nullLoglik = ll;
  let iterations = 0;
  let separated = false;
  for (; iterations < 100; iterations++) {
    const { g0, g1, i00, i01, i11 } = scoreAndInformation(scaled, a, b);
    const det = i00 * i11 - i01 * i01;
    if (!(det > 1e-300)) {
      separated = true;
      break;
    }
    const da = (i11 * g0 - i01 * g1) / det;
    const db = (i00 * g1 - i01 * g0) / det;
    let step = 1;
    let next = logLikelihood(scaled, a + da, b + db);
    while (next < ll - 1e-12 && step > 1e-10) {
      step /= 2;
      next = logLikelihood(scaled, a + step * da, b + step * db);
    }
    a += step * da;
    b += step * db;
    const gain = next - ll;
    ll = next;
    if (Math.abs(b) > 50) {
      separated = true;
      break;
    }
    if (Math.abs(gain) < 1e-13 && Math.abs(step * da) < 1e-10 && Math.abs(step * db) < 1e-10) break;
  }

  // back to the original x: eta = a + b (x - mean) / spread
  const slope = b / spread;
  const intercept = a - slope * mean;
  const info = scoreAndInformation(used, intercept, slope);
  const det = info.i00 * info.i11 - info.i01 * info.i01;
  if (!(det > 0) || separated) separated = true;
  const v00 = info.i11 / det;
  const v01 = -info.i01 / det;
  const v11 = info.i00 / det;
  const loglik = logLikelihood(used, intercept, slope);
  return {
    intercept,
    slope,
    covariance: [
      [v00, v01],
      [v01, v11],
    ],
    seIntercept: Math.sqrt(v00),
    seSlope: Math.sqrt(v11),
    loglik,
    nullLoglik,
    lrStatistic: 2 * (loglik - nullLoglik),
    trials,
    successes,
    iterations,
    separated,
  };
}

export type Coefficient = "intercept" | "slope";

/** Estimate ± z·SE. */
export function waldInterval(fit: LogisticFit, which: Coefficient, confidence = 0.95): CoefficientInterval {
  const z = twoSidedZ(confidence);
  const est = which === "slope" ? fit.slope : fit.intercept;
  const se = which === "slope" ? fit.seSlope : fit.seIntercept;
  return { lower: est - z * se, upper: est + z * se, confidence };
}

/** Highest log-likelihood with one coefficient held at `value`: a 1-D concave problem in the other, by Newton. */
function profileLoglik(points: readonly BinomialPoint[], which: Coefficient, value: number, start: number): { ll: number; other: number } {
  let other = start;
  // e^-|eta| at each point where the log-likelihood was last taken: the Newton step that follows is
  // taken at that same place, and logistic() and softplus() would work out the same exponential
  // again. Reusing it saves a third of the exponentials and changes no digit.
  const ex = new Float64Array(points.length);
  const at = (o: number) => {
    let ll = 0;
    for (let i = 0; i < points.length; i++) {
      const p = points[i];
      const eta = which === "slope" ? o + value * p.x : value + o * p.x;
      const e = eta > 0 ? Math.exp(-eta) : Math.exp(eta);
      ex[i] = e;
      ll += p.y * eta - p.n * (eta > 0 ? eta + Math.log1p(e) : Math.log1p(e));
    }
    return ll;
  };
  let ll = at(other);
  for (let i = 0; i < 100; i++) {
    let g = 0,
      h = 0;
    for (let j = 0; j < points.length; j++) {
      const p = points[j];
      const eta = which === "slope" ? other + value * p.x : value + other * p.x;
      const mu = eta >= 0 ? 1 / (1 + ex[j]) : ex[j] / (1 + ex[j]);
      const dx = which === "slope" ? 1 : p.x;
      g += (p.y - p.n * mu) * dx;
      h += p.n * mu * (1 - mu) * dx * dx;
    }
    if (!(h > 0)) break;
    let step = g / h;
    let next = at(other + step);
    while (next < ll - 1e-12 && Math.abs(step) > 1e-14) {
      step /= 2;
      next = at(other + step);
    }
    other += step;
    const done = Math.abs(step) < 1e-12 * Math.max(1, Math.abs(other));
    ll = next;
    if (done) break;
  }
  return { ll, other };
}

/**
 * Profile-likelihood interval: the coefficient values whose profile log-likelihood lies within
 * chi2_1(confidence)/2 of the maximum. A bound that does not close within 50 standard errors is
 * reported as -Infinity or Infinity.
 */
export function profileInterval(
  points: readonly BinomialPoint[],
  fit: LogisticFit,
  which: Coefficient,
  confidence = 0.95,
): CoefficientInterval {
  checkPoints(points);
  const used = points.filter((p) => p.n > 0);
  const cut = chiSquareQuantile(confidence, 1) / 2;
  const est = which === "slope" ? fit.slope : fit.intercept;
  const se = which === "slope" ? fit.seSlope : fit.seIntercept;
  const otherEst = which === "slope" ? fit.intercept : fit.slope;
  // the other coefficient's conditional mean given this one: a good start for each inner fit
  const [[v00, v01], [, v11]] = fit.covariance;
  const lean = which === "slope" ? v01 / v11 : v01 / v00;
  const deficit = (v: number) => fit.loglik - profileLoglik(used, which, v, otherEst + lean * (v - est)).ll - cut;

  const bound = (dir: -1 | 1): number => {
    let inner = est;
    for (let k = 1; k <= 50; k *= 2) {
      const outer = est + dir * k * se;
      if (deficit(outer) > 0) return bisectRoot(deficit, Math.min(inner, outer), Math.max(inner, outer), 1e-12);
      inner = outer;
    }
    return dir * Infinity;
  };
  return { lower: bound(-1), upper: bound(1), confidence };
}

/** Fitted probability at x with a Wald band on the logit scale (always inside 0..1). */
export function predictProbability(fit: LogisticFit, x: number, confidence = 0.95): { p: number; lower: number; upper: number } {
  const z = twoSidedZ(confidence);
  const [[v00, v01], [, v11]] = fit.covariance;
  const eta = fit.intercept + fit.slope * x;
  const se = Math.sqrt(Math.max(0, v00 + 2 * x * v01 + x * x * v11));
  return { p: logistic(eta), lower: logistic(eta - z * se), upper: logistic(eta + z * se) };
}

export type InversePrediction = {
  probability: number;
  /** The x at which the fitted probability equals `probability`. */
  x: number;
  /** Delta-method standard error of x. */
  deltaSe: number;
  /**
   * Fieller interval: the x values whose fitted logit is within z standard errors of logit(p).
   * null when the slope is not clearly away from zero (the set is then unbounded).
   */
  fieller: CoefficientInterval | null;
};

/** The reading at which a chosen share of outcomes is expected (e.g. p = 0.5), with its interval. */
export function inversePrediction(fit: LogisticFit, probability: number, confidence = 0.95): InversePrediction {
  if (!(probability > 0 && probability < 1)) throw new RangeError("inversePrediction needs 0 < p < 1");
  const z = twoSidedZ(confidence);
  const [[v00, v01], [, v11]] = fit.covariance;
  const target = Math.log(probability / (1 - probability));
  const a = fit.intercept - target;
  const b = fit.slope;
  const x = -a / b;
  // d x / d(intercept) = -1/b, d x / d(slope) = a / b^2
  const g0 = -1 / b;
  const g1 = a / (b * b);
  const deltaSe = Math.sqrt(g0 * g0 * v00 + 2 * g0 * g1 * v01 + g1 * g1 * v11);

  // (a + b x)^2 = z^2 (v00 + 2 x v01 + x^2 v11)  ->  A x^2 + B x + C = 0
  const z2 = z * z;
  const A = b * b - z2 * v11;
  const B = 2 * (a * b - z2 * v01);
  const C = a * a - z2 * v00;
  const disc = B * B - 4 * A * C;
  let fieller: CoefficientInterval | null = null;
  if (A > 0 && disc >= 0) {
    const root = Math.sqrt(disc);
    const r1 = (-B - root) / (2 * A);
    const r2 = (-B + root) / (2 * A);
    fieller = { lower: Math.min(r1, r2), upper: Math.max(r1, r2), confidence };
  }
  return { probability, x, deltaSe, fieller };
}
