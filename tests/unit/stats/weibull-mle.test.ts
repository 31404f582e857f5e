import { describe, expect, it } from "vitest";
import { weibullMle } from "@/lib/stats/weibull-mle";
import { checkValues, expectAbs, expectRel, unitsOf } from "./check-values";

const { lieblein_zelen_complete: lz, nist_8_4_1_3: nist, kececioglu_mean_order_number: kec } = checkValues.weibull;

describe("Weibull maximum likelihood", () => {
  it("Lieblein & Zelen complete data", () => {
    const fit = weibullMle(unitsOf(lz));
    // Lieblein & Zelen (1956) data; MLE computed, identical to R survival::survreg to 8+ digits
    expectRel(fit.beta, lz.mle.beta, lz.mle.rel_tol);
    expectRel(fit.eta, lz.mle.eta, lz.mle.rel_tol);
    expectRel(fit.b10, lz.mle.B10, lz.mle.rel_tol);
    expectRel(fit.logLik, lz.mle.loglik, lz.mle.rel_tol);
    // scipy weibull_min.fit(floc=0): optimizer stops ~6e-7 from the root, compare at 1e-5 as noted
    expectRel(fit.beta, lz.mle_scipy_weibull_min_fit_floc0.beta, 1e-5);
    expectRel(fit.eta, lz.mle_scipy_weibull_min_fit_floc0.eta, 1e-5);
    // published beta = 2.102 (textbook exercise quoting the Lieblein & Zelen fit); eta = 81.88 from memory
    expectAbs(fit.beta, lz.mle_published.beta, lz.mle_published.abs_tol.beta);
    expectAbs(fit.eta, lz.mle_published.eta, lz.mle_published.abs_tol.eta);
  });

  it("NIST e-Handbook 8.4.1.3 example with ten suspensions at 500", () => {
    const fit = weibullMle(unitsOf(nist));
    const pub = nist.published;
    // NIST/SEMATECH e-Handbook 8.4.1.3, printed values (eta with abs_tol 1e-3 for NIST's solver tolerance)
    expectAbs(fit.beta, pub.beta, pub.abs_tol.beta);
    expectAbs(fit.eta, pub.eta, pub.abs_tol.eta);
    expectAbs(fit.logLik, pub.loglik, pub.abs_tol.loglik);
    expectAbs(2 * 2 - 2 * fit.logLik, pub.AIC, pub.abs_tol.AIC); // AIC = 2k - 2 logL, k = 2
    const comp = nist.computed;
    // NIST/SEMATECH e-Handbook 8.4.1.3 data; values computed with reference libraries, cross-checked
    expectRel(fit.beta, comp.beta, comp.rel_tol);
    expectRel(fit.eta, comp.eta, comp.rel_tol);
    expectRel(fit.b10, comp.B10, comp.rel_tol);
    expectRel(fit.logLik, comp.loglik, comp.rel_tol);
  });

  it("Kececioglu suspended example", () => {
    const fit = weibullMle(unitsOf(kec));
    // Kececioglu, Reliability & Life Testing Handbook Vol. 2 (1994), Table 3.1 data; MLE computed
    expectRel(fit.beta, kec.mle.beta, kec.rel_tol);
    expectRel(fit.eta, kec.mle.eta, kec.rel_tol);
    expectRel(fit.b10, kec.mle.B10, kec.rel_tol);
  });

  it("does not depend on the order of the units", () => {
    const units = unitsOf(nist).reverse();
    // NIST/SEMATECH e-Handbook 8.4.1.3 computed beta
    expectRel(weibullMle(units).beta, nist.computed.beta, nist.computed.rel_tol);
  });

  it("refuses data it cannot fit, with clear messages", () => {
    expect(() =>
      weibullMle([
        { time: 10, failed: true },
        { time: 20, failed: false },
      ]),
    ).toThrow(/at least two failures are needed/i);
    expect(() => weibullMle([])).toThrow(/at least two failures/i);
    expect(() =>
      weibullMle([
        { time: 10, failed: true },
        { time: 10, failed: true },
        { time: 30, failed: false },
      ]),
    ).toThrow(/all failure times are equal/i);
    expect(() =>
      weibullMle([
        { time: 0, failed: true },
        { time: 5, failed: true },
      ]),
    ).toThrow(/greater than zero/);
    expect(() =>
      weibullMle([
        { time: -3, failed: true },
        { time: 5, failed: true },
      ]),
    ).toThrow(/greater than zero/);
    expect(() =>
      weibullMle([
        { time: Number.NaN, failed: true },
        { time: 5, failed: true },
      ]),
    ).toThrow(/finite/);
  });
});
