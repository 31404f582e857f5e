import { describe, expect, it } from "vitest";
import { fisherBounds, weibullMleFromData } from "@/lib/stats/weibull-mle";
import { likelihoodRatioBounds } from "@/lib/stats/weibull-lr-bounds";
import { prepareLikelihoodData } from "@/lib/stats/weibull-likelihood";
import { checkValues, expectRel, unitsOf } from "./check-values";

const { lieblein_zelen_complete: lz, nist_8_4_1_3: nist } = checkValues.weibull;

const cases = [
  // Lieblein & Zelen (1956) J. Res. NBS 57(5):273-316 data; bounds computed with reference libraries
  { name: "Lieblein & Zelen complete data", set: lz },
  // NIST/SEMATECH e-Handbook 8.4.1.3 data; bounds computed with reference libraries
  { name: "NIST e-Handbook 8.4.1.3 example", set: nist },
];

describe.each(cases)("95% bounds: $name", ({ set }) => {
  const data = prepareLikelihoodData(unitsOf(set));
  const fit = weibullMleFromData(data);

  it("Fisher-matrix bounds (observed information, log-transformed; B10 by delta method)", () => {
    const got = fisherBounds(data, fit, 0.95);
    const want = set.fisher_95;
    expectRel(got.seBeta, want.se_beta, want.rel_tol);
    expectRel(got.seEta, want.se_eta, want.rel_tol);
    expectRel(fit.b10, want.B10, want.rel_tol);
    [0, 1].forEach((k) => {
      expectRel(got.beta[k], want.beta_ci[k], want.rel_tol);
      expectRel(got.eta[k], want.eta_ci[k], want.rel_tol);
      expectRel(got.b10[k], want.B10_ci[k], want.rel_tol);
    });
  });

  it("likelihood-ratio (profile likelihood) bounds", () => {
    const got = likelihoodRatioBounds(data, fit, 0.95);
    const want = set.lr_95;
    expectRel(fit.logLik, want.loglik_max, want.rel_tol);
    [0, 1].forEach((k) => {
      expectRel(got.beta[k], want.beta_ci[k], want.rel_tol);
      expectRel(got.eta[k], want.eta_ci[k], want.rel_tol);
      expectRel(got.b10[k], want.B10_ci[k], want.rel_tol);
    });
  });

  it("narrows as the confidence level falls (common practice)", () => {
    const wide = likelihoodRatioBounds(data, fit, 0.95);
    const narrow = likelihoodRatioBounds(data, fit, 0.8);
    expect(narrow.beta[0]).toBeGreaterThan(wide.beta[0]);
    expect(narrow.beta[1]).toBeLessThan(wide.beta[1]);
    expect(narrow.b10[0]).toBeGreaterThan(wide.b10[0]);
    expect(fit.b10).toBeGreaterThan(narrow.b10[0]);
    expect(fit.b10).toBeLessThan(narrow.b10[1]);
  });
});
