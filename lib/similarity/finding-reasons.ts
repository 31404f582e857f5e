// The finding-based parts of the similarity: same code on the same part, same code
// anywhere, same family on the same part. Each part is a severity-weighted Jaccard
// overlap, so adding a finding both cases share can never lower it. Where a
// weaker part only restates a same-part match, its share is folded into that
// reason instead of being listed again.
import { familyOfCode } from "@/lib/classification/damage-families";
import type { SimilarityFinding, SimilarityReason } from "./score";
import { componentPhrase, damageLabel, familyLabel } from "@/lib/classification/labels";
import { onPart } from "./labels";
import { maxBag, weightedJaccard } from "./weighted-jaccard";
import { SIMILARITY_WEIGHTS as W, severityWeight } from "./weights";

// "No damage" findings say nothing about a failure mechanism; the verdict covers them.
const NO_DAMAGE = "none";
const SEP = "|";

export function findingReasons(a: readonly SimilarityFinding[], b: readonly SimilarityFinding[]): SimilarityReason[] {
  const damageOf = (fs: readonly SimilarityFinding[]) => fs.filter((f) => f.damageCode && f.damageCode !== NO_DAMAGE);
  const fa = damageOf(a),
    fb = damageOf(b);
  const weight = (f: SimilarityFinding) => severityWeight(f.severity);

  const pairs = weightedJaccard(
    maxBag(fa, (f) => f.component + SEP + f.damageCode, weight),
    maxBag(fb, (f) => f.component + SEP + f.damageCode, weight),
  );
  const codes = weightedJaccard(
    maxBag(fa, (f) => f.damageCode, weight),
    maxBag(fb, (f) => f.damageCode, weight),
  );
  const familyKey = (f: SimilarityFinding) => f.component + SEP + familyOfCode(f.damageCode);
  const families = weightedJaccard(maxBag(fa, familyKey, weight), maxBag(fb, familyKey, weight));

  // Same-part reasons first, keyed so weaker parts can fold into them.
  const byPair = new Map<string, { kind: SimilarityReason["kind"]; weight: number; text: string }>();
  for (const { key, share } of pairs.shared) {
    const [component, code] = key.split(SEP);
    byPair.set(key, { kind: "same-finding", weight: W.sameFinding * share, text: `${damageLabel(code)}${onPart(component)} in both` });
  }
  const extra: SimilarityReason[] = [];

  for (const { key: code, share } of codes.shared) {
    const folded = [...byPair.keys()].find((k) => k.split(SEP)[1] === code);
    if (folded) {
      byPair.get(folded)!.weight += W.sameCode * share;
      continue;
    }
    const partsIn = (fs: readonly SimilarityFinding[]) =>
      [...new Set(fs.filter((f) => f.damageCode === code).map((f) => componentPhrase(f.component)))].join(", ");
    extra.push({
      kind: "same-code",
      weight: W.sameCode * share,
      text: `${damageLabel(code)} in both, on different parts (${partsIn(fa)} / ${partsIn(fb)})`,
    });
  }

  for (const { key, share } of families.shared) {
    const [component, family] = key.split(SEP);
    const folded = [...byPair.keys()].find((k) => {
      const [c, code] = k.split(SEP);
      return c === component && familyOfCode(code) === family;
    });
    if (folded) {
      byPair.get(folded)!.weight += W.sameFamily * share;
      continue;
    }
    const labelsIn = (fs: readonly SimilarityFinding[]) =>
      [...new Set(fs.filter((f) => familyKey(f) === key).map((f) => damageLabel(f.damageCode)))].join(", ");
    extra.push({
      kind: "same-family",
      weight: W.sameFamily * share,
      text: `${familyLabel(family)}${onPart(component)} in both (${labelsIn(fa)} / ${labelsIn(fb)})`,
    });
  }
  return [...byPair.values(), ...extra];
}
