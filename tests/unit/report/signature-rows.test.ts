import { describe, expect, it } from "vitest";
import { contentHash, groupedHash } from "@/lib/cases/signature-content";
import { buildCaseReport } from "@/lib/report/build-report";
import type { ReportSource } from "@/lib/report/types";
import { demoReportSource } from "../../fixtures/report-demo-case";

const hashOf = (s: ReportSource) =>
  contentHash({
    caseNumber: s.case.number,
    verdict: {
      primaryCause: s.case.primaryCause,
      contributingCauses: s.case.contributingCauses,
      confidence: s.case.confidence,
      removalConfirmed: s.case.removalConfirmed,
      correctiveAction: s.case.correctiveAction,
      verdictNotes: s.case.verdictNotes,
    },
    findings: s.findings.map(({ component, row, zone, damageCode, severity, clockDeg, arcDeg, lengthMm, widthMm, notes }) => ({
      component,
      row,
      zone,
      damageCode,
      severity,
      clockDeg,
      arcDeg,
      lengthMm,
      widthMm,
      notes,
    })),
    photoHashes: s.photos.map((p) => p.sha256),
  });
const row = (s: ReportSource, label: string) => buildCaseReport(s).verdict.rows.find((r) => r[0] === label)?.[1];

describe("the signature on the report", () => {
  it("prints the meaning, the hash and a check that the case still matches", () => {
    const base = demoReportSource({ status: "signed", signedAt: new Date("2026-06-20T14:05:00Z"), signedMeaning: "I confirm." });
    const s = { ...base, case: { ...base.case, signedContentHash: hashOf(base) } };
    expect(row(s, "Signature means")).toBe("I confirm.");
    expect(row(s, "Signed content (SHA-256)")).toBe(groupedHash(hashOf(base)));
    expect(row(s, "Signature check")).toMatch(/^Matches/);
    const edited = { ...s, findings: s.findings.map((f, i) => (i === 0 ? { ...f, severity: (f.severity + 1) % 5 } : f)) };
    expect(row(edited, "Signature check")).toMatch(/^Does not match/);
  });

  it("prints no signature rows on a draft", () => {
    expect(row(demoReportSource({ status: "signoff" }), "Signature check")).toBeUndefined();
  });
});
