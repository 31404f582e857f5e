// Life analysis per root cause: removals for that cause are failures; removals for any other
// cause, and fleet units still in service, are suspensions (right-censored at their service life).
import {
  assertFittable,
  fisherBounds,
  fitWeibull,
  johnsonAdjustedRanks,
  prepareLikelihoodCounts,
  prepareLikelihoodData,
  readShape,
  weibullMleFromData,
  weibullPlotY,
  weibullRankRegression,
  WeibullInputError,
  type LifeUnit,
  type LikelihoodData,
  type ShapeReading,
} from "@/lib/stats";
import { causeLabel } from "./labels";
import { lifeCautions, type LifeCaution } from "./life-cautions";
import { LR_LIMIT } from "./life-data";

export type LifeMeasure = "months" | "miles";
/** Signed removals counted by cause and service life (as the database groups them). */
export type LifeCountRow = { cause: string | null; time: number; count: number };
/** Fleet units still in service counted by service life. */
export type FleetCountRow = { time: number; count: number };

type Bounds = [number, number];

export type LifeSummary = {
  cause: string;
  label: string;
  failures: number;
  suspensions: number;
  fit: null | { beta: number; eta: number; b10: number; betaBounds: Bounds; etaBounds: Bounds; b10Bounds: Bounds; shapeReading: ShapeReading };
  /** Why no fit was made, in words. */
  note: string | null;
  /** Longest service life among the units (failures and suspensions alike). */
  longestLife: number;
  /** Reasons not to take the fit's figures at face value (empty when there is no fit). */
  cautions: LifeCaution[];
};

/** The shape is read from one bound everywhere (cause table, detail panel, CSV): this one. */
export const SHAPE_BOUND_WORDS = "95% Fisher bounds";

export type LifeDetail = LifeSummary & {
  rankRegression: { beta: number; eta: number; b10: number; r2: number } | null;
  mle: { beta: number; eta: number; b10: number; fisher: { beta: Bounds; eta: Bounds; b10: Bounds } } | null;
  /** Likelihood-ratio bounds; null when the data set is too large to profile in a page request. */
  likelihoodRatio: { beta: Bounds; eta: Bounds; b10: Bounds } | null;
  shapeExplanation: string;
  plotPoints: { time: number; medianRank: number; y: number }[];
  fittedLine: { time: number; y: number }[];
  /** Plotted failures were thinned to this many evenly spaced ranks (null: all shown). */
  thinnedFrom: number | null;
};

/** Causes that fail a bearing; "no defect found" removals are always suspensions. */
export const NOT_A_FAILURE = new Set(["no-defect"]);

export function unitsFor(cause: string, rows: readonly LifeCountRow[], fleet: readonly FleetCountRow[]): LifeUnit[] {
  const units: LifeUnit[] = [];
  for (const r of rows) {
    if (!(r.time > 0)) continue;
    const failed = r.cause === cause;
    for (let i = 0; i < r.count; i++) units.push({ time: r.time, failed });
  }
  for (const f of fleet) {
    if (!(f.time > 0)) continue;
    for (let i = 0; i < f.count; i++) units.push({ time: f.time, failed: false });
  }
  return units;
}

export function lifeCauses(rows: readonly LifeCountRow[]): { cause: string; failures: number }[] {
  const totals = new Map<string, number>();
  for (const r of rows) if (r.cause && !NOT_A_FAILURE.has(r.cause) && r.time > 0) totals.set(r.cause, (totals.get(r.cause) ?? 0) + r.count);
  return [...totals].map(([cause, failures]) => ({ cause, failures })).sort((a, b) => b.failures - a.failures || a.cause.localeCompare(b.cause));
}

const noteFor = (err: unknown) => (err instanceof WeibullInputError ? err.message : "The fit did not converge on these data.");

/** MLE with Fisher bounds: quick enough for every cause on one screen. */
export function summariseCause(cause: string, units: readonly LifeUnit[], confidence = 0.95, unit: LifeMeasure = "months"): LifeSummary {
  const failures = units.filter((u) => u.failed).length;
  const longestLife = units.reduce((m, u) => Math.max(m, u.time), 0);
  try {
    assertFittable(units);
  } catch (err) {
    return { cause, label: causeLabel(cause), failures, suspensions: units.length - failures, longestLife, fit: null, note: noteFor(err), cautions: [] };
  }
  return summariseData(cause, prepareLikelihoodData(units), { total: units.length, longestLife, confidence, unit });
}

/**
 * summariseCause from the counted rows, without one object per unit: the summary for every cause
 * then costs the distinct lives, not the casebook. Same checks and the same fit.
 */
export function summariseCauseCounts(cause: string, rows: readonly LifeCountRow[], fleet: readonly FleetCountRow[], confidence = 0.95, unit: LifeMeasure = "months"): LifeSummary {
  const groups = [
    ...rows.filter((r) => r.time > 0).map((r) => ({ time: r.time, failed: r.cause === cause, count: r.count })),
    ...fleet.filter((f) => f.time > 0).map((f) => ({ time: f.time, failed: false, count: f.count })),
  ];
  const total = groups.reduce((s, g) => s + g.count, 0);
  const longestLife = groups.reduce((m, g) => Math.max(m, g.time), 0);
  const failing = groups.filter((g) => g.failed);
  const failures = failing.reduce((s, g) => s + g.count, 0);
  // The rules of assertFittable, on counts.
  const note =
    failures < 2
      ? `At least two failures are needed to fit a Weibull distribution (got ${failures}).`
      : failing.every((g) => g.time === failing[0].time)
        ? "All failure times are equal, so the spread of lives (the Weibull shape) cannot be estimated."
        : null;
  if (note) return { cause, label: causeLabel(cause), failures, suspensions: total - failures, longestLife, fit: null, note, cautions: [] };
  return summariseData(cause, prepareLikelihoodCounts(groups), { total, longestLife, confidence, unit });
}

function summariseData(cause: string, data: LikelihoodData, o: { total: number; longestLife: number; confidence: number; unit: LifeMeasure }): LifeSummary {
  const base = { cause, label: causeLabel(cause), failures: data.failures, suspensions: o.total - data.failures, longestLife: o.longestLife };
  try {
    const fit = weibullMleFromData(data);
    const fisher = fisherBounds(data, fit, o.confidence);
    return {
      ...base,
      fit: { beta: fit.beta, eta: fit.eta, b10: fit.b10, betaBounds: fisher.beta, etaBounds: fisher.eta, b10Bounds: fisher.b10, shapeReading: readShape(fit.beta, fisher.beta).reading },
      note: null,
      cautions: lifeCautions({ failures: base.failures, suspensions: base.suspensions, eta: fit.eta, b10: fit.b10, longestLife: o.longestLife, unit: o.unit }),
    };
  } catch (err) {
    return { ...base, fit: null, note: noteFor(err), cautions: [] };
  }
}

function thin<T>(points: readonly T[], max: number): T[] {
  if (points.length <= max) return [...points];
  const out: T[] = [];
  for (let i = 0; i < max; i++) out.push(points[Math.round((i * (points.length - 1)) / (max - 1))]);
  return out;
}

function line(beta: number, eta: number, tMin: number, tMax: number, steps = 24) {
  const out: { time: number; y: number }[] = [];
  for (let i = 0; i <= steps; i++) {
    const time = Math.exp(Math.log(tMin) + ((Math.log(tMax) - Math.log(tMin)) * i) / steps);
    out.push({ time, y: beta * (Math.log(time) - Math.log(eta)) });
  }
  return out;
}

/**
 * Everything the life section shows for one cause. Likelihood-ratio bounds profile the
 * likelihood hundreds of times, so above `lrLimit` units only the Fisher bounds are given.
 */
export function analyseCause(cause: string, units: readonly LifeUnit[], opts: { confidence?: number; lrLimit?: number; maxPlotPoints?: number; unit?: LifeMeasure } = {}): LifeDetail {
  const confidence = opts.confidence ?? 0.95;
  const summary = summariseCause(cause, units, confidence, opts.unit);
  const empty = { rankRegression: null, mle: null, likelihoodRatio: null, shapeExplanation: "", plotPoints: [], fittedLine: [], thinnedFrom: null };
  if (!summary.fit) return { ...summary, ...empty };
  const small = units.length <= (opts.lrLimit ?? LR_LIMIT);
  const full = small ? fitWeibull(units, { confidence }) : null;
  const rr = full?.rankRegression.xOnY ?? weibullRankRegression(units).xOnY;
  const beta = full?.mle.beta ?? summary.fit.beta;
  const eta = full?.mle.eta ?? summary.fit.eta;
  const ranked = full?.plotPoints ?? johnsonAdjustedRanks(units).map((p) => ({ ...p, y: weibullPlotY(p.medianRank) }));
  const tMin = ranked.reduce((m, p) => Math.min(m, p.time), eta / 10);
  const tMax = units.reduce((m, u) => Math.max(m, u.time), eta * 1.5);
  const maxPoints = opts.maxPlotPoints ?? 300;
  // the same reading as the cause table: from the Fisher bounds, never the likelihood-ratio ones
  const shape = readShape(summary.fit.beta, summary.fit.betaBounds);
  const [lo, hi] = summary.fit.betaBounds;
  shape.explanation += ` Read from the ${SHAPE_BOUND_WORDS} on the shape (${lo.toFixed(2)} – ${hi.toFixed(2)}), as everywhere on this page.`;
  return {
    ...summary,
    rankRegression: { beta: rr.beta, eta: rr.eta, b10: rr.b10, r2: rr.r2 },
    mle: { beta, eta, b10: summary.fit.b10, fisher: { beta: summary.fit.betaBounds, eta: summary.fit.etaBounds, b10: summary.fit.b10Bounds } },
    likelihoodRatio: full ? { beta: full.mle.likelihoodRatio.beta, eta: full.mle.likelihoodRatio.eta, b10: full.mle.likelihoodRatio.b10 } : null,
    shapeExplanation: shape.explanation,
    plotPoints: thin(ranked, maxPoints).map((p) => ({ time: p.time, medianRank: p.medianRank, y: p.y })),
    fittedLine: line(beta, eta, tMin, tMax),
    thinnedFrom: ranked.length > maxPoints ? ranked.length : null,
  };
}
