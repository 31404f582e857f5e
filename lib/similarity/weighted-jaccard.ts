// Weighted Jaccard overlap of two keyed bags: Σ min / Σ max over the union of keys.
// Keys are visited in sorted order so the floating-point sum is the same both ways round.

export interface SharedKey {
  readonly key: string;
  /** This key's share of the overlap (its min weight over Σ max). */
  readonly share: number;
}

export function weightedJaccard(a: ReadonlyMap<string, number>, b: ReadonlyMap<string, number>): { value: number; shared: SharedKey[] } {
  const keys = [...new Set([...a.keys(), ...b.keys()])].sort();
  let sumMax = 0;
  for (const k of keys) sumMax += Math.max(a.get(k) ?? 0, b.get(k) ?? 0);
  if (sumMax === 0) return { value: 0, shared: [] };
  let sumMin = 0;
  const shared: SharedKey[] = [];
  for (const k of keys) {
    const m = Math.min(a.get(k) ?? 0, b.get(k) ?? 0);
    if (m > 0) {
      sumMin += m;
      shared.push({ key: k, share: m / sumMax });
    }
  }
  return { value: sumMin / sumMax, shared };
}

/** Bag of keys, each weighted by the largest weight it was seen with. */
export function maxBag<T>(items: readonly T[], keyOf: (item: T) => string | null, weightOf: (item: T) => number) {
  const bag = new Map<string, number>();
  for (const item of items) {
    const key = keyOf(item);
    if (key === null) continue;
    bag.set(key, Math.max(bag.get(key) ?? 0, weightOf(item)));
  }
  return bag;
}
