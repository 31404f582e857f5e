import { describe, it } from "vitest";
import { weibullRankRegression } from "@/lib/stats/weibull-regression";
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
