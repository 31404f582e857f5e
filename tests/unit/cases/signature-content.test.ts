import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalContent, contentHash, groupedHash, type SignedContent } from "@/lib/cases/signature-content";

const finding = {
  component: "cup",
  row: "outboard",
  zone: "raceway",
  damageCode: "fatigue.subsurface",
  severity: 4,
  clockDeg: 180,
  arcDeg: 40,
  lengthMm: 22,
  widthMm: 9,
  notes: "Load zone.",
};
const content: SignedContent = {
  caseNumber: "TL-2026-00042",
  verdict: {
    primaryCause: "fatigue",
    contributingCauses: ["lubrication", "overload"],
    confidence: "confirmed",
    removalConfirmed: "confirmed",
    correctiveAction: "",
    verdictNotes: "Spall in the load zone.",
  },
  findings: [finding, { ...finding, component: "cone-inboard", row: null, damageCode: "none", severity: 0, notes: "" }],
  photoHashes: ["b".repeat(64), "a".repeat(64)],
};

describe("what a signature covers", () => {
  it("is the SHA-256 of the canonical content", () => {
    // SHA-256 of the same string through node's own hash (FIPS 180-4; reference implementation)
    expect(contentHash(content)).toBe(createHash("sha256").update(canonicalContent(content)).digest("hex"));
    expect(contentHash(content)).toMatch(/^[0-9a-f]{64}$/);
  });

  it("does not depend on the order findings, photos or causes were read in", () => {
    const shuffled = {
      ...content,
      findings: [...content.findings].reverse(),
      photoHashes: [...content.photoHashes].reverse(),
      verdict: { ...content.verdict, contributingCauses: ["overload", "lubrication"] },
    };
    expect(contentHash(shuffled)).toBe(contentHash(content));
  });

  it("changes with any signed detail: a finding's size, a photo, the verdict", () => {
    const base = contentHash(content);
    expect(contentHash({ ...content, findings: [{ ...finding, lengthMm: 23 }, content.findings[1]] })).not.toBe(base);
    expect(contentHash({ ...content, photoHashes: ["c".repeat(64), "a".repeat(64)] })).not.toBe(base);
    expect(contentHash({ ...content, verdict: { ...content.verdict, confidence: "probable" } })).not.toBe(base);
  });

  it("prints in groups of eight (arithmetic: 64 hex digits, 8 groups)", () => {
    expect(groupedHash("0123456789abcdef".repeat(4)).split(" ")).toHaveLength(8);
  });
});
