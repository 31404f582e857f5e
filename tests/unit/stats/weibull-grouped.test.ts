// Units sharing a service life are summed once with their count: the likelihood, its score and the
// fit must equal the term-by-term sums over every unit (arithmetic on the Weibull density and survival).
import { describe, expect, it } from "vitest";
import { prepareLikelihoodData, weibullLogLik } from "@/lib/stats/weibull-likelihood";
import { weibullMle } from "@/lib/stats/weibull-mle";
import type { LifeUnit } from "@/lib/stats/weibull-data";

/** ln L term by term: failures ln f(t) = ln(b/e) + (b-1) ln(t/e) - (t/e)^b, suspensions ln S(t) = -(t/e)^b. */
function naiveLogLik(units: LifeUnit[], beta: number, eta: number): number {
  return units.reduce(
    (s, u) => s + (u.failed ? Math.log(beta / eta) + (beta - 1) * Math.log(u.time / eta) : 0) - Math.pow(u.time / eta, beta),
    0,
  );
}

// Whole months 1..120, many repeats, half suspended (invented).
const units: LifeUnit[] = Array.from({ length: 6000 }, (_, i) => ({ time: 1 + ((i * 37) % 120), failed: i % 2 === 0 }));

describe("grouped Weibull likelihood", () => {
  it("keeps one term per distinct life", () => {
    const d = prepareLikelihoodData(units);
    expect(d.logTimes.length).toBe(120);
    expect(d.counts.reduce((a, b) => a + b, 0)).toBe(6000);
    expect(d.failures).toBe(3000);
  });

  it("equals the sum over every unit", () => {
    const d = prepareLikelihoodData(units);
    for (const [beta, eta] of [
      [0.8, 40],
      [2.2, 90],
      [3.5, 150],
    ]) {
      expect(weibullLogLik(d, beta, eta)).toBeCloseTo(naiveLogLik(units, beta, eta), 6);
    }
  });

  it("fits the same as the units in any order, and the MLE is a maximum of the term-by-term likelihood", () => {
    const fit = weibullMle(units);
    const shuffled = [...units].reverse();
    expect(weibullMle(shuffled).beta).toBeCloseTo(fit.beta, 10);
    const at = naiveLogLik(units, fit.beta, fit.eta);
    for (const [db, de] of [
      [0.01, 0],
      [-0.01, 0],
      [0, 0.5],
      [0, -0.5],
    ]) {
      expect(naiveLogLik(units, fit.beta + db, fit.eta + de)).toBeLessThan(at);
    }
  });
});
