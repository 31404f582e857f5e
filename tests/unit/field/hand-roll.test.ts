import { describe, expect, it } from "vitest";
import {
  AXLE_POSITIONS,
  evaluateHandRoll,
  ROLL_DIRECTIONS,
  type HandRollCell,
  type HandRollGrid,
  type HandRollProcedure,
} from "@/lib/field";

// The procedure (common practice): by hand, one direction, by feel; 3 axle positions
// 120° apart × cup pulled and pushed; two full revolutions each.
const proper: HandRollProcedure = { turnedBy: "hand", oneDirection: true, judgedBy: "feel" };

function grid(fill: HandRollCell = { feel: "smooth", revolutions: 2 }): HandRollGrid {
  const g: HandRollGrid = {};
  for (const p of AXLE_POSITIONS) g[p] = { pull: { ...fill }, push: { ...fill } };
  return g;
}
const codes = (r: { messages: { code: string }[] }) => r.messages.map((m) => m.code);

describe("hand roll, proper procedure", () => {
  it("has six cells: 0°, 120°, 240° × pull, push", () => {
    expect(AXLE_POSITIONS).toEqual([0, 120, 240]);
    expect(ROLL_DIRECTIONS).toEqual(["pull", "push"]);
  });

  it("keeps when all six cells are smooth", () => {
    const r = evaluateHandRoll(grid(), proper);
    expect(r).toMatchObject({ valid: true, complete: true, result: "keep" });
    expect(codes(r)).toEqual(["hand-roll-clear"]);
  });

  it("removes on roughness or a catch, naming the cells", () => {
    const g = grid();
    g[120]!.push = { feel: "rough", revolutions: 2 };
    g[240]!.pull = { feel: "catch" };
    const r = evaluateHandRoll(g, proper);
    expect(r.result).toBe("remove");
    expect(r.messages[0]).toMatchObject({ level: "remove", code: "rough" });
    expect(r.messages[0].text).toContain("120° push (rough) and 240° pull (catch)");
  });

  it("removes on roughness even when other cells are missing", () => {
    const g: HandRollGrid = { 0: { pull: { feel: "catch" } } };
    const r = evaluateHandRoll(g, proper);
    expect(r).toMatchObject({ result: "remove", complete: false });
  });

  it("says stiff turning alone is not damage, and keeps", () => {
    const g = grid();
    g[0]!.pull = { feel: "stiff", revolutions: 2 };
    const r = evaluateHandRoll(g, proper);
    expect(r.result).toBe("keep");
    const info = r.messages.find((m) => m.code === "stiff-only");
    expect(info?.level).toBe("info");
    expect(info?.text).toContain("cold day or from seal drag alone is not damage");
  });

  it("is incomplete with cells missing, naming them", () => {
    const g = grid();
    delete g[120]!.push;
    g[240]!.pull = { feel: null };
    const r = evaluateHandRoll(g, proper);
    expect(r).toMatchObject({ valid: true, complete: false, result: "incomplete" });
    expect(r.messages.find((m) => m.code === "cells-missing")?.text).toContain("120° push and 240° pull");
  });

  it("is incomplete with fewer than two revolutions in a cell, naming it", () => {
    const g = grid();
    g[0]!.push = { feel: "smooth", revolutions: 1.5 };
    const r = evaluateHandRoll(g, proper);
    expect(r.result).toBe("incomplete");
    const warn = r.messages.find((m) => m.code === "too-few-revolutions");
    expect(warn?.level).toBe("warn");
    expect(warn?.text).toContain("0° push");
  });

  it("refuses a negative revolution count", () => {
    const g = grid();
    g[0]!.pull = { feel: "smooth", revolutions: -1 };
    const r = evaluateHandRoll(g, proper);
    expect(r.result).toBe("incomplete");
    expect(r.messages.find((m) => m.code === "revolutions-invalid")?.level).toBe("error");
  });
});

describe("hand roll done the wrong way", () => {
  it.each([
    [{ turnedBy: "foot" }, "turned-by-foot", /cannot feel/],
    [{ oneDirection: false }, "oscillated", /click as they reverse/],
    [{ judgedBy: "ear" }, "judged-by-ear", /mislead/],
  ] as const)("%o is not a valid check", (fault, code, why) => {
    const r = evaluateHandRoll(grid(), { ...proper, ...fault });
    expect(r).toMatchObject({ valid: false, result: "not-valid" });
    const m = r.messages.find((x) => x.code === code);
    expect(m?.level).toBe("error");
    expect(m?.text).toMatch(why);
  });

  it("gives each fault its own message", () => {
    const r = evaluateHandRoll(grid(), { turnedBy: "foot", oneDirection: false, judgedBy: "ear" });
    expect(codes(r)).toEqual(["turned-by-foot", "oscillated", "judged-by-ear"]);
  });

  it("asks for a proper re-check of roughness felt on an invalid check, not a keep or removal", () => {
    const g = grid();
    g[0]!.pull = { feel: "rough" };
    const r = evaluateHandRoll(g, { ...proper, oneDirection: false });
    expect(r.result).toBe("not-valid");
    expect(codes(r)).not.toContain("rough");
    expect(r.messages.find((m) => m.code === "recheck-roughness")?.text).toMatch(/0° pull.*Re-check/);
  });

  it("is incomplete while the procedure is not stated, and does not remove on roughness yet", () => {
    const g = grid();
    g[0]!.pull = { feel: "rough" };
    const r = evaluateHandRoll(g, { turnedBy: "hand" });
    expect(r).toMatchObject({ valid: false, result: "incomplete" });
    expect(r.messages.find((m) => m.code === "procedure-unstated")?.text).toMatch(/one direction.*by feel/);
    expect(codes(r)).toContain("recheck-roughness");
    expect(evaluateHandRoll(grid(), {}).result).toBe("incomplete");
  });
});
