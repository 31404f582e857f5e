// Hand roll: 3 axle positions × cup pulled/pushed, each turned two full revolutions by hand.

import { listInWords, message, type FieldMessage } from "./messages";

export const AXLE_POSITIONS = [0, 120, 240] as const;
export type AxlePosition = (typeof AXLE_POSITIONS)[number];

/** "pull" = cup pulled outboard; "push" = cup pushed inboard. */
export const ROLL_DIRECTIONS = ["pull", "push"] as const;
export type RollDirection = (typeof ROLL_DIRECTIONS)[number];

export type HandRollFeel = "smooth" | "stiff" | "rough" | "catch";
export type HandRollCell = { feel: HandRollFeel | null; revolutions?: number };
export type HandRollGrid = { [P in AxlePosition]?: { [D in RollDirection]?: HandRollCell } };

export type HandRollProcedure = {
  turnedBy: "hand" | "foot";
  /** false = oscillated back and forth. */
  oneDirection: boolean;
  judgedBy: "feel" | "ear";
};

export type HandRollEvaluation = {
  /** The procedure is fully stated and has no fault. */
  valid: boolean;
  /** Every cell has a feel and an entered count of at least two revolutions. */
  complete: boolean;
  result: "remove" | "keep" | "not-valid" | "incomplete";
  messages: FieldMessage[];
};

/** The procedure turns each cell two full revolutions (common practice). */
export const REQUIRED_REVOLUTIONS = 2;

export function cellName(position: AxlePosition, direction: RollDirection): string {
  return `${position}° ${direction}`;
}

function procedureMessages(procedure: Partial<HandRollProcedure>): { faults: FieldMessage[]; unstated: string[] } {
  const faults: FieldMessage[] = [];
  const unstated: string[] = [];
  if (procedure.turnedBy === "foot") {
    faults.push(message("error", "turned-by-foot", "Turned by foot: a foot cannot feel roughness or a catch. Turn the bearing by hand."));
  } else if (procedure.turnedBy === undefined) unstated.push("whether it was turned by hand");
  if (procedure.oneDirection === false) {
    faults.push(
      message(
        "error",
        "oscillated",
        "Oscillated back and forth: unloaded rollers click as they reverse and mislead. Turn in one direction only.",
      ),
    );
  } else if (procedure.oneDirection === undefined) unstated.push("whether it was turned in one direction");
  if (procedure.judgedBy === "ear") {
    faults.push(message("error", "judged-by-ear", "Judged by ear: sounds mislead. Judge by the feel in your hands."));
  } else if (procedure.judgedBy === undefined) unstated.push("whether it was judged by feel");
  return { faults, unstated };
}

export function evaluateHandRoll(grid: HandRollGrid, procedure: Partial<HandRollProcedure>): HandRollEvaluation {
  const { faults, unstated } = procedureMessages(procedure);
  const messages: FieldMessage[] = [...faults];
  const missing: string[] = [];
  const short: string[] = [];
  const uncounted: string[] = [];
  const rough: string[] = [];
  const stiff: string[] = [];
  let badCount = false;

  for (const position of AXLE_POSITIONS) {
    for (const direction of ROLL_DIRECTIONS) {
      const name = cellName(position, direction);
      const cell = grid[position]?.[direction];
      if (!cell || cell.feel === null || cell.feel === undefined) missing.push(name);
      else if (cell.feel === "rough" || cell.feel === "catch") rough.push(`${name} (${cell.feel})`);
      else if (cell.feel === "stiff") stiff.push(name);
      const revolutions = cell?.revolutions;
      if (revolutions === undefined || revolutions === null) {
        // Two full turns are confirmed by entering them, never assumed.
        if (cell?.feel) uncounted.push(name);
        continue;
      }
      if (!Number.isFinite(revolutions) || revolutions < 0) {
        badCount = true;
        messages.push(message("error", "revolutions-invalid", `${name}: the number of revolutions must be zero or more.`));
      } else if (revolutions < REQUIRED_REVOLUTIONS) short.push(name);
    }
  }

  if (unstated.length > 0) {
    messages.push(message("warn", "procedure-unstated", `Confirm how the check was done: ${listInWords(unstated)}.`));
  }
  if (missing.length > 0) {
    messages.push(
      message("warn", "cells-missing", `Not yet checked: ${listInWords(missing)}. Each axle position needs the cup pulled and pushed.`),
    );
  }
  if (short.length > 0) {
    messages.push(
      message(
        "warn",
        "too-few-revolutions",
        `Fewer than two full revolutions at ${listInWords(short)}. Turn two full revolutions each way.`,
      ),
    );
  }
  if (uncounted.length > 0) {
    messages.push(message("warn", "revolutions-missing", `Enter the revolutions turned at ${listInWords(uncounted)}.`));
  }
  const complete = missing.length === 0 && short.length === 0 && uncounted.length === 0 && !badCount;
  const valid = faults.length === 0 && unstated.length === 0;
  const roughText = listInWords(rough);

  if (faults.length > 0) {
    if (rough.length > 0) {
      messages.push(
        message(
          "warn",
          "recheck-roughness",
          `Roughness was reported at ${roughText}, but the check was not done properly. Re-check by hand, one direction, by feel, before deciding.`,
        ),
      );
    }
    return { valid, complete, result: "not-valid", messages };
  }
  if (rough.length > 0 && valid) {
    messages.unshift(message("remove", "rough", `Roughness or a catch felt at ${roughText}: remove the wheelset from service.`));
    return { valid, complete, result: "remove", messages };
  }
  if (rough.length > 0) {
    messages.push(
      message(
        "warn",
        "recheck-roughness",
        `Roughness was reported at ${roughText}. Confirm the check was done by hand, one direction, by feel, to settle it.`,
      ),
    );
  }
  if (stiff.length > 0 && rough.length === 0) {
    messages.push(
      message("info", "stiff-only", `Stiff at ${listInWords(stiff)}: stiff turning on a cold day or from seal drag alone is not damage.`),
    );
  }
  if (!valid || !complete) return { valid, complete, result: "incomplete", messages };
  messages.unshift(
    message("info", "hand-roll-clear", "No roughness or catch felt at any of the three axle positions, cup pulled and pushed."),
  );
  return { valid, complete, result: "keep", messages };
}
