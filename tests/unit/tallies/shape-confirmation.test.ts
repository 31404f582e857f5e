import { describe, expect, it } from "vitest";
import { confirmationTable } from "@/lib/tallies/shape-confirmation";
import type { VerdictCell } from "@/lib/tallies/types";
import { checkValues, expectAbs } from "../stats/check-values";

// Newcombe (1998) Table I, 15 of 148: Wilson 0.0624 to 0.1605 (fixture, with its source).
const wilson15 = checkValues.wilson_95.cases[1];

const cells: VerdictCell[] = [
  { siteId: "weak", trigger: "hand-roll", cause: "seal", outcome: "confirmed", count: 15 },
  { siteId: "weak", trigger: "hand-roll", cause: "no-defect", outcome: "no-defect", count: 133 },
  { siteId: "strong", trigger: "hand-roll", cause: "seal", outcome: "confirmed", count: 900 },
  { siteId: "strong", trigger: "hand-roll", cause: "no-defect", outcome: "no-defect", count: 100 },
  { siteId: "middle", trigger: "hand-roll", cause: "seal", outcome: "confirmed", count: 8 },
  { siteId: "middle", trigger: "hand-roll", cause: "no-defect", outcome: "no-defect", count: 2 },
  { siteId: "middle", trigger: "hand-roll", cause: "undetermined", outcome: null, count: 40 },
];
const names: Record<string, string> = { weak: "Weak shop", strong: "Strong shop", middle: "Middle shop" };

describe("confirmation rate per shop", () => {
  const t = confirmationTable(
    cells,
    (c) => c.siteId,
    (id) => names[id],
  );

  it("puts the shop whose calls are least often confirmed first", () => {
    expect(t.rows.map((r) => r.id)).toEqual(["weak", "middle", "strong"]);
  });

  it("gives each shop its Wilson 95% interval (Newcombe 1998 Table I for 15/148)", () => {
    const weak = t.rows[0];
    expect([weak.confirmed, weak.n]).toEqual([15, 148]);
    expectAbs(weak.rate.lower, wilson15.published_newcombe1998_tableI_method3.lower, 5e-5);
    expectAbs(weak.rate.upper, wilson15.published_newcombe1998_tableI_method3.upper, 5e-5);
  });

  it("flags a shop only when its whole interval lies on one side of the overall rate", () => {
    // overall 923 of 1158 = 0.797 (arithmetic); weak's upper 0.1605 is below it, strong's lower (about 0.88) above it
    expect(t.overall.confirmed).toBe(923);
    expect(t.overall.n).toBe(1158);
    expect(t.rows.map((r) => r.standsOut)).toEqual(["below", null, "above"]);
  });

  it("leaves verdicts without a recorded outcome out of both counts", () => {
    expect(t.rows.find((r) => r.id === "middle")).toMatchObject({ confirmed: 8, n: 10 });
  });
});
