// Switching the unit of end-play entry: the person chooses to convert the numbers or to read them in the new unit.
// Never silently: 0.070 typed in inches must not quietly become 0.070 mm (0.0028 in).

import type { EndPlayTrialInput, LengthUnit } from "./end-play-trials";
import { inToMm, mmToIn, parseLength, roundTo } from "./units";

export type UnitSwitch = "convert" | "reinterpret";

/** Decimals kept when converting: a dial reads 0.0001 in at best, 0.001 mm in metric (common practice). */
const DECIMALS: Record<LengthUnit, number> = { in: 4, mm: 3 };

/** One typed value in the new unit; text that is empty or unreadable is left as typed for the person to fix. */
export function convertLengthText(value: number | string | undefined, from: LengthUnit, to: LengthUnit): number | string | undefined {
  if (value === undefined || from === to || String(value).trim() === "") return value;
  const parsed = parseLength(value);
  if (!parsed.ok) return value;
  const converted = to === "mm" ? inToMm(parsed.value) : mmToIn(parsed.value);
  return String(roundTo(converted, DECIMALS[to]));
}

/** Does switching need the question at all? Only when some trial holds a number. */
export function unitSwitchNeedsChoice(trials: readonly EndPlayTrialInput[]): boolean {
  return trials.some(
    (t) => String(t.reading ?? "").trim() !== "" || (t.zero !== undefined && String(t.zero).trim() !== "" && Number(t.zero) !== 0),
  );
}

export function switchTrialUnit(
  trials: readonly EndPlayTrialInput[],
  from: LengthUnit,
  to: LengthUnit,
  how: UnitSwitch,
): EndPlayTrialInput[] {
  if (how === "reinterpret") return trials.map((t) => ({ ...t }));
  return trials.map((t) => ({ ...t, zero: convertLengthText(t.zero, from, to), reading: convertLengthText(t.reading, from, to) ?? "" }));
}
