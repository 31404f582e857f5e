import { describe, expect, it } from "vitest";
import { analyseCause, countedFor, lifeCauses, summariseCause, unitsFor, type LifeCountRow } from "@/lib/tallies/life";
import { cautionTags, lifeFigure } from "@/lib/tallies/life-cautions";
import { checkValues, expectAbs } from "../stats/check-values";

// NIST/SEMATECH e-Handbook 8.4.1.3: 10 failures and 10 units still running at 500 hours (fixture).
const nist = checkValues.weibull.nist_8_4_1_3;
const failureTimes: number[] = nist.times.filter((_: number, i: number) => nist.status[i] === 1);

const rows: LifeCountRow[] = [
  ...failureTimes.map((time) => ({ cause: "water-ingress", time, count: 1 })),
  { cause: "seal", time: 500, count: 6 }, // removed for another cause: suspensions for water ingress
  { cause: "no-defect", time: 0, count: 3 }, // no service life: left out
];
const fleet = [{ time: 500, count: 4 }]; // still in service at 500: suspensions

describe("life analysis per root cause", () => {
  it("treats the chosen cause as failures and other removals and fleet units as suspensions", () => {
    const units = unitsFor("water-ingress", rows, fleet);
    expect(units).toHaveLength(20);
    expect(units.filter((u) => u.failed).map((u) => u.time)).toEqual(failureTimes);
    expect(units.filter((u) => !u.failed).every((u) => u.time === 500)).toBe(true);
  });

  it("lists the causes that can fail a bearing, never 'no defect found'", () => {
    expect(lifeCauses([...rows, { cause: "no-defect", time: 30, count: 9 }])).toEqual([
      { cause: "water-ingress", failures: 10 },
      { cause: "seal", failures: 6 },
    ]);
  });

  it("fits the NIST example by maximum likelihood (published beta 1.7208, eta 606.528)", () => {
    const s = summariseCause("water-ingress", unitsFor("water-ingress", rows, fleet));
    expect([s.failures, s.suspensions]).toEqual([10, 10]);
    expectAbs(s.fit!.beta, nist.published.beta, nist.published.abs_tol.beta);
    expectAbs(s.fit!.eta, nist.published.eta, nist.published.abs_tol.eta);
    expect(s.fit!.betaBounds[0]).toBeLessThan(s.fit!.beta);
    expect(s.fit!.b10Bounds[1]).toBeGreaterThan(s.fit!.b10);
  });

  it("gives the full analysis for small sets and Fisher bounds only above the profiling limit", () => {
    const groups = countedFor("water-ingress", rows, fleet);
    const full = analyseCause("water-ingress", groups);
    expect(full.likelihoodRatio).not.toBeNull();
    expect(full.plotPoints).toHaveLength(10);
    expect(full.rankRegression!.beta).toBeGreaterThan(0);
    // the fitted line crosses y = 0 at t = eta (ln(-ln(1 - 0.632)) = 0; Weibull paper convention)
    const line = full.fittedLine;
    expect(line[0].y).toBeLessThan(0);
    expect(line[line.length - 1].y).toBeGreaterThan(0);
    // above the limit the counted path: same fit, same ranks and regression, no profiling
    const quick = analyseCause("water-ingress", groups, { lrLimit: 5 });
    expect(quick.likelihoodRatio).toBeNull();
    expectAbs(quick.mle!.beta, full.mle!.beta, 1e-9);
    expectAbs(quick.mle!.fisher.eta[1], full.mle!.fisher.eta[1], 1e-6);
    expectAbs(quick.rankRegression!.beta, full.rankRegression!.beta, 1e-9);
    expect(quick.plotPoints.map((p) => p.time)).toEqual(full.plotPoints.map((p) => p.time));
    quick.plotPoints.forEach((p, i) => expectAbs(p.medianRank, full.plotPoints[i].medianRank, 1e-12));
  });

  it("thins a crowded probability plot to evenly spaced ranks", () => {
    const many = Array.from({ length: 50 }, (_, i) => ({ cause: "seal", time: 10 + i, count: 1 }));
    const d = analyseCause("seal", countedFor("seal", many, []), { maxPlotPoints: 11 });
    expect(d.plotPoints).toHaveLength(11);
    expect(d.thinnedFrom).toBe(50);
    expect(d.plotPoints[0].time).toBe(10);
    expect(d.plotPoints[10].time).toBe(59);
  });

  it("says why a cause cannot be fitted", () => {
    const s = summariseCause("seal", unitsFor("seal", [{ cause: "seal", time: 40, count: 1 }], []));
    expect(s.fit).toBeNull();
    expect(s.note).toMatch(/At least two failures/);
  });

  it("reads the shape from one bound everywhere, even where the two kinds of bounds disagree", () => {
    // 6 failures among 12 units (invented): 95% Fisher bounds on beta 1.0008 - 4.05 leave out 1,
    // likelihood-ratio bounds 0.89 - 3.73 hold it (both from this code; checked against fixtures elsewhere)
    const fails = [54, 20, 27, 47, 47, 8];
    const susp = [46, 33, 60, 53, 12, 36];
    const units = [...fails.map((time) => ({ time, failed: true })), ...susp.map((time) => ({ time, failed: false }))];
    const quick = summariseCause("seal", units);
    const full = analyseCause(
      "seal",
      units.map((u) => ({ ...u, count: 1 })),
    );
    expect(full.likelihoodRatio!.beta[0]).toBeLessThan(1);
    expect(quick.fit!.betaBounds[0]).toBeGreaterThan(1);
    expect(quick.fit!.shapeReading).toBe("wear-out");
    expect(full.fit!.shapeReading).toBe(quick.fit!.shapeReading);
    expect(full.shapeExplanation).toMatch(/above 1/);
    expect(full.shapeExplanation).toMatch(/Read from the 95% Fisher bounds on the shape \(1\.00 – 4\.05\)/);
  });

  it("cautions a four-failure fit that extrapolates far past the longest life", () => {
    // 4 early failures and 400 units running 60 to 118.5 months (invented): eta and B10 land far past them
    const units = [
      ...[3, 9, 20, 41].map((time) => ({ time, failed: true })),
      ...Array.from({ length: 400 }, (_, i) => ({ time: 60 + (i % 40) * 1.5, failed: false })),
    ];
    const s = summariseCause("mounting", units, 0.95, "months");
    expect(s.fit!.eta).toBeGreaterThan(10 * s.longestLife);
    expect(s.longestLife).toBe(118.5);
    const kinds = s.cautions.map((c) => c.kind);
    expect(kinds).toEqual(["few-failures", "heavy-censoring", "eta-beyond-data", "b10-beyond-data"]);
    expect(s.cautions[0].text).toMatch(/^Only 4 failures: /);
    // 400 of 404 suspended = 99% (arithmetic)
    expect(s.cautions[1].text).toMatch(/^400 of 404 units \(99%\) are suspensions/);
    expect(s.cautions[2].text).toMatch(/the longest life observed \(119 months\)/);
    expect(cautionTags(s.cautions)).toBe("few failures · heavily censored · beyond the data");
    // no bare far-off figure: words instead of the number past 10 x the longest life
    expect(lifeFigure(s.fit!.eta, s.longestLife, (v) => v.toFixed(0))).toBe("over 1185");
    expect(lifeFigure(100, s.longestLife, (v) => v.toFixed(0))).toBe("100");
  });

  it("gives no caution to a well-supported fit", () => {
    // NIST 8.4.1.3: 10 failures, 10 suspensions, eta 606.5 beyond the 500-hour test end but B10 164 inside it
    const s = summariseCause("water-ingress", unitsFor("water-ingress", rows, fleet));
    expect(s.cautions.map((c) => c.kind)).toEqual(["eta-beyond-data"]);
    expect(s.cautions[0].text).toMatch(/1\.2 times the longest life observed \(500 months\)/);
  });
});
