// The field call: hand roll, end play, what can be seen and the detector, to keep or remove.

import type { EndPlayResult } from "./end-play";
import type { HandRollEvaluation } from "./hand-roll";
import type { FieldMessageLevel } from "./messages";
import { visualFindingDefinition, type VisualFinding } from "./visual-findings";

export type FieldCallSource = "hand-roll" | "end-play" | "visual" | "detector" | "safety";
export type FieldCallReason = { source: FieldCallSource; level: FieldMessageLevel; code: string; text: string };

export type FieldCallInput = {
  handRoll?: HandRollEvaluation;
  endPlay?: EndPlayResult;
  visual?: VisualFinding[];
  /** A wayside detector alarm confirmed (true) or not confirmed (false) on inspection. */
  waysideAlarmConfirmed?: boolean;
  /** False when the site policy lets this trigger keep without an end-play reading. Default true. */
  endPlayRequired?: boolean;
  /** Safety confirmations left unticked at filing: recorded with the call, never deciding it. */
  safetyUnconfirmed?: readonly { key: string; text: string }[];
};

export type FieldCall = { call: "remove" | "keep" | "undecided"; reasons: FieldCallReason[] };

const HAND_ROLL_BLOCK: Record<Exclude<HandRollEvaluation["result"], "keep" | "remove">, string> = {
  "not-valid": "The hand roll was not a valid check, so it cannot clear the bearing. Redo it by hand, in one direction, by feel.",
  incomplete: "The hand roll is not finished, so it cannot clear the bearing yet.",
};

function endPlayBlock(endPlay: EndPlayResult): string | null {
  if (endPlay.call === "incomplete") return "End play has no usable reading: measure it, or leave it out if it was not measured.";
  if (endPlay.call === "tight-remeasure") return "End play read zero on a free-turning bearing: measure it again before deciding.";
  if (endPlay.call === "tight-unknown") return "End play read zero: say whether the bearing turns easily by hand.";
  const has = (code: string) => endPlay.messages.some((m) => m.code === code);
  if (has("implausible-reading")) return "An end-play reading is more than a bearing can show: correct it or confirm it as typed.";
  if (has("not-seated")) return "Undecided — re-measure: the rollers were not seated before measuring.";
  if (endPlay.messages.some((m) => m.level === "error"))
    return "Some end-play trials could not be used: correct or delete them before deciding.";
  if (has("trial-over-limit")) return "Undecided — re-measure: a trial read over the end-play limit.";
  if (has("spread-too-large") || has("outlier-trial")) return "Undecided — re-measure: the trials do not agree.";
  if (has("seating-unstated")) return "Say whether the rollers were seated before measuring; until then end play cannot clear the bearing.";
  return null;
}

export function decideFieldCall(input: FieldCallInput): FieldCall {
  const reasons: FieldCallReason[] = [];
  const blockers: FieldCallReason[] = [];
  const add = (source: FieldCallSource, level: FieldMessageLevel, code: string, text: string) =>
    reasons.push({ source, level, code, text });

  if (input.waysideAlarmConfirmed === true) {
    add("detector", "remove", "alarm-confirmed", "A wayside detector alarm was confirmed on inspection: remove the wheelset from service.");
  } else if (input.waysideAlarmConfirmed === false) {
    add("detector", "info", "alarm-not-confirmed", "A wayside detector alarm was not confirmed on inspection.");
  }

  const { handRoll, endPlay } = input;
  if (handRoll) {
    for (const m of handRoll.messages) add("hand-roll", m.level, m.code, m.text);
    if (handRoll.result === "not-valid" || handRoll.result === "incomplete") {
      blockers.push({ source: "hand-roll", level: "warn", code: `hand-roll-${handRoll.result}`, text: HAND_ROLL_BLOCK[handRoll.result] });
    }
  } else {
    blockers.push({
      source: "hand-roll",
      level: "warn",
      code: "hand-roll-missing",
      text: "No hand roll is recorded; the bearing cannot be kept without one.",
    });
  }

  if (endPlay) {
    for (const m of endPlay.messages) add("end-play", m.level, m.code, m.text);
    const block = endPlayBlock(endPlay);
    if (block) blockers.push({ source: "end-play", level: "warn", code: "end-play-unsettled", text: block });
  } else if (input.endPlayRequired === false) {
    add(
      "end-play",
      "info",
      "end-play-not-measured",
      "End play was not measured; the site policy lets this trigger rest on the other checks.",
    );
  } else {
    blockers.push({
      source: "end-play",
      level: "warn",
      code: "end-play-not-measured",
      text: "End play was not measured, so the bearing cannot be kept on the other checks alone. Measure it.",
    });
  }

  for (const item of input.safetyUnconfirmed ?? []) {
    add("safety", "warn", `safety-unconfirmed-${item.key}`, `Not confirmed at filing: ${item.text}`);
  }

  for (const finding of input.visual ?? []) {
    const definition = visualFindingDefinition(finding.code);
    const note = finding.note?.trim() ? `: ${finding.note.trim()}` : "";
    if (definition.removes) {
      add("visual", "remove", finding.code, `${definition.label}${note}: remove the wheelset from service.`);
    } else {
      blockers.push({
        source: "visual",
        level: "warn",
        code: finding.code,
        text: `${definition.label}${note}. Judge this finding by the employer's procedures and interchange rules; it is not decided here.`,
      });
    }
  }

  if (reasons.some((r) => r.level === "remove")) return { call: "remove", reasons: [...reasons, ...blockers] };
  if (blockers.length > 0) return { call: "undecided", reasons: [...reasons, ...blockers] };
  return { call: "keep", reasons };
}
