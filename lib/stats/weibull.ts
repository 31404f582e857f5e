// One call that gives the screens everything a Weibull life analysis shows.
import { assertFittable, weibullCdf, type LifeUnit } from "./weibull-data";
import { johnsonPlotPointsCounted, type CountedUnit } from "./weibull-ranks";
import { rankRegressionOf, type RankRegressionResult } from "./weibull-regression";
import { fisherBounds, weibullMleFromData, type FisherBounds, type Interval, type WeibullMle } from "./weibull-mle";
import { likelihoodRatioBounds, type LikelihoodRatioBounds } from "./weibull-lr-bounds";
import { prepareLikelihoodCounts } from "./weibull-likelihood";
import { readShape, type ShapeReading } from "./weibull-shape";

export interface WeibullOptions {
  /** Two-sided confidence level for the bounds; default 0.95. */
  confidence?: number;
}

export interface PlotPoint {
  time: number;
  adjustedRank: number;
  /** Benard median rank, the plotted estimate of F. */
  medianRank: number;
  /** ln(-ln(1 - F)), the Weibull-paper ordinate. */
  y: number;
}

export interface LinePoint {
  time: number;
  F: number;
  y: number;
}

export interface WeibullAnalysis {
  n: number;
  failures: number;
  suspensions: number;
  confidence: number;
  rankRegression: RankRegressionResult;
  mle: WeibullMle & { fisher: FisherBounds; likelihoodRatio: LikelihoodRatioBounds };
  b10: { mle: number; rankRegression: number; fisher: Interval; likelihoodRatio: Interval };
  shapeReading: ShapeReading;
  shapeExplanation: string;
  plotPoints: PlotPoint[];
  /** Points on the MLE line (straight on Weibull paper), log-spaced between tMin and tMax. */
  fittedLine: (tMin: number, tMax: number, steps?: number) => LinePoint[];
}

export function fitWeibull(units: readonly LifeUnit[], opts: WeibullOptions = {}): WeibullAnalysis {
  const confidence = opts.confidence ?? 0.95;
  assertFittable(units);
  // Units sharing a life and outcome are counted once: the sort and every likelihood pass cost the distinct lives.
  const groups = countUnits(units);
  const data = prepareLikelihoodCounts(groups);
  const fit = weibullMleFromData(data);
  const fisher = fisherBounds(data, fit, confidence);
  const likelihoodRatio = likelihoodRatioBounds(data, fit, confidence);
  // ranks and plot ordinates in one pass; the regression reads the same ordinates
  const plotPoints: PlotPoint[] = johnsonPlotPointsCounted(groups);
  const rankRegression = rankRegressionOf(plotPoints);
  const shape = readShape(fit.beta, likelihoodRatio.beta);
  const failures = data.failures;

  const fittedLine = (tMin: number, tMax: number, steps = 20): LinePoint[] => {
    if (!(tMin > 0 && tMax > tMin)) throw new RangeError("fittedLine needs 0 < tMin < tMax");
    const out: LinePoint[] = [];
    for (let i = 0; i <= steps; i++) {
      const time = Math.exp(Math.log(tMin) + ((Math.log(tMax) - Math.log(tMin)) * i) / steps);
      out.push({
        time,
        F: weibullCdf(time, fit.beta, fit.eta),
        // computed directly so the line stays exact where F rounds to 0 or 1
        y: fit.beta * (Math.log(time) - Math.log(fit.eta)),
      });
    }
    return out;
  };

  return {
    n: units.length,
    failures,
    suspensions: units.length - failures,
    confidence,
    rankRegression,
    mle: { ...fit, fisher, likelihoodRatio },
    b10: {
      mle: fit.b10,
      rankRegression: rankRegression.xOnY.b10,
      fisher: fisher.b10,
      likelihoodRatio: likelihoodRatio.b10,
    },
    shapeReading: shape.reading,
    shapeExplanation: shape.explanation,
    plotPoints,
    fittedLine,
  };
}

/** Units counted by life and outcome, in the order each life and outcome first appears. */
export function countUnits(units: readonly LifeUnit[]): CountedUnit[] {
  const failed = new Map<number, CountedUnit>();
  const running = new Map<number, CountedUnit>();
  const out: CountedUnit[] = [];
  for (const u of units) {
    const byTime = u.failed ? failed : running;
    const g = byTime.get(u.time);
    if (g) g.count++;
    else {
      const created = { time: u.time, failed: u.failed, count: 1 };
      byTime.set(u.time, created);
      out.push(created);
    }
  }
  return out;
}
