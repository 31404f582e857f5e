// Exactly what an engineer's signature covers, written out in a fixed order so the same case
// always gives the same SHA-256: the verdict, every finding, and the hash of every photo.
// Any later change to these (a finding edited in the database, a photo swapped) changes the hash.
import { createHash } from "node:crypto";

export const SIGNATURE_MEANING =
  "I have reviewed the findings and photos listed here, and I confirm this root-cause verdict as my engineering judgement of why this bearing was removed.";

export type SignedFinding = {
  component: string;
  row: string | null;
  zone: string | null;
  damageCode: string;
  severity: number;
  clockDeg: number | null;
  arcDeg: number | null;
  lengthMm: number | null;
  widthMm: number | null;
  notes: string;
};

export type SignedContent = {
  caseNumber: string;
  verdict: {
    primaryCause: string | null;
    contributingCauses: readonly string[];
    confidence: string | null;
    removalConfirmed: string | null;
    correctiveAction: string;
    verdictNotes: string;
  };
  findings: readonly SignedFinding[];
  /** SHA-256 of each photo's original file. */
  photoHashes: readonly string[];
};

const findingKey = (f: SignedFinding) =>
  JSON.stringify([f.component, f.row, f.zone, f.damageCode, f.severity, f.clockDeg, f.arcDeg, f.lengthMm, f.widthMm, f.notes]);

/** The signed content as one canonical string: keys in a fixed order, lists sorted. */
export function canonicalContent(c: SignedContent): string {
  const v = c.verdict;
  return JSON.stringify({
    caseNumber: c.caseNumber,
    verdict: {
      primaryCause: v.primaryCause,
      contributingCauses: [...v.contributingCauses].sort(),
      confidence: v.confidence,
      removalConfirmed: v.removalConfirmed,
      correctiveAction: v.correctiveAction.trim(),
      verdictNotes: v.verdictNotes.trim(),
    },
    findings: c.findings.map(findingKey).sort(),
    photoHashes: [...c.photoHashes].sort(),
  });
}

export function contentHash(c: SignedContent): string {
  return createHash("sha256").update(canonicalContent(c), "utf8").digest("hex");
}

/** The hash as people read it: groups of eight, the way it prints on the report. */
export const groupedHash = (hex: string) => hex.match(/.{1,8}/g)?.join(" ") ?? hex;
