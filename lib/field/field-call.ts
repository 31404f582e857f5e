// The field call: hand roll, end play, what can be seen and the detector, to keep or remove.

import type { EndPlayResult } from "./end-play";
import type { HandRollEvaluation } from "./hand-roll";
import type { FieldMessageLevel } from "./messages";
import { visualFindingDefinition, type VisualFinding } from "./visual-findings";

export type FieldCallSource = "hand-roll" | "end-play" | "visual" | "detector";
export type FieldCallReason = { source: FieldCallSource; level: FieldMessageLevel; code: string; text: string };

export type FieldCallInput = {
  handRoll?: HandRollEvaluation;
  endPlay?: EndPlayResult;
  visual?: VisualFinding[];
  /** A wayside detector alarm confirmed (true) or not confirmed (false) on inspection. */
  waysideAlarmConfirmed?: boolean;
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
  if (endPlay.messages.some((m) => m.level === "error")) return "Some end-play trials could not be used: correct or delete them before deciding.";
  if (endPlay.messages.some((m) => m.code === "trial-over-limit")) return "A trial read over the end-play limit: re-measure before keeping the bearing.";
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
    blockers.push({ source: "hand-roll", level: "warn", code: "hand-roll-missing", text: "No hand roll is recorded; the bearing cannot be kept without one." });
  }

  if (endPlay) {
    for (const m of endPlay.messages) add("end-play", m.level, m.code, m.text);
    const block = endPlayBlock(endPlay);
    if (block) blockers.push({ source: "end-play", level: "warn", code: "end-play-unsettled", text: block });
  } else {
    add("end-play", "warn", "end-play-not-measured", "End play was not measured; the call rests on the other checks.");
  }

  for (const finding of input.visual ?? []) {
    const definition = visualFindingDefinition(finding.code);
    const note = finding.note?.trim() ? `: ${finding.note.trim()}` : "";
    if (definition.removes) {
      add("visual", "remove", finding.code, `${definition.label}${note}: remove the wheelset from service.`);
    } else {
      blockers.push({ source: "visual", level: "warn", code: finding.code, text: `${definition.label}${note}. Judge this finding by the employer's procedures and interchange rules; it is not decided here.` });
    }
  }

  if (reasons.some((r) => r.level === "remove")) return { call: "remove", reasons: [...reasons, ...blockers] };
  if (blockers.length > 0) return { call: "undecided", reasons: [...reasons, ...blockers] };
  return { call: "keep", reasons };
}
