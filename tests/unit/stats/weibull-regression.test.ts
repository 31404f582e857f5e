import { describe, expect, it } from "vitest";
import { johnsonPlotPointsCounted } from "@/lib/stats/weibull-ranks";
import { rankRegressionAndPlot, rankRegressionOf, weibullRankRegression } from "@/lib/stats/weibull-regression";
import { checkValues, expectRel, unitsOf } from "./check-values";

const { lieblein_zelen_complete: lz, nist_8_4_1_3: nist, kececioglu_mean_order_number: kec } = checkValues.weibull;

function checkBothWays(
  got: ReturnType<typeof weibullRankRegression>,
  want: { YonX: { beta: number; eta: number; B10: number }; XonY: { beta: number; eta: number; B10: number } },
  relTol: number,
) {
  expectRel(got.yOnX.beta, want.YonX.beta, relTol);
  expectRel(got.yOnX.eta, want.YonX.eta, relTol);
  expectRel(got.yOnX.b10, want.YonX.B10, relTol);
  expectRel(got.xOnY.beta, want.XonY.beta, relTol);
  expectRel(got.xOnY.eta, want.XonY.eta, relTol);
  expectRel(got.xOnY.b10, want.XonY.B10, relTol);
}

describe("median-rank regression", () => {
  it("Lieblein & Zelen complete data, Y on X and X on Y", () => {
    const got = weibullRankRegression(unitsOf(lz));
    // Lieblein & Zelen (1956) J. Res. NBS 57(5):273-316 data; values computed with reference libraries, cross-checked
    checkBothWays(got, lz.mrr_benard, lz.mrr_benard.rel_tol);
    expectRel(got.yOnX.r2, lz.mrr_benard.r2, lz.mrr_benard.rel_tol); // same source
  });

  it("NIST e-Handbook 8.4.1.3 data with suspensions (Johnson ranks)", () => {
    const got = weibullRankRegression(unitsOf(nist));
    // NIST/SEMATECH e-Handbook 8.4.1.3 data; values computed with reference libraries, cross-checked
    checkBothWays(got, nist.mrr_benard_johnson, nist.mrr_benard_johnson.rel_tol);
    expectRel(got.xOnY.r2, nist.mrr_benard_johnson.r2, nist.mrr_benard_johnson.rel_tol); // same source
  });

  it("Kececioglu suspended example", () => {
    const got = weibullRankRegression(unitsOf(kec));
    // Kececioglu, Reliability & Life Testing Handbook Vol. 2 (1994), Table 3.1 data; values computed
    checkBothWays(got, kec, kec.rel_tol);
  });
});

describe("rank regression and thinned plot in one pass", () => {
  // Invented counted lives: 40 distinct times, failures and suspensions interleaved (arithmetic check).
  const groups = Array.from({ length: 40 }, (_, i) => ({ time: 5 + i * 1.5, failed: i % 3 !== 1, count: 1 + (i % 4) }));
  const every = johnsonPlotPointsCounted(groups);

  it("gives the regression of every ranked failure", () => {
    const { regression, failures } = rankRegressionAndPlot(groups, 10);
    expect(failures).toBe(every.length);
    expect(regression).toEqual(rankRegressionOf(every));
  });

  it("keeps evenly spaced failures, the first and last among them, or all when few", () => {
    const { points } = rankRegressionAndPlot(groups, 10);
    expect(points).toHaveLength(10);
    expect(points[0]).toEqual(every[0]);
    expect(points[9]).toEqual(every[every.length - 1]);
    points.forEach((p, j) => expect(p).toEqual(every[Math.round((j * (every.length - 1)) / 9)]));
    expect(rankRegressionAndPlot(groups, 1000).points).toEqual(every);
  });
});
