import { describe, expect, it } from "vitest";
import { chiSquareTest } from "@/lib/stats/chi-square";
import { describeResiduals } from "@/lib/stats/chi-square-describe";
import { chiSquareQuantile } from "@/lib/stats/distributions";
import { checkValues, expectAbs, expectRel } from "./check-values";

const crit = checkValues.chi_square["critical_0.05"];
const t22 = checkValues.chi_square.table_2x2;

describe("chi-square distribution", () => {
  it("upper 5% critical values for df 1..6", () => {
    crit.df.forEach((df: number, i: number) => {
      const got = chiSquareQuantile(0.95, df);
      // NIST/SEMATECH e-Handbook 1.3.6.7.4 table (3 dp, from memory; same 5-dp values in a published exam table)
      expectAbs(got, crit.nist_table_3dp[i], crit.abs_tol_vs_table);
      // scipy chi2.ppf(0.95, df), printed to 10 significant digits
      expectRel(got, crit["scipy_chi2_ppf_0.95"][i], 1e-9);
    });
  });
});

describe("Pearson chi-square test of independence", () => {
  it("2x2 example: statistic, p-value and degrees of freedom", () => {
    const r = chiSquareTest(t22.observed);
    // 2x2 example computed with reference libraries (no correction), cross-checked
    expectRel(r.statistic ?? Number.NaN, t22.pearson.statistic, t22.rel_tol);
    expectRel(r.pValue ?? Number.NaN, t22.pearson.p_value, t22.rel_tol);
    expect(r.df).toBe(t22.dof);
    expect(r.yatesApplied).toBe(false);
    // expected = row total x column total / N (arithmetic): 35*50/100, 65*50/100
    expect(r.expected).toEqual([
      [17.5, 17.5],
      [32.5, 32.5],
    ]);
    expect(r.warnings).toEqual([]);
  });

  it("2x2 example with Yates' correction", () => {
    const r = chiSquareTest(t22.observed, { yatesCorrection: true });
    // 2x2 example computed with reference libraries (Yates-corrected), cross-checked
    expectRel(r.statistic ?? Number.NaN, t22.yates.statistic, t22.rel_tol);
    expectRel(r.pValue ?? Number.NaN, t22.yates.p_value, t22.rel_tol);
    expect(r.yatesApplied).toBe(true);
  });

  it("2x2 adjusted residuals all have size sqrt(X^2)", () => {
    const r = chiSquareTest(t22.observed);
    // from memory (Agresti, Categorical Data Analysis): in a 2x2 table each adjusted residual squared is X^2
    const size = Math.sqrt(t22.pearson.statistic);
    expectRel(r.adjustedResiduals[0][0], size, 1e-8);
    expectRel(r.adjustedResiduals[0][1], -size, 1e-8);
    expectRel(r.adjustedResiduals[1][0], -size, 1e-8);
    expectRel(r.adjustedResiduals[1][1], size, 1e-8);
  });

  it("drops all-zero rows and columns before testing", () => {
    const [[a, b], [c, d]] = t22.observed;
    const r = chiSquareTest([
      [a, 0, b],
      [0, 0, 0],
      [c, 0, d],
    ]);
    expect(r.rowIndices).toEqual([0, 2]);
    expect(r.colIndices).toEqual([0, 2]);
    expect(r.df).toBe(1);
    // same 2x2 example, computed with reference libraries
    expectRel(r.statistic ?? Number.NaN, t22.pearson.statistic, t22.rel_tol);
  });

  it("warns when more than 20% of expected counts are below 5 (Cochran's rule)", () => {
    expect(
      chiSquareTest([
        [1, 2],
        [3, 4],
      ]).warnings.join(" "),
    ).toMatch(/Cochran/);
    // one cell of four (25%) below 5: row 1 total 8, column 2 total 12, N = 100 -> 0.96 expected
    const oneLow = chiSquareTest([
      [7, 1],
      [81, 11],
    ]);
    expect(oneLow.lowExpectedShare).toBe(0.25);
    expect(oneLow.warnings).toHaveLength(1);
  });

  it("reports an untestable table instead of a number", () => {
    const r = chiSquareTest([
      [3, 4],
      [0, 0],
    ]);
    expect(r.statistic).toBeNull();
    expect(r.pValue).toBeNull();
    expect(r.df).toBe(0);
    expect(r.warnings[0]).toMatch(/at least two non-empty rows/);
    expect(() => chiSquareTest([[1, 2], [3]])).toThrow(RangeError);
    expect(() =>
      chiSquareTest([
        [1, -2],
        [3, 4],
      ]),
    ).toThrow(RangeError);
  });
});

describe("describeResiduals", () => {
  const shops = ["Shop A", "Shop B", "Empty shop", "Shop C"];
  const causes = ["water-ingress", "seal", "end-of-life"];
  const table = [
    [12, 3, 5],
    [2, 10, 8],
    [0, 0, 0],
    [3, 4, 13],
  ];

  it("names the cells that stand out, strongest first", () => {
    const r = chiSquareTest(table);
    const sentences = describeResiduals(r, shops, causes);
    expect(sentences.length).toBeGreaterThan(0);
    // expected for Shop A x water-ingress = 20 x 17 / 60 = 5.67 (arithmetic)
    expect(sentences.map((s) => s.sentence)).toContain("Shop A has more water-ingress removals than expected (12 seen, 5.7 expected)");
    for (const s of sentences) expect(Math.abs(s.adjustedResidual)).toBeGreaterThan(2);
    const sizes = sentences.map((s) => Math.abs(s.adjustedResidual));
    expect(sizes).toEqual([...sizes].sort((x, y) => y - x));
    expect(sentences.some((s) => s.row === "Empty shop")).toBe(false);
    expect(sentences.some((s) => s.sentence.includes("fewer"))).toBe(true);
  });

  it("says nothing when no cell passes the threshold", () => {
    const r = chiSquareTest(t22.observed);
    expect(describeResiduals(r, ["X", "Y"], ["p", "q"])).toEqual([]);
    expect(describeResiduals(r, ["X", "Y"], ["p", "q"], { threshold: 1, itemNoun: "cases" })[0].sentence).toMatch(/ cases than expected/);
  });
});
