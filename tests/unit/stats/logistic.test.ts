import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { chiSquareQuantile } from "@/lib/stats/distributions";
import {
  fitLogistic,
  inversePrediction,
  logLikelihood,
  predictProbability,
  profileInterval,
  waldInterval,
  type BinomialPoint,
} from "@/lib/stats/logistic";
import { expectAbs, expectRel } from "./check-values";

// tests/fixtures/logistic-check-values.json: "reference" copied from the stored check values
// (Dalal, Fowlkes & Hoadley 1989, recomputed with scipy); "recomputed" made with scipy 1.17.1 as its source says.
const values = JSON.parse(readFileSync(path.resolve(import.meta.dirname, "../../fixtures/logistic-check-values.json"), "utf8"));
const ref = values.reference;
const again = values.recomputed;

const flights: BinomialPoint[] = ref.temperature_F.map((x: number, i: number) => ({ x, n: 1, y: ref.distress[i] }));

describe("logistic fit on the 23 shuttle flights", () => {
  const fit = fitLogistic(flights)!;

  it("finds the published coefficients", () => {
    // Dalal, Fowlkes & Hoadley (1989): alpha 15.043, beta -0.2322
    expectAbs(fit.intercept, 15.043, ref.published_abs_tol.intercept);
    expectAbs(fit.slope, -0.2322, ref.published_abs_tol.slope_per_F);
  });

  it("matches the recomputed estimate, errors, log-likelihoods and LR statistic", () => {
    // computed with scipy 1.17.1 and an own IRLS (stored check values, logistic)
    expectRel(fit.intercept, ref.intercept, ref.rel_tol);
    expectRel(fit.slope, ref.slope_per_F, ref.rel_tol);
    expectRel(fit.seIntercept, ref.se_intercept, ref.rel_tol);
    expectRel(fit.seSlope, ref.se_slope, ref.rel_tol);
    expectRel(fit.loglik, ref.loglik, ref.rel_tol);
    expectRel(fit.nullLoglik, ref.null_loglik, ref.rel_tol);
    expectRel(fit.lrStatistic, ref.lr_statistic, ref.rel_tol);
    expect(fit.separated).toBe(false);
  });

  it("gives the stored Wald interval for the slope", () => {
    const w = waldInterval(fit, "slope");
    // stored check values, logistic: wald_95_slope
    expectRel(w.lower, ref.wald_95_slope[0], ref.rel_tol);
    expectRel(w.upper, ref.wald_95_slope[1], ref.rel_tol);
  });

  it("predicts the stored probabilities", () => {
    // stored check values, logistic: predicted_probability at 31, 50 and 65 °F
    for (const [x, p] of Object.entries(ref.predicted_probability))
      expectRel(predictProbability(fit, Number(x)).p, p as number, ref.rel_tol);
  });

  it("gives the recomputed profile-likelihood intervals", () => {
    // scipy 1.17.1 profile (recomputed block)
    const s = profileInterval(flights, fit, "slope");
    expectRel(s.lower, again.profile_95_slope[0], again.rel_tol);
    expectRel(s.upper, again.profile_95_slope[1], again.rel_tol);
    const a = profileInterval(flights, fit, "intercept");
    expectRel(a.lower, again.profile_95_intercept[0], again.rel_tol);
    expectRel(a.upper, again.profile_95_intercept[1], again.rel_tol);
  });

  it("profile bounds sit where the likelihood has dropped by chi2_1(0.95)/2 (arithmetic)", () => {
    const s = profileInterval(flights, fit, "slope");
    const best = (b: number) => {
      let top = -Infinity;
      for (let a = -20; a <= 60; a += 0.001) top = Math.max(top, logLikelihood(flights, a, b));
      return top;
    };
    // grid over the intercept, so only a coarse check of the definition
    expectAbs(2 * (fit.loglik - best(s.lower)), chiSquareQuantile(0.95, 1), 1e-3);
    expectAbs(2 * (fit.loglik - best(s.upper)), chiSquareQuantile(0.95, 1), 1e-3);
  });

  it("inverts the curve at 50% and 80% with the recomputed delta SE and Fieller interval", () => {
    for (const [p, block] of [
      [0.5, again.margin_at_p50],
      [0.8, again.margin_at_p80],
    ] as const) {
      const inv = inversePrediction(fit, p);
      // scipy 1.17.1 (recomputed block): x(p), delta-method SE, Fieller roots
      expectRel(inv.x, block.x, again.rel_tol);
      expectRel(inv.deltaSe, block.delta_se, again.rel_tol);
      expectRel(inv.fieller!.lower, block.fieller_95[0], again.rel_tol);
      expectRel(inv.fieller!.upper, block.fieller_95[1], again.rel_tol);
      // arithmetic: the fitted probability at x(p) is p
      expectAbs(predictProbability(fit, inv.x).p, p, 1e-12);
    }
  });

  it("Fieller bounds are where the pointwise band crosses p (arithmetic)", () => {
    const inv = inversePrediction(fit, 0.5);
    // at each Fieller bound one edge of the pointwise 95% band passes through 0.5
    const atLower = predictProbability(fit, inv.fieller!.lower);
    const atUpper = predictProbability(fit, inv.fieller!.upper);
    expect(Math.min(Math.abs(atLower.lower - 0.5), Math.abs(atLower.upper - 0.5))).toBeLessThan(1e-9);
    expect(Math.min(Math.abs(atUpper.lower - 0.5), Math.abs(atUpper.upper - 0.5))).toBeLessThan(1e-9);
  });
});

describe("logistic fit edges", () => {
  it("grouped counts give the same fit as the same flights one by one (arithmetic)", () => {
    const grouped = new Map<number, BinomialPoint>();
    for (const f of flights) {
      const g = grouped.get(f.x) ?? { x: f.x, n: 0, y: 0 };
      g.n += 1;
      g.y += f.y;
      grouped.set(f.x, g);
    }
    const a = fitLogistic(flights)!;
    const b = fitLogistic([...grouped.values()])!;
    expectRel(b.slope, a.slope, 1e-9);
    expectRel(b.seSlope, a.seSlope, 1e-9);
  });

  it("returns null with nothing to fit", () => {
    expect(fitLogistic([])).toBeNull();
    expect(
      fitLogistic([
        { x: 1, n: 4, y: 4 },
        { x: 2, n: 3, y: 3 },
      ]),
    ).toBeNull();
    expect(fitLogistic([{ x: 5, n: 10, y: 3 }])).toBeNull();
  });

  it("flags perfect separation instead of reporting a slope", () => {
    const fit = fitLogistic([
      { x: 1, n: 5, y: 0 },
      { x: 2, n: 5, y: 0 },
      { x: 3, n: 5, y: 5 },
      { x: 4, n: 5, y: 5 },
    ]);
    expect(fit?.separated).toBe(true);
  });

  it("a flat relation gives no bounded Fieller interval", () => {
    const fit = fitLogistic([
      { x: 0, n: 20, y: 10 },
      { x: 10, n: 20, y: 11 },
      { x: 20, n: 20, y: 10 },
    ])!;
    expect(inversePrediction(fit, 0.8).fieller).toBeNull();
  });

  it("refuses impossible counts", () => {
    expect(() => fitLogistic([{ x: 1, n: 2, y: 3 }])).toThrow(RangeError);
    expect(() => fitLogistic([{ x: Number.NaN, n: 2, y: 1 }])).toThrow(RangeError);
  });
});
