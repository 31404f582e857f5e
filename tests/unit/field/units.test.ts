import { describe, expect, it } from "vitest";
import checkValues from "@/tests/fixtures/field-check-values.json";
import { formatInches, formatMm, inToMm, MM_PER_IN, mmToIn, nearestSixtyFourth, parseLength } from "@/lib/field/units";

function value(text: string | number): number {
  const parsed = parseLength(text);
  if (!parsed.ok) throw new Error(parsed.error);
  return parsed.value;
}

describe("inch and millimetre conversion", () => {
  it("uses 25.4 mm per inch exactly", () => {
    expect(MM_PER_IN).toBe(checkValues.units.in_to_mm); // NIST SP 811: 1 in = 25.4 mm exactly
  });

  it.each(checkValues.units.cases)("converts $in in to $mm mm", ({ in: inches, mm }) => {
    // field-check-values.json units.cases: 1 in = 25.4 mm exactly (NIST SP 811)
    expect(inToMm(value(inches))).toBeCloseTo(mm, 12);
    expect(mmToIn(mm)).toBeCloseTo(value(inches), 12);
  });

  it("gives 1/16 in = 0.0625 in = 1.5875 mm", () => {
    expect(value("1/16")).toBe(0.0625); // arithmetic: 1 ÷ 16
    expect(inToMm(0.0625)).toBe(1.5875); // NIST SP 811: 0.0625 × 25.4 = 1.5875 exactly
  });
});

describe("parseLength", () => {
  it("reads decimals, with a point or a comma", () => {
    expect(value("0.031")).toBe(0.031);
    expect(value(".031")).toBe(0.031);
    expect(value("0,8")).toBe(0.8);
    expect(value(" 12 ")).toBe(12);
    expect(value(0.02)).toBe(0.02);
    expect(value("-0.002")).toBe(-0.002);
  });

  it("reads tape fractions and mixed numbers", () => {
    expect(value("3/64")).toBe(3 / 64); // arithmetic: 0.046875
    expect(value("1 1/16")).toBe(1.0625); // arithmetic: 1 + 1/16
    expect(value("1-1/16")).toBe(1.0625); // arithmetic: 1 + 1/16
  });

  it.each(["", "abc", "1/0", "0.03 in", "1 5/4", "1..2", "1,2,3"])("refuses %j with a message", (text) => {
    const parsed = parseLength(text);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.error.length).toBeGreaterThan(10);
  });

  it("refuses a number that is not finite", () => {
    expect(parseLength(Number.NaN).ok).toBe(false);
    expect(parseLength(Number.POSITIVE_INFINITY).ok).toBe(false);
  });
});

describe("display", () => {
  it("shows inches to 4 decimals and millimetres to 3, rounding half away from zero", () => {
    expect(formatInches(0.0625)).toBe("0.0625 in");
    expect(formatInches(0.03125)).toBe("0.0313 in"); // 1/32 in = 0.03125 (arithmetic)
    expect(formatMm(1.5875)).toBe("1.588 mm"); // 1/16 in in mm (NIST SP 811), rounded
    expect(formatMm(0.0254)).toBe("0.025 mm");
    expect(formatInches(1e-7)).toBe("0.0000 in");
  });

  it("shows the nearest sixty-fourth, reduced, as on a tape", () => {
    expect(nearestSixtyFourth(3 / 64)).toBe("3/64 in");
    expect(nearestSixtyFourth(0.0625)).toBe("1/16 in"); // 4/64 reduces to 1/16 (arithmetic)
    expect(nearestSixtyFourth(0.047)).toBe("3/64 in"); // 0.047 × 64 = 3.008 (arithmetic)
    expect(nearestSixtyFourth(1.03125)).toBe("1 1/32 in");
    expect(nearestSixtyFourth(2)).toBe("2 in");
    expect(nearestSixtyFourth(0.001)).toBe("0 in");
    expect(nearestSixtyFourth(-0.5)).toBe("-1/2 in");
  });
});
