// The pieces of a field check as a mechanic records them: hand-roll grid, end-play trials, procedure.
import type { FieldChecks } from "../../lib/cases/schemas";
import type { Rng } from "./prng";

type HandRoll = NonNullable<FieldChecks["handRoll"]>;
type EndPlay = NonNullable<FieldChecks["endPlay"]>;
type Feel = "smooth" | "stiff" | "rough" | "catch";

const CELLS = [
  ["0", "pull"],
  ["0", "push"],
  ["120", "pull"],
  ["120", "push"],
  ["240", "pull"],
  ["240", "push"],
] as const;

export type GridPlan = { rough?: number; feel?: "rough" | "catch" | "both"; stiff?: number; checkedPositions?: number };

/** Six cells (3 axle positions × cup pulled/pushed); `rough` of them rough or catching, `stiff` stiff. */
export function handRollGrid(rng: Rng, plan: GridPlan = {}): HandRoll["grid"] {
  const { rough = 0, feel = "rough", stiff = 0, checkedPositions = 3 } = plan;
  const order = rng.shuffle(CELLS.slice(0, checkedPositions * 2));
  const feels = new Map<string, Feel>();
  order.forEach(([pos, dir], i) => {
    const bad: Feel = feel === "both" ? (i % 2 === 0 ? "rough" : "catch") : feel;
    feels.set(`${pos}/${dir}`, i < rough ? bad : i < rough + stiff ? "stiff" : "smooth");
  });
  const grid: HandRoll["grid"] = {};
  for (const [pos, dir] of CELLS) {
    const f = feels.get(`${pos}/${dir}`);
    if (!f) continue;
    grid[pos] = { ...grid[pos], [dir]: { feel: f, revolutions: rng.chance(0.88) ? 2 : 3 } };
  }
  return grid;
}

export type ProcedureFault = "oscillated" | "ear" | "foot";

export function procedure(fault?: ProcedureFault): HandRoll["procedure"] {
  return { turnedBy: fault === "foot" ? "foot" : "hand", oneDirection: fault !== "oscillated", judgedBy: fault === "ear" ? "ear" : "feel" };
}

const round = (x: number, places: number) => Number(x.toFixed(places));
const SIXTY_FOURTHS = ["0", "1/64", "1/32", "3/64", "1/16", "5/64", "3/32", "7/64", "1/8"];

export type EndPlayStyle = "dial-in" | "dial-mm" | "tape";

/**
 * Trials around `targetIn`, repeating as well as the instrument does (dial within 0.002 in,
 * tape within one 1/64 graduation, common practice).
 */
export function endPlayTrials(rng: Rng, targetIn: number, style: EndPlayStyle): EndPlay {
  const count = rng.weighted([
    [2, 30],
    [3, 60],
    [4, 10],
  ]);
  if (style === "tape") {
    // Over the limit on a tape means 5/64 or more; a graduation up now and then is normal.
    const over = targetIn > 0.0625;
    const base = over ? Math.max(5, Math.min(7, Math.round(targetIn * 64))) : Math.max(1, Math.min(3, Math.round(targetIn * 64)));
    const trials = Array.from({ length: count }, () => ({ reading: SIXTY_FOURTHS[base + (over && rng.chance(0.25) ? 1 : 0)] }));
    return { method: "tape", unit: "in", trials, rollersSeated: true };
  }
  if (style === "dial-mm") {
    const baseMm = targetIn * 25.4;
    const trials = Array.from({ length: count }, () => ({ zero: 0, reading: round(baseMm + rng.real(-0.015, 0.015), 2) }));
    return { method: "dial", unit: "mm", trials, rollersSeated: true };
  }
  // A mechanic sometimes zeroes the dial off zero and subtracts.
  const zero = rng.chance(0.25) ? round(rng.real(0.005, 0.02), 3) : 0;
  const trials = Array.from({ length: count }, () => ({ zero, reading: round(zero + targetIn + rng.real(-0.0007, 0.0007), 3) }));
  return { method: "dial", unit: "in", trials, rollersSeated: true };
}

/** Zero end play on a bearing that will not turn by hand. */
export function tightEndPlay(rng: Rng): EndPlay {
  return {
    method: "dial",
    unit: "in",
    trials: Array.from({ length: rng.int(2, 3) }, () => ({ zero: 0, reading: 0 })),
    turnsByHand: false,
    rollersSeated: true,
  };
}
