// A small seeded random source so the demo casebook comes out the same on every run.

/** mulberry32: a 32-bit generator, tiny and plenty for invented data (not for anything secret). */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export type Rng = ReturnType<typeof createRng>;

export function createRng(seed: number) {
  const next = mulberry32(seed);
  const rng = {
    next,
    /** A whole number from lo to hi, both included. */
    int: (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1)),
    /** A real number from lo up to hi. */
    real: (lo: number, hi: number) => lo + next() * (hi - lo),
    chance: (p: number) => next() < p,
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)],
    /** Picks by weight: [[value, weight], ...]. */
    weighted: <T>(entries: readonly (readonly [T, number])[]): T => {
      const total = entries.reduce((s, [, w]) => s + w, 0);
      let r = next() * total;
      for (const [value, w] of entries) {
        r -= w;
        if (r < 0) return value;
      }
      return entries[entries.length - 1][0];
    },
    /** Standard normal by Box-Muller, scaled. */
    normal: (mean: number, sd: number) => {
      const u = 1 - next();
      const v = next();
      return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    },
    /** Weibull by inverse transform: shape > 1 wears out, shape < 1 fails early. */
    weibull: (shape: number, scale: number) => scale * Math.pow(-Math.log(1 - next()), 1 / shape),
    shuffle: <T>(items: readonly T[]): T[] => {
      const out = [...items];
      for (let i = out.length - 1; i > 0; i--) {
        const j = Math.floor(next() * (i + 1));
        [out[i], out[j]] = [out[j], out[i]];
      }
      return out;
    },
    /** Some of the items, each kept with probability p, order kept. */
    some: <T>(items: readonly T[], p: number): T[] => items.filter(() => next() < p),
  };
  return rng;
}
