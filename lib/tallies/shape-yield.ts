// Shapes the removal-yield counts into figures: the fitted curve over banded rates, detectors on a
// funnel against the fleet rate, field calls per shop and inspector, and the money on removals that
// teardown did not confirm. Pure: counts in, plain JSON out.
import {
  chiSquareSurvival,
  fitLogistic,
  funnelCurve,
  funnelPosition,
  inversePrediction,
  predictProbability,
  profileInterval,
  waldInterval,
  wilsonInterval,
  type BinomialPoint,
} from "@/lib/stats";
import { percent } from "./labels";
import { niceBandWidth, wilsonBins } from "./yield-bins";
import { usd } from "./read-outs";
import type { CallCell, DetectorCell, HotCell, KeepCell, OutcomeCell, YieldCounts } from "./yield-counts";
import type { CallRow, DetectorRow, QuarterSeries, RateRow, ReadingFit, YieldData } from "./yield-data";

export { usd };

/** Fewer outcomes than this and a rate is marked as resting on few removals (common practice: n < 10). */
export const SMALL_GROUP = 10;
/** Fewer outcomes than this and the fitted curve is shown with a caution. */
export const SMALL_FIT = 30;

export function rateRow(c: OutcomeCell, label: string): RateRow {
  return {
    id: c.key,
    label,
    n: c.n,
    confirmed: c.confirmed,
    noDefect: c.noDefect,
    rate: wilsonInterval(c.confirmed, c.n),
    costUsd: c.costUsd,
    uncosted: c.uncosted,
    small: c.n < SMALL_GROUP,
  };
}

const round = (x: number, d = 4) => Math.round(x * 10 ** d) / 10 ** d;

export function readingFit(cells: readonly HotCell[], basis: "margin" | "reading"): ReadingFit {
  const grouped = new Map<number, BinomialPoint>();
  for (const c of cells) {
    const x = basis === "margin" ? c.margin : c.reading;
    const g = grouped.get(x) ?? { x, n: 0, y: 0 };
    g.n += c.n;
    g.y += c.confirmed;
    grouped.set(x, g);
  }
  const points = [...grouped.values()].sort((a, b) => a.x - b.x);
  const n = points.reduce((s, p) => s + p.n, 0);
  const confirmed = points.reduce((s, p) => s + p.y, 0);
  const lo = points[0]?.x ?? 0;
  const hi = points.at(-1)?.x ?? 0;
  const bins = wilsonBins(points, niceBandWidth(lo, hi));
  const base: ReadingFit = { basis, n, confirmed, bins, fit: null, noFit: null, split: null };
  if (!n) return { ...base, noFit: "No hot-bearing alarms with a reading and an outcome match these filters." };

  const fit = fitLogistic(points);
  let shaped: ReadingFit["fit"] = null;
  let noFit: string | null = null;
  if (!fit)
    noFit =
      confirmed === 0 || confirmed === n
        ? "Every alarm had the same outcome, so there is no curve to fit."
        : "All readings are the same, so there is no curve to fit.";
  else if (fit.separated) noFit = "The outcomes split cleanly at one reading, so the curve cannot be estimated; see the bands.";
  else {
    const steps = 48;
    const curve = Array.from({ length: steps + 1 }, (_, i) => {
      const x = lo + ((hi - lo) * i) / steps;
      const p = predictProbability(fit, x);
      return { x: round(x, 2), p: round(p.p), lower: round(p.lower), upper: round(p.upper) };
    });
    const inv = (q: number) => {
      if (fit.slope === 0) return null;
      const r = inversePrediction(fit, q);
      return { x: round(r.x, 1), lower: r.fieller ? round(r.fieller.lower, 1) : null, upper: r.fieller ? round(r.fieller.upper, 1) : null };
    };
    const wald = waldInterval(fit, "slope");
    const profile = profileInterval(points, fit, "slope");
    shaped = {
      intercept: fit.intercept,
      slope: fit.slope,
      slopeWald: [wald.lower, wald.upper],
      slopeProfile: [profile.lower, profile.upper],
      pValue: chiSquareSurvival(fit.lrStatistic, 1),
      curve,
      at50: inv(0.5),
      at80: inv(0.8),
    };
  }
  return { ...base, fit: shaped, noFit, split: splitAt(points, shaped?.at50?.x ?? null) };
}

/** Confirmed share above and below a reading: the fitted 50% point when it lies among the data, else the median. */
export function splitAt(points: readonly BinomialPoint[], preferred: number | null): ReadingFit["split"] {
  if (points.length < 2) return null;
  const total = points.reduce((s, p) => s + p.n, 0);
  let at = preferred !== null && preferred > points[0].x && preferred <= points.at(-1)!.x ? Math.round(preferred) : null;
  if (at === null) {
    let seen = 0;
    for (const p of points) {
      seen += p.n;
      if (seen >= total / 2) {
        at = p.x;
        break;
      }
    }
  }
  const above = points.filter((p) => p.x > at!);
  const below = points.filter((p) => p.x <= at!);
  const sum = (xs: BinomialPoint[]) => ({ n: xs.reduce((s, p) => s + p.n, 0), y: xs.reduce((s, p) => s + p.y, 0) });
  const a = sum(above);
  const b = sum(below);
  if (!a.n || !b.n) return null;
  return { at: at!, above: { ...wilsonInterval(a.y, a.n), n: a.n }, below: { ...wilsonInterval(b.y, b.n), n: b.n } };
}

export function detectorRows(cells: readonly DetectorCell[], triggerLabel: (code: string) => string) {
  const n = cells.reduce((s, c) => s + c.n, 0);
  const confirmed = cells.reduce((s, c) => s + c.confirmed, 0);
  const fleet = { ...wilsonInterval(confirmed, n), n, confirmed };
  // a detector that gives both hot-bearing and acoustic alarms appears once per kind, named so
  const kinds = new Map<string, number>();
  for (const c of cells) kinds.set(c.key, (kinds.get(c.key) ?? 0) + 1);
  const nameOf = (c: DetectorCell) =>
    (kinds.get(c.key) ?? 0) > 1 ? `${c.key} · ${c.trigger === "wayside-acoustic" ? "acoustic" : "hot-bearing"}` : c.key;
  const rows: DetectorRow[] = cells.map((c) => ({
    ...rateRow(c, nameOf(c)),
    trigger: triggerLabel(c.trigger),
    location: c.location ?? "",
    alarms: c.alarms,
    position: c.n > 0 && fleet.p !== null ? funnelPosition(c.confirmed, c.n, fleet.p) : null,
  }));
  rows.sort((a, b) => (a.rate.p ?? 2) - (b.rate.p ?? 2) || b.n - a.n || a.label.localeCompare(b.label));
  const maxN = Math.max(1, ...rows.map((r) => r.n));
  return { fleet, rows, funnel: fleet.p === null ? [] : funnelCurve(maxN * 1.1, fleet.p) };
}

export function callRows(cells: readonly OutcomeCell[], keeps: readonly KeepCell[], labelOf: (id: string) => string): CallRow[] {
  const keepBy = new Map(keeps.map((k) => [k.key, k]));
  const ids = new Set([...cells.map((c) => c.key), ...keeps.map((k) => k.key)]);
  const rows = [...ids].map((id) => {
    const c = cells.find((x) => x.key === id) ?? { key: id, n: 0, confirmed: 0, noDefect: 0, costUsd: 0, uncosted: 0 };
    const k = keepBy.get(id);
    return { ...rateRow(c, labelOf(id)), keeps: k?.keeps ?? 0, missed: k?.missed ?? 0 };
  });
  return rows.sort((a, b) => (a.rate.p ?? 2) - (b.rate.p ?? 2) || a.label.localeCompare(b.label));
}

export function quarterSeries(
  cells: readonly CallCell[],
  siteLabel: (id: string) => string,
): { quarters: QuarterSeries[]; quarterList: string[] } {
  const quarterList = [...new Set(cells.map((c) => c.quarter!))].sort();
  const bySite = new Map<string, CallCell[]>();
  for (const c of cells) bySite.set(c.siteId!, [...(bySite.get(c.siteId!) ?? []), c]);
  const quarters = [...bySite.entries()].map(([id, list]) => ({
    id,
    label: siteLabel(id),
    points: quarterList.map((q) => {
      const c = list.find((x) => x.quarter === q);
      return { quarter: q, n: c?.n ?? 0, confirmed: c?.confirmed ?? 0, p: c && c.n ? round(c.confirmed / c.n) : null };
    }),
  }));
  quarters.sort((a, b) => a.label.localeCompare(b.label));
  return { quarters, quarterList };
}

export type YieldLabels = { site: (id: string) => string; person: (id: string) => string; trigger: (code: string) => string };

/** Both reading fits of the hot-bearing cells: the costliest shaping, so a caller may start it as soon as those cells arrive. */
export function readingFits(cells: readonly HotCell[]): ReadingFits {
  return { margin: readingFit(cells, "margin"), reading: readingFit(cells, "reading") };
}

export type ReadingFits = { margin: ReadingFit; reading: ReadingFit };

/** `fits`, when given, must be `readingFits(counts.hot)`. */
export function shapeYield(
  counts: YieldCounts,
  labels: YieldLabels,
  fits: ReadingFits = readingFits(counts.hot),
): Omit<YieldData, "filters" | "missWindow" | "siteLimit" | "ownCallsOnly" | "namesShown" | "generatedAt"> {
  const { margin, reading } = fits;
  const detectors = detectorRows(counts.detectors, labels.trigger);
  const shops = callRows(counts.callsByShop, counts.keepsByShop, labels.site);
  const inspectors = callRows(counts.callsByInspector, counts.keepsByInspector, labels.person);
  const callN = counts.callsByShop.reduce((s, c) => s + c.n, 0);
  const callY = counts.callsByShop.reduce((s, c) => s + c.confirmed, 0);
  const byTrigger = counts.triggers
    .filter((c) => c.n > 0)
    .map((c) => rateRow(c, labels.trigger(c.key)))
    // the label settles ties (triggers with no no-defect removals), whatever order the counts came in
    .sort((a, b) => b.costUsd - a.costUsd || b.noDefect - a.noDefect || a.label.localeCompare(b.label));
  const byDetector = detectors.rows.filter((r) => r.noDefect > 0).sort((a, b) => b.costUsd - a.costUsd || b.noDefect - a.noDefect);
  const cost = {
    byTrigger,
    byDetector,
    totalUsd: byTrigger.reduce((s, r) => s + r.costUsd, 0),
    uncosted: byTrigger.reduce((s, r) => s + r.uncosted, 0),
    noDefect: byTrigger.reduce((s, r) => s + r.noDefect, 0),
  };
  return {
    summary: summaryLines(margin, detectors.rows, shops, cost),
    cautions: cautionLines(margin, detectors.rows, counts.hotWithoutReading),
    hot: { margin, reading, withoutReading: counts.hotWithoutReading },
    acoustic: counts.acoustic.filter((c) => c.n > 0).map((c) => rateRow(c, c.key)),
    detectors,
    calls: {
      shops,
      inspectors,
      ...quarterSeries(counts.callsByQuarter, labels.site),
      overall: { ...wilsonInterval(callY, callN), n: callN },
    },
    cost,
  };
}

function summaryLines(margin: ReadingFit, detectors: DetectorRow[], shops: CallRow[], cost: YieldData["cost"]): string[] {
  const out: string[] = [];
  const s = margin.split;
  if (s) {
    out.push(
      `Hot-bearing alarms more than ${s.at} °F over the owner's threshold were confirmed at teardown ${percent(s.above.p)} of the time (${s.above.n} removals); at ${s.at} °F over or less, ${percent(s.below.p)} (${s.below.n}).`,
    );
  } else if (margin.n) {
    out.push(`${margin.n} hot-bearing alarms with a reading were torn down; ${percent(margin.confirmed / margin.n)} were confirmed.`);
  }
  if (margin.fit?.at50)
    out.push(
      `Half of these removals are expected to be confirmed at about ${margin.fit.at50.x} °F over the threshold${margin.fit.at50.lower !== null ? ` (95%: ${margin.fit.at50.lower} to ${margin.fit.at50.upper} °F)` : " (the interval is open: the data do not pin it down)"}.`,
    );
  const low = detectors.filter((d) => d.position === "below-998" || d.position === "below-95");
  if (low.length)
    out.push(
      `${low.length === 1 ? "Detector" : "Detectors"} ${low.map((d) => d.label).join(", ")} ${low.length === 1 ? "has" : "have"} alarms confirmed less often than the fleet, beyond what chance explains at ${low.length === 1 ? "its" : "their"} number of alarms: worth checking.`,
    );
  const weak = shops.filter((r) => r.n >= SMALL_GROUP).sort((a, b) => (a.rate.p ?? 1) - (b.rate.p ?? 1))[0];
  if (weak && shops.length > 1) out.push(`${weak.label}'s remove calls were confirmed least often: ${percent(weak.rate.p)} of ${weak.n}.`);
  if (cost.noDefect)
    out.push(
      `${cost.noDefect} signed removals found no defect${cost.totalUsd ? `, about ${usd(cost.totalUsd)} at the sites' cost per removal` : ""}${cost.uncosted ? ` (${cost.uncosted} at sites with no cost set)` : ""}.`,
    );
  return out;
}

function cautionLines(margin: ReadingFit, detectors: DetectorRow[], withoutReading: number): string[] {
  const out: string[] = [];
  if (margin.n > 0 && margin.n < SMALL_FIT) out.push(`The curve rests on ${margin.n} hot-bearing alarms; read it as a rough guide.`);
  const few = detectors.filter((d) => d.n > 0 && d.n < SMALL_GROUP).length;
  if (few)
    out.push(
      `${few} ${few === 1 ? "detector has" : "detectors have"} fewer than ${SMALL_GROUP} torn-down alarms; their shares can swing widely — the funnel shows how widely.`,
    );
  if (withoutReading)
    out.push(
      `${withoutReading} hot-bearing ${withoutReading === 1 ? "alarm has" : "alarms have"} no reading or threshold recorded and ${withoutReading === 1 ? "is" : "are"} left out of the curve.`,
    );
  return out;
}
