// Which two photos to put side by side for a pair of similar cases: the first photo of the
// same part from each, preferring the part where both show the same damage, then the same
// kind of damage, then any part both have photos of.
import { familyOfCode } from "@/lib/classification/damage-families";

export interface PhotoRef {
  readonly id: string;
  readonly component: string | null;
}

export interface FindingRef {
  readonly component: string;
  readonly damageCode: string;
}

export interface PhotoPair {
  readonly component: string;
  /** The photo of the case being looked at. */
  readonly a: string;
  /** The photo of the similar case. */
  readonly b: string;
}

const damaged = (fs: readonly FindingRef[]) => fs.filter((f) => f.damageCode !== "none");

/** Parts in order of how telling a side-by-side of them is. */
export function partsToCompare(a: readonly FindingRef[], b: readonly FindingRef[]): string[] {
  const da = damaged(a),
    db = damaged(b);
  const sameCode = da.filter((f) => db.some((g) => g.component === f.component && g.damageCode === f.damageCode)).map((f) => f.component);
  const sameFamily = da
    .filter((f) => db.some((g) => g.component === f.component && familyOfCode(g.damageCode) === familyOfCode(f.damageCode)))
    .map((f) => f.component);
  const bothDamaged = da.filter((f) => db.some((g) => g.component === f.component)).map((f) => f.component);
  return [...new Set([...sameCode, ...sameFamily, ...bothDamaged])];
}

/** Photos are given oldest first; null when the two cases have no photographed part in common. */
export function pickPhotoPair(
  aPhotos: readonly PhotoRef[],
  bPhotos: readonly PhotoRef[],
  preferredParts: readonly string[],
): PhotoPair | null {
  const first = (photos: readonly PhotoRef[], part: string) => photos.find((p) => p.component === part);
  const shared = aPhotos.map((p) => p.component).filter((c): c is string => !!c && bPhotos.some((q) => q.component === c));
  for (const part of [...preferredParts, ...shared]) {
    const a = first(aPhotos, part),
      b = first(bPhotos, part);
    if (a && b) return { component: part, a: a.id, b: b.id };
  }
  return null;
}
