// Life analysis per root cause: removals for that cause are failures; removals for any other
// cause, and fleet units still in service, are suspensions (right-censored at their service life).
import {
  assertFittable,
  fisherBounds,
  fitWeibull,
  prepareLikelihoodData,
  rankRegressionAndPlot,
  readShape,
  weibullMleFromData,
  WeibullInputError,
  unfittableReason,
  type CountedUnit,
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
  fit: null | {
    beta: number;
    eta: number;
    b10: number;
    betaBounds: Bounds;
    etaBounds: Bounds;
    b10Bounds: Bounds;
    shapeReading: ShapeReading;
  };
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

/** One cause's lives as counted groups: its removals are failures, every other life a suspension. */
export function countedFor(cause: string, rows: readonly LifeCountRow[], fleet: readonly FleetCountRow[]): CountedUnit[] {
  const failed = new Map<number, number>();
  const running = new Map<number, number>();
  const add = (m: Map<number, number>, t: number, n: number) => m.set(t, (m.get(t) ?? 0) + n);
  for (const r of rows) if (r.time > 0) add(r.cause === cause ? failed : running, r.time, r.count);
  for (const f of fleet) if (f.time > 0) add(running, f.time, f.count);
  return [
    ...[...failed].map(([time, count]) => ({ time, failed: true, count })),
    ...[...running].map(([time, count]) => ({ time, failed: false, count })),
  ];
}

/** The same, one unit per bearing. */
export function unitsFor(cause: string, rows: readonly LifeCountRow[], fleet: readonly FleetCountRow[]): LifeUnit[] {
  const units: LifeUnit[] = [];
  for (const g of countedFor(cause, rows, fleet)) for (let i = 0; i < g.count; i++) units.push({ time: g.time, failed: g.failed });
  return units;
}

/** The order of the cause table: most failures first, then by name. */
const causeOrder = (a: { cause: string; failures: number }, b: { cause: string; failures: number }) =>
  b.failures - a.failures || a.cause.localeCompare(b.cause);

export function lifeCauses(rows: readonly LifeCountRow[]): { cause: string; failures: number }[] {
  const totals = new Map<string, number>();
  for (const r of rows) if (r.cause && !NOT_A_FAILURE.has(r.cause) && r.time > 0) totals.set(r.cause, (totals.get(r.cause) ?? 0) + r.count);
  return [...totals].map(([cause, failures]) => ({ cause, failures })).sort(causeOrder);
}

const noteFor = (err: unknown) => (err instanceof WeibullInputError ? err.message : "The fit did not converge on these data.");

/** MLE with Fisher bounds: quick enough for every cause on one screen. */
export function summariseCause(cause: string, units: readonly LifeUnit[], confidence = 0.95, unit: LifeMeasure = "months"): LifeSummary {
  const failures = units.filter((u) => u.failed).length;
  const longestLife = units.reduce((m, u) => Math.max(m, u.time), 0);
  try {
    assertFittable(units);
  } catch (err) {
    return {
      cause,
      label: causeLabel(cause),
      failures,
      suspensions: units.length - failures,
      longestLife,
      fit: null,
      note: noteFor(err),
      cautions: [],
    };
  }
  return summariseData(cause, prepareLikelihoodData(units), { total: units.length, longestLife, confidence, unit });
}

/**
 * What the cause table needs from the casebook, counted by the database: every signed life by
 * service life (any cause), and per cause its failures, the sum of their log lives and the first
 * and last of them. `own` carries one cause's lives (the chosen cause's failures) when fetched.
 */
export type LifeTotals = {
  byTime: readonly FleetCountRow[];
  causes: readonly { cause: string; failures: number; sumLog: number; first: number; last: number }[];
  own: { cause: string; times: readonly FleetCountRow[] } | null;
  withoutLife: number;
};

/** LifeTotals from rows counted by cause and life (the same sums the database makes). */
export function lifeTotalsOf(rows: readonly LifeCountRow[]): Omit<LifeTotals, "own" | "withoutLife"> {
  const byTime = new Map<number, number>();
  const own = new Map(lifeCauses(rows).map((c) => [c.cause, { cause: c.cause, failures: 0, sumLog: 0, first: Infinity, last: -Infinity }]));
  for (const r of rows) {
    if (!(r.time > 0)) continue;
    byTime.set(r.time, (byTime.get(r.time) ?? 0) + r.count);
    const c = r.cause ? own.get(r.cause) : undefined;
    if (!c) continue;
    c.failures += r.count;
    c.sumLog += r.count * Math.log(r.time);
    c.first = Math.min(c.first, r.time);
    c.last = Math.max(c.last, r.time);
  }
  return { byTime: [...byTime].map(([time, count]) => ({ time, count })), causes: [...own.values()] };
}

/**
 * summariseCause for every cause at once, from the counted rows. Each cause sees the same lives
 * (its removals failed, the rest suspended), so one table of distinct lives serves them all and a
 * cause costs only its failure count and sum of log lives: the casebook is read once, not per cause.
 */
export function summariseEveryCause(
  rows: readonly LifeCountRow[],
  fleet: readonly FleetCountRow[],
  confidence = 0.95,
  unit: LifeMeasure = "months",
): LifeSummary[] {
  return summariseTotals(lifeTotalsOf(rows), fleet, confidence, unit);
}

/** summariseEveryCause from the totals the database counted. */
export function summariseTotals(
  totals: Pick<LifeTotals, "byTime" | "causes">,
  fleet: readonly FleetCountRow[],
  confidence = 0.95,
  unit: LifeMeasure = "months",
): LifeSummary[] {
  const byTime = new Map<number, number>();
  for (const b of totals.byTime) if (b.time > 0) byTime.set(b.time, (byTime.get(b.time) ?? 0) + b.count);
  for (const f of fleet) if (f.time > 0) byTime.set(f.time, (byTime.get(f.time) ?? 0) + f.count);
  const logTimes: number[] = [];
  const counts: number[] = [];
  let total = 0;
  let longestLife = 0;
  for (const [t, n] of byTime) {
    logTimes.push(Math.log(t));
    counts.push(n);
    total += n;
    longestLife = Math.max(longestLife, t);
  }
  const maxLogTime = Math.log(longestLife);
  const causes = totals.causes.filter((c) => c.failures > 0 && !NOT_A_FAILURE.has(c.cause)).sort(causeOrder);
  return causes.map((c) => {
    const cause = c.cause;
    // The rules of assertFittable, on counts.
    const note = unfittableReason(c.failures, c.first === c.last);
    if (note)
      return {
        cause,
        label: causeLabel(cause),
        failures: c.failures,
        suspensions: total - c.failures,
        longestLife,
        fit: null,
        note,
        cautions: [],
      };
    const data: LikelihoodData = { logTimes, counts, maxLogTime, failures: c.failures, sumLogFailureTimes: c.sumLog };
    return summariseData(cause, data, { total, longestLife, confidence, unit });
  });
}

/** One cause's lives as counted groups from the totals: its own lives failed, every other life (and the fleet) suspended. */
export function countedFromTotals(
  own: readonly FleetCountRow[],
  byTime: readonly FleetCountRow[],
  fleet: readonly FleetCountRow[],
): CountedUnit[] {
  const failed = new Map<number, number>();
  const running = new Map<number, number>();
  const add = (m: Map<number, number>, t: number, n: number) => m.set(t, (m.get(t) ?? 0) + n);
  for (const o of own) if (o.time > 0) add(failed, o.time, o.count);
  for (const b of byTime) if (b.time > 0) add(running, b.time, b.count - (failed.get(b.time) ?? 0));
  for (const f of fleet) if (f.time > 0) add(running, f.time, f.count);
  return [
    ...[...failed].map(([time, count]) => ({ time, failed: true, count })),
    ...[...running].filter(([, count]) => count > 0).map(([time, count]) => ({ time, failed: false, count })),
  ];
}

function summariseCounted(
  cause: string,
  groups: readonly CountedUnit[],
  total: number,
  confidence: number,
  unit: LifeMeasure,
): LifeSummary {
  const rows = groups.map((g) => ({ cause: g.failed ? cause : null, time: g.time, count: g.count }));
  return (
    summariseEveryCause(rows, [], confidence, unit).find((s) => s.cause === cause) ?? {
      cause,
      label: causeLabel(cause),
      failures: 0,
      suspensions: total,
      longestLife: groups.reduce((m, g) => Math.max(m, g.time), 0),
      fit: null,
      note: unfittableReason(0, false),
      cautions: [],
    }
  );
}

function summariseData(
  cause: string,
  data: LikelihoodData,
  o: { total: number; longestLife: number; confidence: number; unit: LifeMeasure },
): LifeSummary {
  const base = {
    cause,
    label: causeLabel(cause),
    failures: data.failures,
    suspensions: o.total - data.failures,
    longestLife: o.longestLife,
  };
  try {
    const fit = weibullMleFromData(data);
    const fisher = fisherBounds(data, fit, o.confidence);
    return {
      ...base,
      fit: {
        beta: fit.beta,
        eta: fit.eta,
        b10: fit.b10,
        betaBounds: fisher.beta,
        etaBounds: fisher.eta,
        b10Bounds: fisher.b10,
        shapeReading: readShape(fit.beta, fisher.beta).reading,
      },
      note: null,
      cautions: lifeCautions({
        failures: base.failures,
        suspensions: base.suspensions,
        eta: fit.eta,
        b10: fit.b10,
        longestLife: o.longestLife,
        unit: o.unit,
      }),
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
 * Everything the life section shows for one cause, from its counted lives. Likelihood-ratio bounds
 * profile the likelihood hundreds of times, so above `lrLimit` units only the Fisher bounds are given.
 */
export function analyseCause(
  cause: string,
  groups: readonly CountedUnit[],
  opts: { confidence?: number; lrLimit?: number; maxPlotPoints?: number; unit?: LifeMeasure; summary?: LifeSummary } = {},
): LifeDetail {
  const confidence = opts.confidence ?? 0.95;
  const total = groups.reduce((s, g) => s + g.count, 0);
  const small = total <= (opts.lrLimit ?? LR_LIMIT);
  const units = small ? groups.flatMap((g) => Array.from({ length: g.count }, () => ({ time: g.time, failed: g.failed }))) : null;
  // a large set's summary is the one the cause table already made, when the caller has it
  const summary = units
    ? summariseCause(cause, units, confidence, opts.unit)
    : (opts.summary ?? summariseCounted(cause, groups, total, confidence, opts.unit ?? "months"));
  const empty = {
    rankRegression: null,
    mle: null,
    likelihoodRatio: null,
    shapeExplanation: "",
    plotPoints: [],
    fittedLine: [],
    thinnedFrom: null,
  };
  if (!summary.fit) return { ...summary, ...empty };
  const full = units ? fitWeibull(units, { confidence }) : null;
  const maxPoints = opts.maxPlotPoints ?? 300;
  // a large set is ranked without keeping an object per failure: the regression and the thinned plot in one pass
  const counted = full ? null : rankRegressionAndPlot(groups, maxPoints);
  const plotted = full ? thin(full.plotPoints, maxPoints) : counted!.points;
  const plottedFrom = full ? full.plotPoints.length : counted!.failures;
  const rr = full?.rankRegression.xOnY ?? counted!.regression.xOnY;
  const beta = full?.mle.beta ?? summary.fit.beta;
  const eta = full?.mle.eta ?? summary.fit.eta;
  // failures come in time order: the first plotted one is the earliest
  const tMin = Math.min(plotted[0]?.time ?? Infinity, eta / 10);
  const tMax = groups.reduce((m, u) => Math.max(m, u.time), eta * 1.5);
  // the same reading as the cause table: from the Fisher bounds, never the likelihood-ratio ones
  const shape = readShape(summary.fit.beta, summary.fit.betaBounds);
  const [lo, hi] = summary.fit.betaBounds;
  shape.explanation += ` Read from the ${SHAPE_BOUND_WORDS} on the shape (${lo.toFixed(2)} – ${hi.toFixed(2)}), as everywhere on this page.`;
  return {
    ...summary,
    rankRegression: { beta: rr.beta, eta: rr.eta, b10: rr.b10, r2: rr.r2 },
    mle: {
      beta,
      eta,
      b10: summary.fit.b10,
      fisher: { beta: summary.fit.betaBounds, eta: summary.fit.etaBounds, b10: summary.fit.b10Bounds },
    },
    likelihoodRatio: full
      ? { beta: full.mle.likelihoodRatio.beta, eta: full.mle.likelihoodRatio.eta, b10: full.mle.likelihoodRatio.b10 }
      : null,
    shapeExplanation: shape.explanation,
    plotPoints: plotted.map((p) => ({ time: p.time, medianRank: p.medianRank, y: p.y })),
    fittedLine: line(beta, eta, tMin, tMax),
    thinnedFrom: plottedFrom > maxPoints ? plottedFrom : null,
  };
}
