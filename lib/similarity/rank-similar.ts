// The most similar cases to one case, best first, each with its reasons.
import { similarity, type SimilarityCase, type SimilarityReason } from "./score";

export interface RankedCase<C extends SimilarityCase> {
  readonly candidate: C;
  readonly score: number;
  readonly reasons: SimilarityReason[];
}

// Scores equal to this many decimals count as a tie, so float noise never decides the order.
const TIE_DECIMALS = 9;
const roundForTie = (x: number) => Math.round(x * 10 ** TIE_DECIMALS) / 10 ** TIE_DECIMALS;

export function rankSimilar<C extends SimilarityCase>(target: SimilarityCase, candidates: readonly C[], limit = 10): RankedCase<C>[] {
  return candidates
    .filter((c) => c !== target && c.id !== target.id)
    .map((candidate) => ({ candidate, ...similarity(target, candidate) }))
    .filter((r) => r.score > 0)
    .sort(
      (x, y) =>
        roundForTie(y.score) - roundForTie(x.score) || (x.candidate.id < y.candidate.id ? -1 : x.candidate.id > y.candidate.id ? 1 : 0),
    )
    .slice(0, Math.max(0, limit));
}
