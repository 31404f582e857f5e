import { describe, expect, it } from "vitest";
import { analyseCause, lifeCauses, summariseCause, unitsFor, type LifeCountRow } from "@/lib/tallies/life";
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
    const units = unitsFor("water-ingress", rows, fleet);
    const full = analyseCause("water-ingress", units);
    expect(full.likelihoodRatio).not.toBeNull();
    expect(full.plotPoints).toHaveLength(10);
    expect(full.rankRegression!.beta).toBeGreaterThan(0);
    // the fitted line crosses y = 0 at t = eta (ln(-ln(1 - 0.632)) = 0; Weibull paper convention)
    const line = full.fittedLine;
    expect(line[0].y).toBeLessThan(0);
    expect(line[line.length - 1].y).toBeGreaterThan(0);
    const quick = analyseCause("water-ingress", units, { lrLimit: 5 });
    expect(quick.likelihoodRatio).toBeNull();
    expectAbs(quick.mle!.beta, full.mle!.beta, 1e-9);
    expect(quick.plotPoints).toEqual(full.plotPoints);
  });

  it("thins a crowded probability plot to evenly spaced ranks", () => {
    const many = Array.from({ length: 50 }, (_, i) => ({ cause: "seal", time: 10 + i, count: 1 }));
    const d = analyseCause("seal", unitsFor("seal", many, []), { maxPlotPoints: 11 });
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
});
