import { describe, expect, it } from "vitest";
import { binomialCdf, funnelCurve, funnelLimit, funnelLimits, funnelPosition } from "@/lib/stats/funnel";
import { twoSidedZ } from "@/lib/stats/distributions";
import { expectAbs } from "./check-values";

describe("funnel limits", () => {
  it("binomial cdf matches direct sums (arithmetic)", () => {
    // n = 10, p = 0.5: P(R <= 1) = 11/1024, P(R <= 2) = 56/1024, P(R <= 7) = 968/1024
    expectAbs(binomialCdf(1, 10, 0.5), 11 / 1024, 1e-12);
    expectAbs(binomialCdf(2, 10, 0.5), 56 / 1024, 1e-12);
    expectAbs(binomialCdf(7, 10, 0.5), 968 / 1024, 1e-12);
    // n = 5, p = 0.2: P(R <= 0) = 0.8^5
    expectAbs(binomialCdf(0, 5, 0.2), 0.8 ** 5, 1e-12);
  });

  it("interpolates between whole counts as Spiegelhalter (2005) appendix A.1.1 (arithmetic)", () => {
    // q = 0.025: r = 2, alpha = (56/1024 - 0.025)/(56/1024 - 11/1024) = 0.675556; limit (2 - alpha)/10
    expectAbs(funnelLimit(10, 0.5, 0.025), (2 - (56 / 1024 - 0.025) / (45 / 1024)) / 10, 1e-10);
    // q = 0.975: r = 8, alpha = (1013/1024 - 0.975)/(45/1024) = 0.324444; limit (8 - alpha)/10
    expectAbs(funnelLimit(10, 0.5, 0.975), (8 - (1013 / 1024 - 0.975) / (45 / 1024)) / 10, 1e-10);
  });

  it("approaches p0 ± z sqrt(p0 (1 - p0) / n) for many trials (normal approximation, common practice)", () => {
    const n = 20000;
    const p0 = 0.6;
    const half95 = twoSidedZ(0.95) * Math.sqrt((p0 * (1 - p0)) / n);
    const half998 = twoSidedZ(0.998) * Math.sqrt((p0 * (1 - p0)) / n);
    const l = funnelLimits(n, p0);
    expectAbs(l.lower95, p0 - half95, 2 / n);
    expectAbs(l.upper95, p0 + half95, 2 / n);
    expectAbs(l.lower998, p0 - half998, 3 / n);
    expectAbs(l.upper998, p0 + half998, 3 / n);
  });

  it("narrows as n grows and the 99.8% limits lie outside the 95% ones", () => {
    const curve = funnelCurve(5000, 0.55);
    for (const c of curve) {
      expect(c.lower998).toBeLessThanOrEqual(c.lower95);
      expect(c.upper998).toBeGreaterThanOrEqual(c.upper95);
    }
    const first = curve.find((c) => c.n >= 20)!;
    const last = curve.at(-1)!;
    expect(last.upper95 - last.lower95).toBeLessThan(first.upper95 - first.lower95);
  });

  it("places a unit against the limits", () => {
    expect(funnelPosition(10, 100, 0.6)).toBe("below-998"); // 10% against 60% over 100 alarms
    expect(funnelPosition(60, 100, 0.6)).toBe("inside");
    expect(funnelPosition(3, 5, 0.6)).toBe("inside"); // five alarms tell little
    // arithmetic: 3 of 3 at p0 = 0.67 has upper tail 0.67^3 = 0.30, well inside
    expect(funnelPosition(3, 3, 0.67)).toBe("inside");
    // arithmetic: 1 of 6 at p0 = 0.67: P(X <= 1) = 0.33^6 + 6 (0.67) 0.33^5 = 0.0171 < 0.025
    expect(funnelPosition(1, 6, 0.67)).toBe("below-95");
  });

  it("refuses impossible input", () => {
    expect(() => funnelLimit(0, 0.5, 0.025)).toThrow(RangeError);
    expect(() => funnelLimit(10, 1.5, 0.025)).toThrow(RangeError);
  });
});
