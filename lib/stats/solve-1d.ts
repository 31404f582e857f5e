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
 * Root of f between a and b where fa = f(a) and fb = f(b) differ in sign, by Brent's method:
 * inverse quadratic or secant steps kept inside the bracket, bisection when they would crawl.
 * Stops when the bracket is as narrow as bisectRoot's with the same tol, in a handful of calls of f.
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number, tol = 1e-13): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  let c = b;
  let fc = fb;
  let d = b - a;
  let e = d;
  for (let i = 0; i < 200; i++) {
    if (fb > 0 === fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol * Math.max(1, Math.abs(b) + Math.abs(c));
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0) return b;
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * xm * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    fb = f(b);
  }
  return b;
}
