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
