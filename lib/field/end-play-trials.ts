// Turns what was typed for each end-play trial into a length in inches, or a clear error.

import { message, type FieldMessage } from "./messages";
import { COMPARE_SLACK_IN } from "./end-play-policy";
import { formatInches, formatMm, inToMm, mmToIn, parseLength } from "./units";

export type EndPlayMethod = "dial" | "tape";
export type LengthUnit = "in" | "mm";
export type EndPlayTrialInput = { zero?: number | string; reading: number | string };

export type EndPlayTrialValue = {
  /** 1-based, as the mechanic numbers the trials. */
  trial: number;
  in: number;
  mm: number;
};

export type ParsedTrials = { values: EndPlayTrialValue[]; errors: FieldMessage[] };

function toInches(value: number, unit: LengthUnit): number {
  return unit === "in" ? value : mmToIn(value);
}

function both(value: number, unit: LengthUnit): string {
  const inches = toInches(value, unit);
  return `${formatInches(inches)} (${formatMm(inToMm(inches))})`;
}

/**
 * Dial: end play = reading − zero (the cup pushed toward the wheel and zeroed, then pulled
 * toward the end cap). Tape: the reading is the end play; any zero given is not used.
 */
export function parseTrials(method: EndPlayMethod, unit: LengthUnit, trials: readonly EndPlayTrialInput[]): ParsedTrials {
  const values: EndPlayTrialValue[] = [];
  const errors: FieldMessage[] = [];

  trials.forEach((entry, index) => {
    const trial = index + 1;
    const reading = parseLength(entry.reading);
    if (!reading.ok) {
      errors.push(message("error", "trial-unreadable", `Trial ${trial}: the reading could not be read. ${reading.error}`));
      return;
    }
    let endPlay = reading.value;
    if (method === "dial" && entry.zero !== undefined && entry.zero !== "") {
      const zero = parseLength(entry.zero);
      if (!zero.ok) {
        errors.push(message("error", "trial-unreadable", `Trial ${trial}: the zero could not be read. ${zero.error}`));
        return;
      }
      endPlay = reading.value - zero.value;
      if (toInches(endPlay, unit) < -COMPARE_SLACK_IN) {
        errors.push(
          message(
            "error",
            "trial-negative",
            `Trial ${trial}: the reading ${both(reading.value, unit)} is below the zero ${both(zero.value, unit)}, ` +
              "and end play cannot be negative. Push the cup toward the wheel, zero the dial, pull toward the end cap and read again.",
          ),
        );
        return;
      }
    }
    if (toInches(endPlay, unit) < -COMPARE_SLACK_IN) {
      errors.push(
        message(
          "error",
          "trial-negative",
          `Trial ${trial}: the reading ${both(endPlay, unit)} is below zero, and end play cannot be negative. Measure again.`,
        ),
      );
      return;
    }
    // Keep the value as typed in its own unit; convert only for the other one.
    const clamped = Math.max(0, endPlay);
    const inches = toInches(clamped, unit);
    values.push({ trial, in: inches, mm: unit === "mm" ? clamped : inToMm(inches) });
  });

  return { values, errors };
}
