// Explainable similarity between two bearing cases: a weighted sum of agreements
// (findings, codes, families, cause, trigger, class, words), each one a reason a
// person can read. Reason weights add up to the score.
import { findingReasons } from "./finding-reasons";
import { causeLabel, triggerLabel } from "@/lib/classification/labels";
import { sharedWords } from "./shared-words";
import { SIMILARITY_WEIGHTS as W } from "./weights";

export interface SimilarityFinding {
  readonly component: string;
  readonly damageCode: string;
  readonly severity: number;
}

export interface SimilarityCase {
  readonly id: string;
  readonly bearingClass: string | null;
  readonly trigger: string | null;
  readonly primaryCause?: string | null;
  readonly findings: readonly SimilarityFinding[];
  /** Narrative: notes, field remarks, verdict text. */
  readonly text: string;
}

export type SimilarityReasonKind =
  | "same-finding"
  | "same-code"
  | "same-family"
  | "same-cause"
  | "same-trigger"
  | "same-bearing-class"
  | "shared-words";

export interface SimilarityReason {
  readonly kind: SimilarityReasonKind;
  /** This reason's part of the score. */
  readonly weight: number;
  readonly text: string;
}

export interface SimilarityResult {
  readonly score: number;
  readonly reasons: SimilarityReason[];
}

// Two cases that both could not be decided share nothing meaningful.
const CAUSES_THAT_DO_NOT_MATCH = new Set(["undetermined"]);

const lowerFirst = (s: string) => s.charAt(0).toLowerCase() + s.slice(1);
const same = (a: string | null | undefined, b: string | null | undefined) =>
  !!a && !!b && a.trim().toLowerCase() === b.trim().toLowerCase();

export function similarity(a: SimilarityCase, b: SimilarityCase): SimilarityResult {
  const reasons: SimilarityReason[] = [...findingReasons(a.findings, b.findings)];

  if (same(a.primaryCause, b.primaryCause) && !CAUSES_THAT_DO_NOT_MATCH.has(a.primaryCause!.trim().toLowerCase())) {
    reasons.push({ kind: "same-cause", weight: W.sameCause, text: `Same root cause: ${lowerFirst(causeLabel(a.primaryCause!))}` });
  }
  if (same(a.trigger, b.trigger)) {
    reasons.push({ kind: "same-trigger", weight: W.sameTrigger, text: `Same trigger: ${lowerFirst(triggerLabel(a.trigger!))}` });
  }
  if (same(a.bearingClass, b.bearingClass)) {
    reasons.push({ kind: "same-bearing-class", weight: W.sameBearingClass, text: `Same bearing class (${a.bearingClass!.trim()})` });
  }
  const words = sharedWords(a.text, b.text);
  if (words.value > 0) {
    reasons.push({ kind: "shared-words", weight: W.sharedWords * words.value, text: `Words in common: ${words.shown}` });
  }

  reasons.sort((x, y) => y.weight - x.weight || x.text.localeCompare(y.text));
  const total = reasons.reduce((sum, r) => sum + r.weight, 0);
  return { score: Math.min(1, Math.max(0, total)), reasons };
}
