import { describe, expect, it } from "vitest";
import {
  AXLE_POSITIONS,
  decideFieldCall,
  evaluateEndPlay,
  evaluateHandRoll,
  VISUAL_FINDINGS,
  type FieldCall,
  type HandRollGrid,
  type HandRollProcedure,
} from "@/lib/field";

const proper: HandRollProcedure = { turnedBy: "hand", oneDirection: true, judgedBy: "feel" };
function smoothGrid(): HandRollGrid {
  const g: HandRollGrid = {};
  // Two full revolutions each way (common practice), entered by the person, never assumed.
  for (const p of AXLE_POSITIONS) g[p] = { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } };
  return g;
}
const cleanRoll = () => evaluateHandRoll(smoothGrid(), proper);
const roughRoll = () => {
  const g = smoothGrid();
  g[240]!.push = { feel: "catch", revolutions: 2 };
  return evaluateHandRoll(g, proper);
};
const dial = (inches: number, turnsByHand?: boolean) =>
  evaluateEndPlay({ method: "dial", unit: "in", trials: [{ zero: 0, reading: inches }], turnsByHand, rollersSeated: true });
const codes = (c: FieldCall) => c.reasons.map((r) => r.code);
const removing = (c: FieldCall) => c.reasons.filter((r) => r.level === "remove").map((r) => r.source);

describe("keep", () => {
  it("keeps with a clean valid hand roll and end play within the limit", () => {
    // common practice: 0.0625 in is not more than 1/16 in
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0.0625), visual: [] });
    expect(c.call).toBe("keep");
    expect(c.reasons.map((r) => r.source)).toEqual(["hand-roll", "end-play"]);
  });

  it("keeps without end play only where the site policy says this trigger does not need it", () => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlayRequired: false });
    expect(c.call).toBe("keep");
    expect(c.reasons.find((r) => r.code === "end-play-not-measured")).toMatchObject({ source: "end-play", level: "info" });
  });

  it("notes an alarm not confirmed without removing", () => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0.02), waysideAlarmConfirmed: false });
    expect(c.call).toBe("keep");
    expect(c.reasons.find((r) => r.source === "detector")?.level).toBe("info");
  });
});

describe("remove", () => {
  it("removes on roughness felt on a valid hand roll", () => {
    const c = decideFieldCall({ handRoll: roughRoll(), endPlay: dial(0.02) });
    expect(c.call).toBe("remove");
    expect(removing(c)).toEqual(["hand-roll"]);
    expect(c.reasons.find((r) => r.level === "remove")?.text).toContain("240° push");
  });

  it("removes on end play over the limit", () => {
    // common practice: more than 1/16 in removes
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0.0626) });
    expect(c.call).toBe("remove");
    expect(removing(c)).toEqual(["end-play"]);
  });

  it("removes on zero end play that will not turn by hand", () => {
    expect(decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0, false) }).call).toBe("remove");
  });

  it.each(VISUAL_FINDINGS.filter((f) => f.removes).map((f) => f.code))("removes on the visual finding %s", (code) => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0.02), visual: [{ code, note: " at 3 o'clock " }] });
    expect(c.call).toBe("remove");
    const reason = c.reasons.find((r) => r.source === "visual");
    expect(reason?.level).toBe("remove");
    expect(reason?.text).toContain(": at 3 o'clock: remove");
  });

  it("removes on a confirmed wayside alarm", () => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0.02), waysideAlarmConfirmed: true });
    expect(c.call).toBe("remove");
    expect(removing(c)).toEqual(["detector"]);
  });

  it("removes on a visual finding even when the hand roll is not valid, and still says why it was not", () => {
    const handRoll = evaluateHandRoll(smoothGrid(), { ...proper, turnedBy: "foot" });
    const c = decideFieldCall({ handRoll, visual: [{ code: "cap-screw-missing" }] });
    expect(c.call).toBe("remove");
    expect(codes(c)).toEqual(expect.arrayContaining(["turned-by-foot", "hand-roll-not-valid", "cap-screw-missing"]));
  });
});

describe("undecided", () => {
  it("when the hand roll is not a valid check", () => {
    const handRoll = evaluateHandRoll(smoothGrid(), { ...proper, judgedBy: "ear" });
    const c = decideFieldCall({ handRoll, endPlay: dial(0.02) });
    expect(c.call).toBe("undecided");
    expect(codes(c)).toContain("hand-roll-not-valid");
  });

  it("when the hand roll is incomplete or missing", () => {
    const g = smoothGrid();
    delete g[0];
    expect(decideFieldCall({ handRoll: evaluateHandRoll(g, proper), endPlay: dial(0.02) }).call).toBe("undecided");
    const none = decideFieldCall({ endPlay: dial(0.02) });
    expect(none.call).toBe("undecided");
    expect(codes(none)).toContain("hand-roll-missing");
  });

  it.each([
    ["no usable trial", evaluateEndPlay({ method: "dial", unit: "in", trials: [{ reading: "?" }] })],
    ["zero end play, turns freely", dial(0, true)],
    ["zero end play, turning not stated", dial(0)],
    ["a trial that could not be read", evaluateEndPlay({ method: "dial", unit: "in", trials: [{ reading: 0.02 }, { reading: "x" }] })],
    ["a trial over the limit", evaluateEndPlay({ method: "dial", unit: "in", trials: [{ reading: 0.0615 }, { reading: 0.0635 }] })],
  ])("when end play is not settled: %s", (_label, endPlay) => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay });
    expect(c.call).toBe("undecided");
    expect(c.reasons.find((r) => r.code === "end-play-unsettled")?.source).toBe("end-play");
  });

  it("when an 'other' visual finding needs a person's judgement", () => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0.02), visual: [{ code: "other", note: "paint on cup" }] });
    expect(c.call).toBe("undecided");
    expect(c.reasons.find((r) => r.source === "visual")?.text).toContain("Other (describe): paint on cup");
  });
});

describe("undecided until the shop floor has settled it", () => {
  const seated = (trials: { reading: number | string }[], more: Record<string, unknown> = {}) =>
    evaluateEndPlay({ method: "dial", unit: "in", trials, rollersSeated: true, ...more });

  it("a re-measure outcome is never keep: trials that do not agree", () => {
    // common practice: a dial should repeat to about 0.002 in; 0.010 and 0.030 do not agree
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: seated([{ reading: 0.01 }, { reading: 0.03 }]) });
    expect(c.call).toBe("undecided");
    expect(c.reasons.find((r) => r.code === "end-play-unsettled")?.text).toMatch(/^Undecided — re-measure/);
  });

  it("a re-measure outcome is never keep: zero end play on a free-turning bearing", () => {
    const c = decideFieldCall({ handRoll: cleanRoll(), endPlay: dial(0, true) });
    expect(c.call).toBe("undecided");
  });

  it("no end play measured is undecided by default", () => {
    const c = decideFieldCall({ handRoll: cleanRoll() });
    expect(c.call).toBe("undecided");
    expect(c.reasons.find((r) => r.code === "end-play-not-measured")).toMatchObject({ source: "end-play", level: "warn" });
  });

  it("rollers not seated before measuring: the reading is not valid, even over the limit", () => {
    // common practice: turn the bearing so the rollers seat, then measure
    const notSeated = evaluateEndPlay({ method: "dial", unit: "in", trials: [{ reading: 0.09 }], rollersSeated: false });
    expect(notSeated.call).toBe("incomplete");
    expect(notSeated.messages[0].code).toBe("not-seated");
    expect(decideFieldCall({ handRoll: cleanRoll(), endPlay: notSeated }).call).toBe("undecided");
  });

  it("seating not stated: end play cannot clear the bearing, but an over-limit reading still removes", () => {
    const unstated = (r: number) => evaluateEndPlay({ method: "dial", unit: "in", trials: [{ reading: r }] });
    expect(decideFieldCall({ handRoll: cleanRoll(), endPlay: unstated(0.02) }).call).toBe("undecided");
    // common practice: more than 1/16 in (0.0625 in) removes
    expect(decideFieldCall({ handRoll: cleanRoll(), endPlay: unstated(0.07) }).call).toBe("remove");
  });

  it("revolutions must be entered: a smooth roll with no count is incomplete", () => {
    const g: HandRollGrid = {};
    for (const p of AXLE_POSITIONS) g[p] = { pull: { feel: "smooth" }, push: { feel: "smooth" } };
    const roll = evaluateHandRoll(g, proper);
    expect(roll.result).toBe("incomplete");
    expect(roll.messages.find((m) => m.code === "revolutions-missing")?.text).toContain("0° pull");
    expect(decideFieldCall({ handRoll: roll, endPlay: dial(0.02) }).call).toBe("undecided");
  });

  it("unticked safety confirmations are recorded with the call but do not decide it", () => {
    const c = decideFieldCall({
      handRoll: cleanRoll(),
      endPlay: dial(0.02),
      safetyUnconfirmed: [{ key: "blueSignal", text: "blue-signal protection is in place" }],
    });
    expect(c.call).toBe("keep");
    expect(c.reasons.find((r) => r.source === "safety")).toMatchObject({ level: "warn", code: "safety-unconfirmed-blueSignal" });
  });
});

describe("visual finding list", () => {
  it("has a plain label for each code, with only 'other' left to judgement", () => {
    expect(VISUAL_FINDINGS.map((f) => f.code)).toEqual([
      "welding-damage",
      "cap-screw-loose",
      "cap-screw-missing",
      "seal-damaged",
      "grease-loss",
      "backing-ring-loose",
      "cup-cracked",
      "heat-discoloration",
      "water",
      "other",
    ]);
    expect(VISUAL_FINDINGS.filter((f) => !f.removes).map((f) => f.code)).toEqual(["other"]);
    for (const f of VISUAL_FINDINGS) expect(f.label.length).toBeGreaterThan(3);
  });

  it("refuses an unknown code", () => {
    // @ts-expect-error: not a visual finding code
    expect(() => decideFieldCall({ handRoll: cleanRoll(), visual: [{ code: "dent" }] })).toThrow(RangeError);
  });
});
