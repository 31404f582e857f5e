import { describe, expect, it } from "vitest";
import { wilsonInterval } from "@/lib/stats/wilson";
import { twoSidedZ } from "@/lib/stats/distributions";
import { checkValues, expectAbs, expectRel } from "./check-values";

const w = checkValues.wilson_95;

interface WilsonCase {
  x: number;
  n: number;
  p: number;
  lower: number;
  upper: number;
  published_newcombe1998_tableI_method3?: { lower: number; upper: number; abs_tol: number };
}
const cases: WilsonCase[] = w.cases;

describe("Wilson score interval", () => {
  it("z for 95% is the reference value", () => {
    expectRel(twoSidedZ(0.95), w.z, 1e-9); // z = 1.959963985 as given with the Wilson reference values
  });

  it.each(cases)("x = $x, n = $n matches the computed reference", (c) => {
    const got = wilsonInterval(c.x, c.n);
    // computed with statsmodels proportion_confint(method='wilson') and a closed form; R prop.test for 81/263
    expectRel(got.p ?? Number.NaN, c.p, w.rel_tol);
    expectRel(got.lower, c.lower, w.rel_tol);
    expectRel(got.upper, c.upper, w.rel_tol);
  });

  it("matches Newcombe (1998) Table I, method 3, to the printed digits", () => {
    const published = cases.filter((c) => c.published_newcombe1998_tableI_method3);
    expect(published.length).toBe(4);
    for (const c of published) {
      const pub = c.published_newcombe1998_tableI_method3!;
      const got = wilsonInterval(c.x, c.n);
      // Newcombe 1998, Statistics in Medicine 17:857-872, Table I, method 3 (Wilson score)
      expectAbs(got.lower, pub.lower, pub.abs_tol);
      expectAbs(got.upper, pub.upper, pub.abs_tol);
    }
  });

  it("gives exactly 0 and 1 at the extremes and [0, 1] with no data", () => {
    expect(wilsonInterval(0, 20).lower).toBe(0);
    expect(wilsonInterval(20, 20).upper).toBe(1);
    expect(wilsonInterval(0, 0)).toEqual({ p: null, lower: 0, upper: 1, confidence: 0.95 });
  });

  it("refuses impossible counts", () => {
    expect(() => wilsonInterval(5, 3)).toThrow(RangeError);
    expect(() => wilsonInterval(-1, 3)).toThrow(RangeError);
    expect(() => wilsonInterval(1.5, 3)).toThrow(RangeError);
  });
});
