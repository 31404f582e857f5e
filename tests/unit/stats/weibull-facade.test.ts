import { describe, expect, it } from "vitest";
import { fitWeibull } from "@/lib/stats/weibull";
import { readShape } from "@/lib/stats/weibull-shape";
import { weibullBLife } from "@/lib/stats/weibull-data";
import { checkValues, expectRel, unitsOf } from "./check-values";

const { lieblein_zelen_complete: lz, nist_8_4_1_3: nist, kececioglu_mean_order_number: kec } = checkValues.weibull;

/** Ideal sample: the Benard plotting positions of a Weibull(beta, eta) as times. */
function idealSample(beta: number, eta: number, n: number) {
  return Array.from({ length: n }, (_, i) => ({
    time: eta * Math.pow(-Math.log(1 - (i + 1 - 0.3) / (n + 0.4)), 1 / beta),
    failed: true,
  }));
}

describe("fitWeibull", () => {
  it("gathers counts, fits and bounds for the NIST e-Handbook 8.4.1.3 example", () => {
    const a = fitWeibull(unitsOf(nist));
    expect([a.n, a.failures, a.suspensions]).toEqual([20, 10, 10]);
    // NIST/SEMATECH e-Handbook 8.4.1.3 data; values computed with reference libraries
    expectRel(a.mle.beta, nist.computed.beta, nist.computed.rel_tol);
    expectRel(a.b10.mle, nist.computed.B10, nist.computed.rel_tol);
    expectRel(a.b10.fisher[0], nist.fisher_95.B10_ci[0], nist.fisher_95.rel_tol);
    expectRel(a.b10.likelihoodRatio[1], nist.lr_95.B10_ci[1], nist.lr_95.rel_tol);
    expectRel(a.rankRegression.xOnY.beta, nist.mrr_benard_johnson.XonY.beta, nist.mrr_benard_johnson.rel_tol);
    // LR bounds on beta [0.906, 2.886] hold 1, so the data cannot claim wear-out
    expect(a.shapeReading).toBe("random");
    expect(a.plotPoints).toHaveLength(10);
  });

  it("reads the Lieblein & Zelen bearings as wear-out", () => {
    const a = fitWeibull(unitsOf(lz));
    // Lieblein & Zelen (1956) data: LR bounds on beta [1.504, 2.792] lie above 1
    expect(a.shapeReading).toBe("wear-out");
    expect(a.shapeExplanation).toMatch(/above 1/);
  });

  it("reads a sample drawn with beta 0.5 as early life", () => {
    const a = fitWeibull(idealSample(0.5, 1000, 40));
    expect(a.mle.beta).toBeLessThan(0.7); // common practice: an ideal sample fits near its own shape
    expect(a.mle.likelihoodRatio.beta[1]).toBeLessThan(1);
    expect(a.shapeReading).toBe("early-life");
  });

  it("gives plot points with Johnson ranks and the Weibull-paper ordinate", () => {
    const a = fitWeibull(unitsOf(kec));
    a.plotPoints.forEach((p, i) => {
      // Kececioglu, Reliability & Life Testing Handbook Vol. 2 (1994), Table 3.1 p.78
      expectRel(p.adjustedRank, kec.mean_order_numbers[i], kec.rel_tol);
      expectRel(p.medianRank, kec.benard_F[i], kec.rel_tol);
      expectRel(p.y, Math.log(-Math.log(1 - kec.benard_F[i])), kec.rel_tol); // y = ln(-ln(1-F)) of the same F
    });
  });

  it("fittedLine runs straight on Weibull paper and crosses 63.2% at eta", () => {
    const a = fitWeibull(unitsOf(lz));
    const line = a.fittedLine(10, 200, 10);
    expect(line).toHaveLength(11);
    expectRel(line[0].time, 10, 1e-12);
    expectRel(line[10].time, 200, 1e-12);
    const atEta = a.fittedLine(a.mle.eta / 2, a.mle.eta, 1)[1];
    expect(atEta.y).toBeCloseTo(0, 12);
    expectRel(atEta.F, 1 - Math.exp(-1), 1e-12); // F(eta) = 1 - 1/e, from the Weibull cdf
    const atB10 = a.fittedLine(1, a.b10.mle, 1)[1];
    expectRel(atB10.F, 0.1, 1e-12); // B10 is where F = 10%
    expect(() => a.fittedLine(0, 10)).toThrow();
  });

  it("passes input errors through", () => {
    expect(() => fitWeibull([{ time: 5, failed: true }])).toThrow(/at least two failures/i);
  });
});

describe("readShape", () => {
  it("uses the bounds when given, the value otherwise", () => {
    expect(readShape(1.4, [0.9, 2.1]).reading).toBe("random");
    expect(readShape(1.4, [1.1, 2.1]).reading).toBe("wear-out");
    expect(readShape(0.6, [0.4, 0.9]).reading).toBe("early-life");
    expect(readShape(0.6).reading).toBe("early-life");
    expect(readShape(1.02).reading).toBe("random");
    expect(readShape(3).reading).toBe("wear-out");
  });
});

describe("weibullBLife", () => {
  it("B10 = eta (-ln 0.9)^(1/beta)", () => {
    // Lieblein & Zelen (1956) data; MLE beta, eta and B10 computed with reference libraries
    expectRel(weibullBLife(lz.mle.beta, lz.mle.eta), lz.mle.B10, lz.mle.rel_tol);
  });
});
