// The profile likelihood behind the likelihood-ratio bounds: Newton's maximum over the shape must
// be the maximum a plain search finds (arithmetic: a dense grid refined by golden section).
import { describe, expect, it } from "vitest";
import { prepareLikelihoodData, weibullLogLik } from "@/lib/stats/weibull-likelihood";
import { weibullMleFromData } from "@/lib/stats/weibull-mle";
import { profileOverBeta } from "@/lib/stats/weibull-lr-bounds";

function searchMax(f: (x: number) => number, lo: number, hi: number): number {
  let best = lo;
  for (let i = 0; i <= 4000; i++) {
    const x = lo + ((hi - lo) * i) / 4000;
    if (f(x) > f(best)) best = x;
  }
  let a = best - (hi - lo) / 4000;
  let b = best + (hi - lo) / 4000;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 200; i++) {
    const c = b - g * (b - a);
    const d = a + g * (b - a);
    if (f(c) > f(d)) b = d;
    else a = c;
  }
  return f((a + b) / 2);
}

// Ten lives, four of them suspensions (invented for the check).
const units = [12, 19, 23, 31, 37, 44, 52, 60, 71, 90].map((time, i) => ({ time, failed: i % 5 !== 1 && i % 5 !== 3 }));
const data = prepareLikelihoodData(units);
const fit = weibullMleFromData(data);
const K10 = Math.log(-Math.log(0.9));

describe("profileOverBeta", () => {
  it("at the estimate's own eta returns the fit's beta and log-likelihood", () => {
    const p = profileOverBeta(data, Math.log(fit.eta), 0, 1);
    expect(p.beta).toBeCloseTo(fit.beta, 8);
    expect(p.logLik).toBeCloseTo(fit.logLik, 10);
  });

  it.each([0.6, 0.8, 1.25, 1.6])("holding eta at %s x the estimate, matches a plain search", (k) => {
    const eta = fit.eta * k;
    const got = profileOverBeta(data, Math.log(eta), 0, fit.beta).logLik;
    expect(got).toBeCloseTo(
      searchMax((b) => weibullLogLik(data, b, eta), 0.05, 20),
      8,
    );
  });

  it.each([0.4, 0.7, 1.3, 1.8])("holding B10 at %s x the estimate, matches a plain search", (k) => {
    const b10 = fit.b10 * k;
    const got = profileOverBeta(data, Math.log(b10), K10, fit.beta).logLik;
    expect(got).toBeCloseTo(
      searchMax((b) => weibullLogLik(data, b, b10 * Math.exp(-K10 / b)), 0.05, 20),
      8,
    );
  });
});
