// Mounted end play: from dial or tape trials to a mean, a spread and a call against the policy.

import { assertValidPolicy, COMPARE_SLACK_IN, DEFAULT_END_PLAY_POLICY, ZERO_END_PLAY_IN, type EndPlayPolicy } from "./end-play-policy";
import { parseTrials, type EndPlayMethod, type EndPlayTrialInput, type EndPlayTrialValue, type LengthUnit } from "./end-play-trials";
import { listInWords, message, type FieldMessage } from "./messages";
import { checkPlausibility } from "./plausibility";
import { formatInches, formatMm, inToMm, nearestSixtyFourth } from "./units";

export type EndPlayInput = {
  method: EndPlayMethod;
  unit: LengthUnit;
  trials: EndPlayTrialInput[];
  /** Asked when end play is zero: does the bearing turn easily by hand? */
  turnsByHand?: boolean;
  /** Was the bearing turned so the rollers seat before measuring? No means the reading is not valid. */
  rollersSeated?: boolean;
  /** The person confirmed an implausible reading is what they meant. */
  confirmedAsTyped?: boolean;
};

export type EndPlayMeasured = {
  count: number;
  trials: EndPlayTrialValue[];
  meanIn: number;
  meanMm: number;
  /** Largest trial minus smallest. */
  spreadIn: number;
  spreadMm: number;
  messages: FieldMessage[];
};

export type EndPlayResult =
  | { call: "incomplete"; removes: false; count: 0; trials: []; messages: FieldMessage[] }
  | ({ call: "within" | "tight-remeasure" | "tight-unknown"; removes: false } & EndPlayMeasured)
  | ({ call: "over-limit" | "tight-remove"; removes: true } & EndPlayMeasured);

export type EndPlayCall = EndPlayResult["call"];

function describe(inches: number, method: EndPlayMethod): string {
  const tape = method === "tape" ? `, about ${nearestSixtyFourth(inches)} on the tape` : "";
  return `${formatInches(inches)} (${formatMm(inToMm(inches))}${tape})`;
}

function describeLimit(maxIn: number): string {
  return `${formatInches(maxIn)} (${nearestSixtyFourth(maxIn)}, ${formatMm(inToMm(maxIn))})`;
}

export function evaluateEndPlay(input: EndPlayInput, policy: EndPlayPolicy = DEFAULT_END_PLAY_POLICY): EndPlayResult {
  assertValidPolicy(policy);
  const { values, errors } = parseTrials(input.method, input.unit, input.trials);
  const messages: FieldMessage[] = [...errors];
  if (input.method === "tape") {
    messages.push(
      message(
        "info",
        "tape-less-precise",
        "A metal tape is accepted, but a dial indicator is far more precise. Use a dial indicator when one is at hand.",
      ),
    );
  }
  if (values.length === 0) {
    messages.unshift(message("error", "no-usable-trial", "No usable end-play trial: enter at least one reading that can be read."));
    return { call: "incomplete", removes: false, count: 0, trials: [], messages };
  }

  const plausibility = checkPlausibility(values, input.method, policy, input.confirmedAsTyped);
  messages.push(...plausibility.messages);
  // Refused until confirmed or corrected: a slip of the hand must not remove or keep a bearing.
  if (plausibility.needsConfirmation) return { call: "incomplete", removes: false, count: 0, trials: [], messages };
  if (input.rollersSeated === false) {
    messages.unshift(
      message(
        "error",
        "not-seated",
        "The bearing was not turned to seat the rollers before measuring, so the reading is not valid. Turn it, then measure again.",
      ),
    );
    return { call: "incomplete", removes: false, count: 0, trials: [], messages };
  }
  if (input.rollersSeated === undefined) {
    messages.push(message("warn", "seating-unstated", "Say whether the bearing was turned so the rollers seat before measuring."));
  }

  const inches = values.map((v) => v.in);
  const millimetres = values.map((v) => v.mm);
  const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
  const measured = {
    count: values.length,
    trials: values,
    meanIn: mean(inches),
    meanMm: mean(millimetres),
    spreadIn: Math.max(...inches) - Math.min(...inches),
    spreadMm: Math.max(...millimetres) - Math.min(...millimetres),
  };

  const allowedSpread = input.method === "dial" ? policy.dialSpreadIn : policy.tapeSpreadIn;
  if (measured.spreadIn > allowedSpread + COMPARE_SLACK_IN) {
    const instrument = input.method === "dial" ? "a dial indicator" : "a tape";
    const how =
      input.method === "dial"
        ? "push the cup toward the wheel and zero, then pull toward the end cap and read"
        : "measure the cup's travel from pushed toward the wheel to pulled toward the end cap";
    messages.push(
      message(
        "warn",
        "spread-too-large",
        `The trials differ by ${describe(measured.spreadIn, input.method)}, more than the ${describe(allowedSpread, input.method)} ` +
          `${instrument} should repeat to. Re-measure: turn the bearing so the rollers seat, then ${how}.`,
      ),
    );
  }

  const meanText = describe(measured.meanIn, input.method);
  if (measured.meanIn <= ZERO_END_PLAY_IN) {
    if (input.turnsByHand === false) {
      messages.unshift(
        message(
          "remove",
          "tight-remove",
          `End play is zero (${meanText}) and the bearing does not turn easily by hand: remove the wheelset from service.`,
        ),
      );
      return { call: "tight-remove", removes: true, ...measured, messages };
    }
    if (input.turnsByHand === true) {
      messages.unshift(
        message(
          "warn",
          "tight-remeasure",
          `End play reads zero (${meanText}) but the bearing turns freely by hand. Turn it so the rollers seat and measure again; this alone is not a reason to remove.`,
        ),
      );
      return { call: "tight-remeasure", removes: false, ...measured, messages };
    }
    messages.unshift(
      message(
        "warn",
        "tight-unknown",
        `End play reads zero (${meanText}). Say whether the bearing turns easily by hand: if it does not, the wheelset must come out of service.`,
      ),
    );
    return { call: "tight-unknown", removes: false, ...measured, messages };
  }

  const limitText = describeLimit(policy.maxIn);
  if (measured.meanIn > policy.maxIn + COMPARE_SLACK_IN) {
    messages.unshift(
      message("remove", "over-limit", `End play ${meanText} is more than the ${limitText} limit: remove the wheelset from service.`),
    );
    return { call: "over-limit", removes: true, ...measured, messages };
  }

  const overTrials = values.filter((v) => v.in > policy.maxIn + COMPARE_SLACK_IN).map((v) => `trial ${v.trial}`);
  if (overTrials.length > 0) {
    messages.push(
      message(
        "warn",
        "trial-over-limit",
        `The mean is within the limit, but ${listInWords(overTrials)} read over ${limitText}. Re-measure before keeping the bearing.`,
      ),
    );
  }
  messages.unshift(message("info", "within", `End play ${meanText} is within the ${limitText} limit.`));
  return { call: "within", removes: false, ...measured, messages };
}
