import { describe, expect, it } from "vitest";
import { COMPONENTS, DAMAGE_CODES, TRIGGERS } from "@/lib/classification";
import { similarity, type SimilarityCase, type SimilarityFinding } from "@/lib/similarity";

// Seeded generator (mulberry32) so every run checks the same random cases.
function generator(seed: number) {
  let s = seed >>> 0;
  const next = () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(next() * xs.length)];
  // A narrow pool so random cases often overlap.
  const components = COMPONENTS.slice(0, 4).map((c) => c.code);
  const codes = DAMAGE_CODES.slice(0, 8).map((d) => d.code);
  const vocabulary = ["milky", "grease", "spall", "cup", "seal", "rust", "dent", "cone", "the", "water"];
  const finding = (): SimilarityFinding => ({ component: pick(components), damageCode: pick(codes), severity: Math.floor(next() * 5) });
  const randomCase = (id: string): SimilarityCase => ({
    id,
    bearingClass: pick(["E", "F", "G", null]),
    trigger: pick([...TRIGGERS.slice(0, 3).map((t) => t.code), null]),
    primaryCause: pick(["water-ingress", "seal", null]),
    findings: Array.from({ length: Math.floor(next() * 4) }, finding),
    text: Array.from({ length: Math.floor(next() * 6) }, () => pick(vocabulary)).join(" "),
  });
  return { randomCase, finding };
}

describe("similarity properties", () => {
  const g = generator(20260101);
  const pairs = Array.from({ length: 300 }, (_, i) => [g.randomCase(`a${i}`), g.randomCase(`b${i}`)] as const);

  it("is symmetric", () => {
    for (const [a, b] of pairs) expect(similarity(a, b).score).toBeCloseTo(similarity(b, a).score, 12);
  });

  it("stays within 0..1", () => {
    for (const [a, b] of pairs) {
      const { score } = similarity(a, b);
      expect(score).toBeGreaterThanOrEqual(0);
      expect(score).toBeLessThanOrEqual(1);
    }
  });

  it("never drops when both cases gain the same finding", () => {
    let rose = 0;
    for (const [a, b] of pairs) {
      const shared = g.finding();
      const before = similarity(a, b).score;
      const after = similarity({ ...a, findings: [...a.findings, shared] }, { ...b, findings: [...b.findings, shared] }).score;
      expect(after).toBeGreaterThanOrEqual(before - 1e-12);
      if (after > before + 1e-12) rose++;
    }
    expect(rose).toBeGreaterThan(0); // the check is not vacuous: shared findings do raise scores
  });
});
