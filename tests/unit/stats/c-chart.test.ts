import { describe, expect, it } from "vitest";
import { cChart, cChartOfCounts } from "@/lib/stats/c-chart";

// Limits c-bar +/- 3 sqrt(c-bar), lower limit floored at 0: NIST/SEMATECH e-Handbook 6.3.3.
// Expected numbers below are arithmetic on that formula with counts chosen to give round means.
describe("c-chart", () => {
  it("mean 16: centre 16, limits 16 +/- 12", () => {
    const chart = cChartOfCounts([10, 14, 16, 18, 22, 16, 30, 2]);
    expect(chart.centre).toBe(16); // (10+14+16+18+22+16+30+2)/8 = 128/8
    expect(chart.upperLimit).toBe(28); // 16 + 3*4
    expect(chart.lowerLimit).toBe(4); // 16 - 3*4
    expect(chart.points.map((p) => p.beyond)).toEqual([null, null, null, null, null, null, "above", "below"]);
  });

  it("mean 4: lower limit 4 - 6 is floored at 0", () => {
    const chart = cChartOfCounts([0, 4, 8, 4, 4, 11, 1, 0]);
    expect(chart.centre).toBe(4); // 32/8
    expect(chart.upperLimit).toBe(10); // 4 + 3*2
    expect(chart.lowerLimit).toBe(0); // max(0, 4 - 6)
    expect(chart.points.filter((p) => p.beyond).map((p) => p.item.index)).toEqual([5]);
  });

  it("a point exactly on the limit is inside", () => {
    const chart = cChartOfCounts([9, 9, 9, 9, 0, 18]); // mean 54/6 = 9, limits 0 and 18
    expect(chart.upperLimit).toBe(18);
    expect(chart.points.every((p) => p.beyond === null)).toBe(true);
  });

  it("keeps the caller's items and handles no data", () => {
    const chart = cChart([
      { month: "2025-01", count: 3 },
      { month: "2025-02", count: 5 },
    ]);
    expect(chart.points[1].item.month).toBe("2025-02");
    expect(chart.centre).toBe(4);
    expect(cChart([])).toEqual({ centre: 0, upperLimit: 0, lowerLimit: 0, points: [] });
    expect(() => cChartOfCounts([1, -1])).toThrow(RangeError);
  });
});
