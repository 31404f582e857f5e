import { describe, expect, it } from "vitest";
import { pareto } from "@/lib/stats/pareto";

describe("pareto", () => {
  it("sorts largest first with running shares (arithmetic)", () => {
    const rows = pareto([
      { label: "seal", count: 10 },
      { label: "water-ingress", count: 50 },
      { label: "no-defect", count: 40 },
      { label: "electrical", count: 0 },
    ]);
    expect(rows.map((r) => r.label)).toEqual(["water-ingress", "no-defect", "seal", "electrical"]);
    expect(rows.map((r) => r.share)).toEqual([0.5, 0.4, 0.1, 0]);
    expect(rows[0].cumulativeShare).toBe(0.5);
    expect(rows[1].cumulativeShare).toBeCloseTo(0.9, 15);
    expect(rows[2].cumulativeShare).toBeCloseTo(1, 15);
    expect(rows[3].cumulativeShare).toBe(1);
  });

  it("breaks ties by label and copes with an empty or all-zero list", () => {
    expect(
      pareto([
        { label: "b", count: 2 },
        { label: "a", count: 2 },
      ]).map((r) => r.label),
    ).toEqual(["a", "b"]);
    expect(pareto([])).toEqual([]);
    expect(pareto([{ label: "a", count: 0 }])).toEqual([{ label: "a", count: 0, share: 0, cumulativeShare: 0 }]);
    expect(() => pareto([{ label: "a", count: -1 }])).toThrow(RangeError);
  });
});
