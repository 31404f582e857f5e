// Small one-dimensional solvers used by the Weibull fits.

/** Root of f on [lo, hi] where f(lo) and f(hi) differ in sign, by bisection. */
export function bisectRoot(f: (x: number) => number, lo: number, hi: number, tol = 1e-13): number {
  let fLo = f(lo);
  if (fLo === 0) return lo;
  for (let i = 0; i < 200 && Math.abs(hi - lo) > tol * Math.max(1, Math.abs(lo) + Math.abs(hi)); i++) {
    const mid = (lo + hi) / 2;
    const fMid = f(mid);
    if (fMid === 0) return mid;
    if (fMid > 0 === fLo > 0) {
      lo = mid;
      fLo = fMid;
    } else {
      hi = mid;
    }
  }
  return (lo + hi) / 2;
}

/**
 * Maximum of f on [lo, hi]: a coarse grid finds the best cell (guards against a
 * poor bracket), then golden-section search refines it.
 */
export function maximize1d(f: (x: number) => number, lo: number, hi: number, gridSize = 40): { x: number; value: number } {
  const step = (hi - lo) / gridSize;
  let bestI = 0;
  let bestV = -Infinity;
  for (let i = 0; i <= gridSize; i++) {
    const v = f(lo + i * step);
    if (v > bestV) {
      bestV = v;
      bestI = i;
    }
  }
  let a = lo + Math.max(0, bestI - 1) * step;
  let b = lo + Math.min(gridSize, bestI + 1) * step;
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < 200 && b - a > 1e-12 * Math.max(1, Math.abs(a)); i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = f(d);
    }
  }
  const x = (a + b) / 2;
  const value = f(x);
  return value >= bestV ? { x, value } : { x: lo + bestI * step, value: bestV };
}
