// Readings a journal bearing cannot show, and a trial far from its fellows: caught before they decide anything.

import { COMPARE_SLACK_IN, type EndPlayPolicy } from "./end-play-policy";
import type { EndPlayMethod, EndPlayTrialValue } from "./end-play-trials";
import { message, type FieldMessage } from "./messages";
import { formatInches, formatMm, inToMm } from "./units";

/**
 * Mounted end play on a freight-car tapered roller bearing is a few thousandths of an inch; even a
 * badly worn one shows well under 1/4 in. Above that the number is a slip of the hand (typed in the
 * wrong unit, a missing decimal point), not a reading (common practice; the limit is the site's to change).
 */
export const DEFAULT_PLAUSIBLE_MAX_IN = 0.25;

/** A trial further from the median of all trials than this many allowed spreads is named as an outlier (common practice). */
export const OUTLIER_SPREADS = 5;

const both = (inches: number) => `${formatInches(inches)} (${formatMm(inToMm(inches))})`;

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

export type Plausibility = {
  /** Trials above the plausible limit; while unconfirmed they keep the end play from deciding anything. */
  implausible: EndPlayTrialValue[];
  /** Confirm-as-typed is needed before the readings may count. */
  needsConfirmation: boolean;
  messages: FieldMessage[];
};

export function checkPlausibility(
  values: readonly EndPlayTrialValue[],
  method: EndPlayMethod,
  policy: EndPlayPolicy,
  confirmedAsTyped = false,
): Plausibility {
  const limit = policy.plausibleMaxIn ?? DEFAULT_PLAUSIBLE_MAX_IN;
  const messages: FieldMessage[] = [];
  const implausible = values.filter((v) => v.in > limit + COMPARE_SLACK_IN);
  for (const v of implausible) {
    messages.push(
      confirmedAsTyped
        ? message(
            "warn",
            "implausible-confirmed",
            `Trial ${v.trial}: ${both(v.in)} is more than a journal bearing should show (${both(limit)}); it was confirmed as typed.`,
          )
        : message(
            "error",
            "implausible-reading",
            `Trial ${v.trial}: ${both(v.in)} is more than a journal bearing can show (limit ${both(limit)}). Check the unit and the decimal point, correct it, or confirm it as typed.`,
          ),
    );
  }
  if (values.length >= 3) {
    const allowed = method === "dial" ? policy.dialSpreadIn : policy.tapeSpreadIn;
    const m = median(values.map((v) => v.in));
    const far = values.reduce((a, b) => (Math.abs(b.in - m) > Math.abs(a.in - m) ? b : a));
    if (Math.abs(far.in - m) > OUTLIER_SPREADS * allowed + COMPARE_SLACK_IN && !implausible.includes(far)) {
      messages.push(
        message(
          "warn",
          "outlier-trial",
          `Trial ${far.trial} (${both(far.in)}) is far from the others (middle value ${both(m)}). Check it was read right, or re-measure.`,
        ),
      );
    }
  }
  return { implausible, needsConfirmation: implausible.length > 0 && !confirmedAsTyped, messages };
}
