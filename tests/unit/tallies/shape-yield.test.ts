import { describe, expect, it } from "vitest";
import { fitLogistic, wilsonInterval } from "@/lib/stats";
import { callRows, detectorRows, readingFit, shapeYield, splitAt } from "@/lib/tallies/shape-yield";
import type { HotCell, YieldCounts } from "@/lib/tallies/yield-counts";

const cell = (key: string, n: number, confirmed: number, costUsd = 0, uncosted = 0) => ({
  key,
  n,
  confirmed,
  noDefect: n - confirmed,
  costUsd,
  uncosted,
});

// invented alarms: confirmation rises with the margin over the threshold
const hot: HotCell[] = [
  { margin: 2, reading: 172, n: 10, confirmed: 2 },
  { margin: 8, reading: 178, n: 10, confirmed: 4 },
  { margin: 15, reading: 185, n: 10, confirmed: 6 },
  { margin: 30, reading: 200, n: 10, confirmed: 8 },
  { margin: 60, reading: 230, n: 10, confirmed: 10 },
];

describe("removal yield shaping", () => {
  it("fits the same curve as the logistic fit on the grouped counts", () => {
    const f = readingFit(hot, "margin");
    const direct = fitLogistic(hot.map((c) => ({ x: c.margin, n: c.n, y: c.confirmed })))!;
    expect(f.fit!.slope).toBeCloseTo(direct.slope, 12);
    expect(f.fit!.at50!.x).toBeCloseTo(-direct.intercept / direct.slope, 1);
    expect(f.bins.reduce((s, b) => s + b.n, 0)).toBe(50);
    expect(f.fit!.curve[0].p).toBeLessThan(f.fit!.curve.at(-1)!.p);
  });

  it("splits at a reading and gives the shares above and below (arithmetic)", () => {
    const s = splitAt(
      hot.map((c) => ({ x: c.margin, n: c.n, y: c.confirmed })),
      15.2,
    )!;
    expect(s.at).toBe(15);
    expect(s.above).toMatchObject({ n: 20, p: 18 / 20 });
    expect(s.below).toMatchObject({ n: 30, p: 12 / 30 });
  });

  it("says why there is no curve", () => {
    expect(readingFit([], "margin").noFit).toMatch(/No hot-bearing alarms/);
    expect(readingFit([{ margin: 5, reading: 175, n: 4, confirmed: 4 }], "margin").noFit).toMatch(/same outcome/);
  });

  it("puts detectors against the fleet rate and flags the one rarely confirmed", () => {
    const d = detectorRows(
      [
        { ...cell("D-1", 40, 32), trigger: "wayside-hot", location: "MP 1", alarms: 44 },
        { ...cell("D-2", 40, 30), trigger: "wayside-hot", location: "MP 2", alarms: 41 },
        { ...cell("D-3", 40, 8), trigger: "wayside-hot", location: "MP 3", alarms: 40 },
      ],
      (c) => c,
    );
    expect(d.fleet).toMatchObject({ n: 120, confirmed: 70 });
    expect(d.rows[0].label).toBe("D-3");
    expect(d.rows[0].position).toBe("below-998");
    expect(d.rows.find((r) => r.label === "D-1")!.position).not.toMatch(/below/);
    expect(d.funnel.length).toBeGreaterThan(5);
    const both = detectorRows(
      [
        { ...cell("D-9", 4, 2), trigger: "wayside-hot", location: null, alarms: 4 },
        { ...cell("D-9", 2, 1), trigger: "wayside-acoustic", location: null, alarms: 2 },
      ],
      (c) => c,
    );
    expect(both.rows.map((r) => r.label).sort()).toEqual(["D-9 · acoustic", "D-9 · hot-bearing"]);
  });

  it("joins remove calls with keep calls per group", () => {
    const rows = callRows(
      [cell("s1", 12, 9)],
      [
        { key: "s1", keeps: 5, missed: 2 },
        { key: "s2", keeps: 3, missed: 0 },
      ],
      (id) => id.toUpperCase(),
    );
    expect(rows.map((r) => [r.label, r.n, r.keeps, r.missed])).toEqual([
      ["S1", 12, 5, 2],
      ["S2", 0, 3, 0],
    ]);
    expect(rows[0].rate).toEqual(wilsonInterval(9, 12));
  });

  it("sums the money on no-defect removals and writes the summary and cautions", () => {
    const counts: YieldCounts = {
      hot,
      hotWithoutReading: 2,
      acoustic: [cell("level 2", 6, 3)],
      detectors: [],
      triggers: [cell("wayside-hot", 50, 30, 40000, 10), cell("hand-roll", 20, 15, 10000, 0)],
      callsByShop: [cell("s1", 12, 9)],
      callsByInspector: [],
      callsByQuarter: [],
      keepsByShop: [],
      keepsByInspector: [],
    };
    const y = shapeYield(counts, { site: (id) => id, person: (id) => id, trigger: (c) => c });
    expect(y.cost.totalUsd).toBe(50000);
    expect(y.cost.noDefect).toBe(25);
    expect(y.cost.uncosted).toBe(10);
    expect(y.summary[0]).toMatch(/more than \d+ °F over the owner's threshold were confirmed at teardown \d+% of the time/);
    expect(y.cautions.join(" ")).toMatch(/2 hot-bearing alarms have no reading/);
  });
});
