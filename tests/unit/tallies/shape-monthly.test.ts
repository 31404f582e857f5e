import { describe, expect, it } from "vitest";
import { ALL_REMOVALS, ALL_SIGNED, monthlyTally, outOfControl } from "@/lib/tallies/shape-monthly";
import type { MonthCell } from "@/lib/tallies/types";
import { expectRel } from "../stats/check-values";

const cells: MonthCell[] = [
  ...["2025-01", "2025-02", "2025-03", "2025-05", "2025-06", "2025-07", "2025-08", "2025-09"].map((month) => ({
    month,
    signed: true,
    cause: "seal",
    count: 4,
  })),
  { month: "2025-10", signed: true, cause: "seal", count: 16 },
  { month: "2025-03", signed: false, cause: null, count: 5 },
  { month: "2025-06", signed: true, cause: "water-ingress", count: 2 },
];

describe("monthly counts with c-chart limits", () => {
  const t = monthlyTally(cells);

  it("runs the axis over every month from the first removal to the last, zero where nothing happened", () => {
    expect(t.months).toEqual([
      "2025-01",
      "2025-02",
      "2025-03",
      "2025-04",
      "2025-05",
      "2025-06",
      "2025-07",
      "2025-08",
      "2025-09",
      "2025-10",
    ]);
    const seal = t.series.find((s) => s.id === "seal")!;
    expect(seal.counts).toEqual([4, 4, 4, 0, 4, 4, 4, 4, 4, 16]);
  });

  it("sets limits at c-bar +/- 3 sqrt(c-bar), floored at zero (NIST/SEMATECH e-Handbook 6.3.3)", () => {
    const seal = t.series.find((s) => s.id === "seal")!;
    const cbar = 48 / 10; // arithmetic: (8 x 4 + 16) / 10 months
    expectRel(seal.centre, cbar, 1e-12);
    expectRel(seal.upperLimit, cbar + 3 * Math.sqrt(cbar), 1e-12);
    expect(seal.lowerLimit).toBe(0); // 4.8 - 3 x 2.19 < 0
    expect(seal.beyond[9]).toBe("above"); // 16 > 11.37
    expect(seal.beyond.filter(Boolean)).toHaveLength(1);
  });

  it("counts every stage in all removals but only signed verdicts in the cause series", () => {
    const all = t.series.find((s) => s.id === ALL_REMOVALS)!;
    const signed = t.series.find((s) => s.id === ALL_SIGNED)!;
    expect(all.counts[2]).toBe(9);
    expect(signed.counts[2]).toBe(4);
    expect(t.series.map((s) => s.id)).toEqual([ALL_REMOVALS, ALL_SIGNED, "seal", "water-ingress"]);
  });

  it("keeps the filter's period on the axis even where it is empty", () => {
    const bounded = monthlyTally(cells, "2024-11", "2025-02");
    expect(bounded.months).toEqual(["2024-11", "2024-12", "2025-01", "2025-02"]);
  });

  it("draws the month in progress but leaves it out of the limits (NIST/SEMATECH 6.3.3 formula on complete months)", () => {
    const live = monthlyTally(cells, undefined, undefined, "2025-10");
    const seal = live.series.find((s) => s.id === "seal")!;
    expect(live.partialMonth).toBe("2025-10");
    expect(seal.counts[9]).toBe(16);
    expectRel(seal.centre, 32 / 9, 1e-12); // nine complete months: 8 x 4 + one empty month
    expect(seal.beyond[9]).toBeNull();
    expect(monthlyTally(cells, undefined, undefined, "2030-01").partialMonth).toBeNull();
  });

  it("lists months beyond the limits, newest first", () => {
    const alarms = outOfControl(t);
    expect(alarms.every((a, i) => i === 0 || alarms[i - 1].month >= a.month)).toBe(true);
    expect(alarms.find((a) => a.series === "Seal")).toMatchObject({ month: "2025-10", count: 16, side: "above" });
  });
});
