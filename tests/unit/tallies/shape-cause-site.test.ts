import { describe, expect, it } from "vitest";
import { causeSiteTally, plainSummary, strengthWords } from "@/lib/tallies/shape-cause-site";
import type { VerdictCell } from "@/lib/tallies/types";
import { checkValues, expectRel } from "../stats/check-values";

const c = (siteId: string, cause: string, count: number): VerdictCell => ({
  siteId,
  trigger: "hand-roll",
  cause,
  outcome: "confirmed",
  count,
});
const label = (id: string) => ({ east: "East shop", west: "West shop" })[id] ?? id;

describe("cause x site test of independence", () => {
  it("builds the site x cause table and matches the reference 2x2 statistic (scipy chi2_contingency, fixture)", () => {
    const ref = checkValues.chi_square.table_2x2; // [[20, 15], [30, 35]]
    const t = causeSiteTally(
      [c("east", "seal", 20), c("east", "water-ingress", 15), c("west", "seal", 30), c("west", "water-ingress", 35)],
      label,
    );
    // sites ordered by total (west 65, east 35), causes by total (seal 50, water 50: by code)
    expect(t.sites.map((s) => s.label)).toEqual(["West shop", "East shop"]);
    expect(t.counts).toEqual([
      [30, 35],
      [20, 15],
    ]);
    expectRel(t.statistic!, ref.pearson.statistic, ref.rel_tol);
    expectRel(t.pValue!, ref.pearson.p_value, ref.rel_tol);
    expect(t.df).toBe(1);
    expect(t.notes).toEqual([]);
    // computed: scipy 1.17.1 chi2_contingency(lambda_='log-likelihood') and association(method='cramer') (fixture)
    expectRel(t.gStatistic!, ref.likelihood_ratio_G.statistic, ref.rel_tol);
    expectRel(t.gPValue!, ref.likelihood_ratio_G.p_value, ref.rel_tol);
    expectRel(t.cramersV!, ref.cramers_v.value, ref.rel_tol);
    expect(strengthWords(t.cramersV, t.strength)).toBe(
      "Site and cause go together weakly: Cramér's V = 0.10, on a scale from 0 (the site tells nothing about the cause) to 1 (the site decides the cause).",
    );
  });

  it("describes the cells that stand out in words", () => {
    const t = causeSiteTally(
      [c("east", "water-ingress", 40), c("east", "seal", 10), c("west", "water-ingress", 10), c("west", "seal", 40)],
      label,
    );
    // expected 25 per cell; adjusted residual (40-25)/sqrt(25 x 0.5 x 0.5) = 6 (Haberman 1973 formula, arithmetic)
    const east = t.sites.findIndex((x) => x.label === "East shop");
    const water = t.causes.findIndex((x) => x.code === "water-ingress");
    expectRel(t.residuals[east][water]!, 6, 1e-12);
    expectRel(t.residuals[east][1 - water]!, -6, 1e-12);
    expect(t.notes).toHaveLength(4);
    expect(t.notes.map((n) => n.sentence)).toContain("East shop has more water ingress removals than expected (40 seen, 25.0 expected)");
    expect(t.notes.map((n) => n.sentence)).toContain("East shop has fewer seal removals than expected (10 seen, 25.0 expected)");
    expect(t.summary).toMatch(/clearly differ/);
  });

  it("says plainly when there is nothing to compare", () => {
    const t = causeSiteTally([c("east", "seal", 3)], label);
    expect(t.statistic).toBeNull();
    expect(t.cramersV).toBeNull();
    expect(strengthWords(t.cramersV, t.strength)).toBeNull();
    expect(t.summary).toMatch(/Only one site/);
    expect(causeSiteTally([], label).summary).toBe("No signed verdicts to compare.");
    expect(plainSummary(0.2, 3)).toMatch(/look alike/);
    expect(plainSummary(0.01, 3)).toMatch(/more than chance/);
  });
});
