// The limits end play is judged against. Sites may set their own; these are the defaults.

export type EndPlayPolicy = {
  /** Largest end play kept in service, inches. */
  maxIn: number;
  /** Largest difference between trials a dial indicator should repeat to, inches. */
  dialSpreadIn: number;
  /** Largest difference between trials read off a metal tape, inches. */
  tapeSpreadIn: number;
  /** Largest end play a journal bearing can show; above it a reading must be confirmed as typed. Default 0.25 in. */
  plausibleMaxIn?: number;
  /** Triggers for which a keep may rest on the other checks without an end-play reading. Default: none. */
  endPlayOptionalFor?: readonly string[];
};

/**
 * More than 1/16 in (0.0625 in) removes (common practice for North American freight
 * interchange). Spread limits are about two dial divisions of 0.001 in, and one tape
 * graduation of 1/64 in (common practice).
 */
export const DEFAULT_END_PLAY_POLICY: Readonly<EndPlayPolicy> = Object.freeze({
  maxIn: 0.0625,
  dialSpreadIn: 0.002,
  tapeSpreadIn: 1 / 64,
});

/**
 * End play at or below half a thousandth of an inch is treated as zero: a dial indicator
 * resolves 0.001 in, so anything smaller is a needle flicker, not clearance (common practice).
 */
export const ZERO_END_PLAY_IN = 0.0005;

/** Slack for comparing inches after unit conversion; far below anything a dial can show. */
export const COMPARE_SLACK_IN = 1e-9;

export function assertValidPolicy(policy: EndPlayPolicy): void {
  for (const key of ["maxIn", "dialSpreadIn", "tapeSpreadIn"] as const) {
    const value = policy[key];
    if (!Number.isFinite(value) || value <= 0) {
      throw new RangeError(`End-play policy ${key} must be a positive number of inches; got ${value}.`);
    }
  }
}
