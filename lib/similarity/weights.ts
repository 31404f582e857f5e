// How much each kind of agreement between two cases adds to their similarity.
// The parts sum to 1, so two cases that agree on everything score 1.
export const SIMILARITY_WEIGHTS = {
  /** Same damage code on the same part: the strongest sign of the same failure mechanism. */
  sameFinding: 0.4,
  /** Same damage code anywhere in the bearing: same mechanism, possibly seen in another place. */
  sameCode: 0.15,
  /** Related damage (same family) on the same part, e.g. surface and subsurface fatigue on the cup. */
  sameFamily: 0.1,
  /** Same primary root cause: an analyst's verdict agreeing is strong, but many cases have none yet. */
  sameCause: 0.15,
  /** Same removal trigger: tells how the bearing was caught, weaker evidence of the failure itself. */
  sameTrigger: 0.07,
  /** Same bearing class: same design and load, a background match on its own. */
  sameBearingClass: 0.05,
  /** Words in common in the notes: catches what the codes miss, but text is noisy. */
  sharedWords: 0.08,
} as const;

export type SimilarityPart = keyof typeof SIMILARITY_WEIGHTS;

/** Finding weight rises with severity, so a shared condemning spall counts more than shared cosmetic marks. */
export function severityWeight(severity: number): number {
  const s = Number.isFinite(severity) ? Math.min(4, Math.max(0, Math.round(severity))) : 0;
  return 1 + s;
}

/** Most words listed in a "words in common" reason. */
export const MAX_WORDS_SHOWN = 8;
