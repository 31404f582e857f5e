import { describe, expect, it } from "vitest";
import { wilsonInterval } from "@/lib/stats";
import { niceBandWidth, wilsonBins } from "@/lib/tallies/yield-bins";

describe("Wilson bins", () => {
  it("sums the counts of each band and takes the Wilson interval of the sums (arithmetic)", () => {
    const bins = wilsonBins(
      [
        { x: 3, n: 4, y: 1 },
        { x: 9, n: 6, y: 3 },
        { x: 10, n: 5, y: 5 },
        { x: -2, n: 2, y: 0 },
      ],
      10,
    );
    expect(bins.map((b) => [b.from, b.to, b.n, b.confirmed])).toEqual([
      [-10, 0, 2, 0],
      [0, 10, 10, 4],
      [10, 20, 5, 5],
    ]);
    expect(bins[1].rate).toEqual(wilsonInterval(4, 10));
  });

  it("leaves out empty bands and refuses a zero width", () => {
    expect(wilsonBins([{ x: 1, n: 0, y: 0 }], 5)).toEqual([]);
    expect(() => wilsonBins([], 0)).toThrow(RangeError);
  });

  it("picks round band widths", () => {
    expect(niceBandWidth(0, 100)).toBe(20); // 100/8 = 12.5 -> 20
    expect(niceBandWidth(1, 40)).toBe(5); // 39/8 = 4.9 -> 5
    expect(niceBandWidth(0, 8)).toBe(1);
  });
});
