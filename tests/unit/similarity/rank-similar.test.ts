import { describe, expect, it } from "vitest";
import { rankSimilar, type SimilarityCase } from "@/lib/similarity";
import { casebook, unrelated, waterOnCone, waterTarget, waterTwin } from "@/tests/fixtures/similarity-casebook";

describe("rankSimilar", () => {
  it("puts the case with identical findings first and leaves out the target and zero scores", () => {
    const ranked = rankSimilar(waterTarget, casebook);
    const ids = ranked.map((r) => r.candidate.id);
    expect(ids[0]).toBe(waterTwin.id);
    expect(ids[1]).toBe(waterOnCone.id);
    expect(ids).not.toContain(waterTarget.id);
    expect(ids).not.toContain(unrelated.id); // scores 0: shares nothing
    for (let i = 1; i < ranked.length; i++) expect(ranked[i - 1].score).toBeGreaterThanOrEqual(ranked[i].score);
  });

  it("breaks ties by id and honours the limit", () => {
    const clone = (id: string): SimilarityCase => ({ ...waterTwin, id });
    const ranked = rankSimilar(waterTarget, [clone("TL-26-00030"), clone("TL-26-00020"), clone("TL-26-00025")], 2);
    expect(ranked.map((r) => r.candidate.id)).toEqual(["TL-26-00020", "TL-26-00025"]);
  });

  it("carries the reasons of each match", () => {
    const [first] = rankSimilar(waterTarget, casebook, 1);
    expect(first.reasons.map((r) => r.text)).toContain("Water etch on the cup in both");
  });

  it("returns nothing for an empty casebook or a zero limit", () => {
    expect(rankSimilar(waterTarget, [])).toEqual([]);
    expect(rankSimilar(waterTarget, casebook, 0)).toEqual([]);
  });
});
