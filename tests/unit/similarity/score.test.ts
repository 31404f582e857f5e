import { describe, expect, it } from "vitest";
import { SIMILARITY_WEIGHTS, similarity, type SimilarityCase } from "@/lib/similarity";
import { frostedCup, spallCase, unrelated, waterOnCone, waterTarget, waterTwin } from "@/tests/fixtures/similarity-casebook";

const texts = (a: SimilarityCase, b: SimilarityCase) => similarity(a, b).reasons.map((r) => r.text);

describe("similarity score", () => {
  it("has weights that sum to 1, so a full match scores 1", () => {
    const sum = Object.values(SIMILARITY_WEIGHTS).reduce((s, w) => s + w, 0);
    expect(sum).toBeCloseTo(1, 12); // arithmetic: the parts are shares of one
    expect(similarity(waterTarget, { ...waterTarget, id: "copy" }).score).toBeCloseTo(1, 12);
  });

  it("scores the known neighbour above water damage elsewhere, and that above an unrelated case", () => {
    const twin = similarity(waterTarget, waterTwin).score;
    const cone = similarity(waterTarget, waterOnCone).score;
    const other = similarity(waterTarget, unrelated).score;
    expect(twin).toBeGreaterThan(cone);
    expect(cone).toBeGreaterThan(other);
    expect(other).toBe(0); // nothing in common by construction
  });

  it("explains a match by the shared code and part", () => {
    const reasons = texts(waterTarget, waterTwin);
    expect(reasons).toContain("Water etch on the cup in both");
    expect(reasons).toContain("Grease with water in both");
    expect(reasons).toContain("Seal damaged or displaced on the inboard seal in both");
    expect(reasons).toContain("Same bearing class (F)");
    expect(reasons).toContain("Same trigger: wayside hot-bearing alarm");
    expect(reasons).toContain("Same root cause: water ingress");
    const words = reasons.find((r) => r.startsWith("Words in common:"));
    expect(words).toMatch(/milky/);
    expect(words).toMatch(/seal/);
    expect(words).toMatch(/water/);
  });

  it("names the same code on different parts, and related damage on the same part", () => {
    expect(texts(waterTarget, waterOnCone)).toContain("Water etch in both, on different parts (the cup / the outboard cone)");
    expect(texts(spallCase, frostedCup)).toContain("Fatigue on the cup in both (Subsurface spall / Surface distress)");
  });

  it("adds its reasons up to the score", () => {
    for (const other of [waterTwin, waterOnCone, spallCase]) {
      const { score, reasons } = similarity(waterTarget, other);
      expect(reasons.reduce((s, r) => s + r.weight, 0)).toBeCloseTo(score, 12);
      for (const r of reasons) expect(r.weight).toBeGreaterThan(0);
    }
  });

  it("counts a shared condemning finding more than a shared cosmetic one", () => {
    // severity weighting: a shared severity-4 spall says more than shared cosmetic marks (common practice)
    const withSeverity = (severity: number): SimilarityCase => ({
      id: `s${severity}`,
      bearingClass: null,
      trigger: null,
      text: "",
      findings: [
        { component: "cup", damageCode: "fatigue.subsurface", severity },
        { component: "spacer", damageCode: "wear.abrasive", severity: 2 },
      ],
    });
    const onlyShared = (severity: number): SimilarityCase => ({
      id: `o${severity}`,
      bearingClass: null,
      trigger: null,
      text: "",
      findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity }],
    });
    expect(similarity(withSeverity(4), onlyShared(4)).score).toBeGreaterThan(similarity(withSeverity(1), onlyShared(1)).score);
  });

  it("ignores no-damage findings and two undetermined verdicts", () => {
    const blank = (id: string, cause: string): SimilarityCase => ({
      id,
      bearingClass: null,
      trigger: null,
      primaryCause: cause,
      text: "",
      findings: [{ component: "cup", damageCode: "none", severity: 0 }],
    });
    expect(similarity(blank("a", "undetermined"), blank("b", "undetermined")).score).toBe(0);
    expect(texts(blank("a", "no-defect"), blank("b", "no-defect"))).toEqual(["Same root cause: no defect found"]);
  });

  it("gives no credit for a cause only one case has", () => {
    const noCause = { ...waterTwin, primaryCause: null };
    expect(texts(waterTarget, noCause).some((t) => t.startsWith("Same root cause"))).toBe(false);
  });
});
