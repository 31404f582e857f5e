// Confirmed share per band of readings, with Wilson intervals: the plain view the fitted curve is
// drawn over. Bands are whole multiples of `width`, so the same reading always lands in the same band.
import { wilsonInterval, type BinomialPoint, type ProportionInterval } from "@/lib/stats";

export type RateBin = { from: number; to: number; n: number; confirmed: number; rate: ProportionInterval };

export function wilsonBins(points: readonly BinomialPoint[], width: number, confidence = 0.95): RateBin[] {
  if (!(width > 0)) throw new RangeError("wilsonBins needs a band width above 0");
  const bands = new Map<number, { n: number; y: number }>();
  for (const p of points) {
    const key = Math.floor(p.x / width);
    const b = bands.get(key) ?? { n: 0, y: 0 };
    b.n += p.n;
    b.y += p.y;
    bands.set(key, b);
  }
  return [...bands.entries()]
    .filter(([, b]) => b.n > 0)
    .sort(([a], [b]) => a - b)
    .map(([key, b]) => ({ from: key * width, to: (key + 1) * width, n: b.n, confirmed: b.y, rate: wilsonInterval(b.y, b.n, confidence) }));
}

/** A band width giving about `target` bands over the readings' range, rounded to 1, 2, 5 or 10 x 10^k. */
export function niceBandWidth(min: number, max: number, target = 8): number {
  const span = Math.max(1, max - min);
  const raw = span / target;
  const power = 10 ** Math.floor(Math.log10(raw));
  const steps = [1, 2, 5, 10].map((s) => s * power);
  return steps.find((s) => s >= raw) ?? 10 * power;
}
