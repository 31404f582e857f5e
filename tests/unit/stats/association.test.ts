import { describe, expect, it } from "vitest";
import { association, strengthOf } from "@/lib/stats/association";
import { chiSquareTest } from "@/lib/stats/chi-square";
import { checkValues, expectRel } from "./check-values";

const t22 = checkValues.chi_square.table_2x2;
const t34 = checkValues.chi_square.table_3x4;

describe("strength of association", () => {
  it("2x2 example: G statistic and Cramér's V", () => {
    const a = association(chiSquareTest(t22.observed));
    // computed: scipy 1.17.1 chi2_contingency(lambda_='log-likelihood', correction=False) (fixture)
    expectRel(a.gStatistic!, t22.likelihood_ratio_G.statistic, t22.rel_tol);
    expectRel(a.gPValue!, t22.likelihood_ratio_G.p_value, t22.rel_tol);
    // computed: scipy 1.17.1 contingency.association(method='cramer') (fixture)
    expectRel(a.cramersV!, t22.cramers_v.value, t22.rel_tol);
    expect(a.strength).toBe("weak");
  });

  it("3x4 table: G statistic and Cramér's V on six degrees of freedom", () => {
    const test = chiSquareTest(t34.observed);
    expectRel(test.statistic!, t34.pearson.statistic, t34.rel_tol);
    const a = association(test);
    // computed: scipy 1.17.1 (fixture, table_3x4.how)
    expectRel(a.gStatistic!, t34.likelihood_ratio_G.statistic, t34.rel_tol);
    expectRel(a.gPValue!, t34.likelihood_ratio_G.p_value, 1e-7);
    expectRel(a.cramersV!, t34.cramers_v.value, t34.rel_tol);
    expect(a.strength).toBe("moderate");
  });

  it("V is the same with Yates' correction asked for (it is defined on the uncorrected statistic)", () => {
    const a = association(chiSquareTest(t22.observed, { yatesCorrection: true }));
    expectRel(a.cramersV!, t22.cramers_v.value, t22.rel_tol);
  });

  it("a table with complete dependence has V = 1; an untestable one has no figures", () => {
    // arithmetic: each row holds one column only
    expectRel(
      association(
        chiSquareTest([
          [9, 0],
          [0, 4],
        ]),
      ).cramersV!,
      1,
      1e-12,
    );
    expect(
      association(
        chiSquareTest([
          [3, 4],
          [0, 0],
        ]),
      ),
    ).toEqual({ gStatistic: null, gPValue: null, cramersV: null, strength: null });
  });

  it("names the bands (common practice)", () => {
    expect([0.05, 0.2, 0.4, 0.7].map(strengthOf)).toEqual(["negligible", "weak", "moderate", "strong"]);
  });
});
