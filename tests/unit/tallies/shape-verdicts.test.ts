import { describe, expect, it } from "vitest";
import { causePareto, triggerVerdictRows, verdictTotals } from "@/lib/tallies/shape-verdicts";
import type { VerdictCell } from "@/lib/tallies/types";
import { checkValues, expectAbs, expectRel } from "../stats/check-values";

const cell = (siteId: string, trigger: string, cause: string | null, outcome: VerdictCell["outcome"], count: number): VerdictCell => ({
  siteId,
  trigger,
  cause,
  outcome,
  count,
});

// Newcombe (1998) Table I, 81 of 263: Wilson 0.2553 to 0.3662 (stored with its source in the fixture).
const wilson81 = checkValues.wilson_95.cases[0];

const cube: VerdictCell[] = [
  cell("A", "wayside-hot", "water-ingress", "confirmed", 50),
  cell("B", "wayside-hot", "seal", "confirmed", 31),
  cell("A", "wayside-hot", "no-defect", "no-defect", 100),
  cell("B", "wayside-hot", "no-defect", "no-defect", 82),
  cell("A", "wayside-hot", "undetermined", null, 7),
  cell("A", "hand-roll", "water-ingress", "confirmed", 12),
  cell("B", "hand-roll", "end-of-life", "confirmed", 4),
];

describe("sums over the signed-verdict cube", () => {
  it("totals every signed verdict and splits them by teardown outcome", () => {
    // 50+31+100+82+7+12+4 = 286 verdicts; confirmed 50+31+12+4 = 97; no defect 182; 7 without outcome (arithmetic)
    expect(verdictTotals(cube, 400)).toEqual({ removals: 400, signed: 286, confirmed: 97, noDefect: 182, outcomeNotRecorded: 7 });
  });

  it("orders causes largest first with running shares ending at 100% (Pareto, common practice)", () => {
    const bars = causePareto(cube);
    expect(bars.map((b) => [b.code, b.count])).toEqual([
      ["no-defect", 182],
      ["water-ingress", 62],
      ["seal", 31],
      ["undetermined", 7],
      ["end-of-life", 4],
    ]);
    expectRel(bars[0].share, 182 / 286, 1e-12);
    expectRel(bars[1].cumulativeShare, (182 + 62) / 286, 1e-12);
    expect(bars[bars.length - 1].cumulativeShare).toBe(1);
    expect(bars[1].label).toBe("Water ingress");
  });

  it("counts each trigger's confirmed and no-defect teardowns and leaves unrecorded ones out of the rate", () => {
    const rows = triggerVerdictRows(cube);
    const hot = rows.find((r) => r.trigger === "wayside-hot")!;
    expect([hot.confirmed, hot.noDefect, hot.notRecorded, hot.total]).toEqual([81, 182, 7, 270]);
    // 81 confirmed of 263 with an outcome: Wilson 95% interval from Newcombe (1998) Table I
    expectAbs(hot.rate.lower, wilson81.published_newcombe1998_tableI_method3.lower, 5e-5);
    expectAbs(hot.rate.upper, wilson81.published_newcombe1998_tableI_method3.upper, 5e-5);
    expect(rows[0].trigger).toBe("wayside-hot");
    expect(rows[1]).toMatchObject({ trigger: "hand-roll", confirmed: 16, noDefect: 0, total: 16, label: "Rough on hand roll" });
  });
});
