import type { Interval } from "./weibull-mle";

export type ShapeReading = "early-life" | "random" | "wear-out";

export interface ShapeInterpretation {
  reading: ShapeReading;
  explanation: string;
}

/**
 * Reads the Weibull shape: if the bounds on beta include 1 the data cannot tell the
 * failure rate from constant, so "random"; otherwise by which side of 1 beta lies.
 */
export function readShape(beta: number, betaBounds?: Interval): ShapeInterpretation {
  const fmt = beta.toFixed(2);
  const boundsHoldOne = betaBounds !== undefined && betaBounds[0] <= 1 && betaBounds[1] >= 1;
  if (boundsHoldOne || (betaBounds === undefined && Math.abs(beta - 1) < 0.05)) {
    return {
      reading: "random",
      explanation:
        `Shape ${fmt} is close enough to 1 that the failure rate may be constant: failures look random in ` +
        "time, as from outside causes, rather than from age or from early defects.",
    };
  }
  if (beta < 1) {
    return {
      reading: "early-life",
      explanation:
        `Shape ${fmt} is below 1: the failure rate falls with age. Failures come early in life ` +
        "(infant mortality), pointing at defects from manufacture, reconditioning or mounting.",
    };
  }
  return {
    reading: "wear-out",
    explanation:
      `Shape ${fmt} is above 1: the failure rate rises with age. Bearings are wearing out, ` +
      "as expected from rolling-contact fatigue and wear.",
  };
}
