import { assertFittable, weibullBLife, weibullPlotY, type LifeUnit } from "./weibull-data";
import { eachAdjustedRank, johnsonAdjustedRanksCounted, type CountedUnit, type PlottedFailure, type RankedFailure } from "./weibull-ranks";

export interface RegressionFit {
  beta: number;
  eta: number;
  b10: number;
  /** Squared correlation of ln t and ln(-ln(1-F)) over the plotted failures. */
  r2: number;
}

export interface RankRegressionResult {
  /** Least squares of y = ln(-ln(1-F)) on x = ln t. */
  yOnX: RegressionFit;
  /** Least squares of x = ln t on y (the usual choice in life data analysis). */
  xOnY: RegressionFit;
}

/** Median-rank regression (Benard ranks, Johnson adjustment for suspensions), both ways. */
export function weibullRankRegression(units: readonly LifeUnit[]): RankRegressionResult {
  assertFittable(units);
  return rankRegressionOf(johnsonAdjustedRanksCounted(units.map((u) => ({ ...u, count: 1 }))));
}

/** The same from counted units (the caller has checked they can be fitted). */
export function weibullRankRegressionCounted(groups: readonly CountedUnit[]): RankRegressionResult {
  return rankRegressionOf(johnsonAdjustedRanksCounted(groups));
}

/**
 * Least squares both ways through already ranked failures (their ordinate y is used when given).
 * Failures come in time order, so ln t is taken once per run of equal times.
 */
export function rankRegressionOf(points: readonly (RankedFailure & { y?: number })[]): RankRegressionResult {
  const m = points.length;
  const xs = new Float64Array(m);
  const ys = new Float64Array(m);
  let lastTime = NaN;
  let lastLog = NaN;
  for (let i = 0; i < m; i++) {
    const p = points[i];
    if (p.time !== lastTime) {
      lastTime = p.time;
      lastLog = Math.log(p.time);
    }
    xs[i] = lastLog;
    ys[i] = p.y ?? weibullPlotY(p.medianRank);
  }
  return regressionOfXY(xs, ys);
}

/**
 * Rank regression of counted units and at most `maxPoints` evenly spaced plotted failures (the
 * first and last always among them), in one pass and without an object per failure.
 */
export function rankRegressionAndPlot(
  groups: readonly CountedUnit[],
  maxPoints: number,
): { regression: RankRegressionResult; points: PlottedFailure[]; failures: number } {
  let m = 0;
  for (const g of groups) if (g.failed) m += g.count;
  const xs = new Float64Array(m);
  const ys = new Float64Array(m);
  const points: PlottedFailure[] = [];
  const thinned = m > maxPoints;
  const pickAt = (j: number) => (thinned ? Math.round((j * (m - 1)) / (maxPoints - 1)) : j);
  let nextPick = 0;
  let i = 0;
  let lastTime = NaN;
  let lastLog = NaN;
  eachAdjustedRank(groups, (time, adjustedRank, medianRank) => {
    if (time !== lastTime) {
      lastTime = time;
      lastLog = Math.log(time);
    }
    const y = weibullPlotY(medianRank);
    xs[i] = lastLog;
    ys[i] = y;
    if (points.length < maxPoints && pickAt(nextPick) === i) {
      points.push({ time, adjustedRank, medianRank, y });
      nextPick++;
    }
    i++;
  });
  return { regression: regressionOfXY(xs, ys), points, failures: m };
}

function regressionOfXY(xs: Float64Array, ys: Float64Array): RankRegressionResult {
  const m = xs.length;
  let sumX = 0;
  let sumY = 0;
  for (let i = 0; i < m; i++) {
    sumX += xs[i];
    sumY += ys[i];
  }
  const mx = sumX / m;
  const my = sumY / m;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < m; i++) {
    sxx += (xs[i] - mx) ** 2;
    syy += (ys[i] - my) ** 2;
    sxy += (xs[i] - mx) * (ys[i] - my);
  }
  const r2 = (sxy * sxy) / (sxx * syy);

  const slopeYX = sxy / sxx;
  const interceptYX = my - slopeYX * mx;
  const betaYX = slopeYX;
  const etaYX = Math.exp(-interceptYX / slopeYX);

  const slopeXY = sxy / syy;
  const interceptXY = mx - slopeXY * my;
  const betaXY = 1 / slopeXY;
  const etaXY = Math.exp(interceptXY);

  return {
    yOnX: { beta: betaYX, eta: etaYX, b10: weibullBLife(betaYX, etaYX), r2 },
    xOnY: { beta: betaXY, eta: etaXY, b10: weibullBLife(betaXY, etaXY), r2 },
  };
}
