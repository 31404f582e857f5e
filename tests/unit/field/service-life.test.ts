import { describe, expect, it } from "vitest";
import checkValues from "@/tests/fixtures/field-check-values.json";
import { basicRatingLifeL10, DAYS_PER_MEAN_MONTH, l10Miles, monthsBetween, wheelRevolutions, wheelRevolutionsPerMile } from "@/lib/field";

const iso = checkValues.iso281;
const rel = (got: number, expected: number) => Math.abs(got - expected) / Math.abs(expected);

describe("months in service", () => {
  it("uses the mean Gregorian month", () => {
    expect(DAYS_PER_MEAN_MONTH).toBe(365.2425 / 12); // arithmetic: Gregorian year / 12
  });

  it("counts a 400-year Gregorian cycle as exactly 4800 months", () => {
    // arithmetic: the Gregorian cycle has 146 097 days = 400 × 365.2425
    expect(monthsBetween("2000-01-01", "2400-01-01")).toBeCloseTo(4800, 9);
  });

  it("counts days between dates, leap days included", () => {
    expect(monthsBetween("2024-02-01", "2024-03-01")).toBeCloseTo(29 / 30.436875, 12); // 2024 is a leap year (calendar)
    expect(monthsBetween("2023-06-15", "2023-06-15")).toBe(0);
  });

  it.each([
    ["2023-02-30", "2024-01-01", /not a real calendar date/],
    ["2023/01/01", "2024-01-01", /YYYY-MM-DD/],
    ["2024-01-02", "2024-01-01", /before date mounted/],
  ])("refuses %s → %s", (mounted, removed, why) => {
    expect(() => monthsBetween(mounted, removed)).toThrow(RangeError);
    expect(() => monthsBetween(mounted, removed)).toThrow(why);
  });
});

describe("wheel revolutions", () => {
  it("gives about 560.2 revolutions per mile on a 36 in wheel", () => {
    // arithmetic: 63 360 / (π × 36) = 560.2253…
    expect(wheelRevolutionsPerMile(36)).toBeCloseTo(560.2254, 4);
  });

  it.each(iso.wheels)("matches the check value for a $diameter_in in wheel", (wheel) => {
    // field-check-values.json iso281.wheels (arithmetic)
    expect(rel(wheelRevolutionsPerMile(wheel.diameter_in), wheel.rev_per_mile)).toBeLessThan(iso.rel_tol);
    expect(rel(wheelRevolutions(1000, wheel.diameter_in), 1000 * wheel.rev_per_mile)).toBeLessThan(iso.rel_tol);
  });

  it.each([() => wheelRevolutionsPerMile(0), () => wheelRevolutionsPerMile(Number.NaN), () => wheelRevolutions(-1, 36)])(
    "refuses a non-positive input (%#)",
    (call) => {
      expect(call).toThrow(RangeError);
    },
  );
});

describe("ISO 281 basic rating life", () => {
  it("gives 10.0794 million revolutions for a roller bearing at C/P = 2", () => {
    // ISO 281:2007 L10 = (C/P)^(10/3); arithmetic: 2^(10/3) = 10.0794
    expect(basicRatingLifeL10(2, 1, "roller")).toBeCloseTo(10.0794, 4);
    expect(basicRatingLifeL10(2, 1, "ball")).toBe(8); // ISO 281:2007, exponent 3: 2³
  });

  it("matches the check values for C = 500 kN, P = 60 kN", () => {
    // field-check-values.json iso281 (ISO 281:2007 formula, arithmetic)
    expect(rel(basicRatingLifeL10(iso.C_kN, iso.P_kN, "roller"), iso.L10_Mrev_roller)).toBeLessThan(iso.rel_tol);
    expect(rel(basicRatingLifeL10(iso.C_kN, iso.P_kN, "ball"), iso.L10_Mrev_ball)).toBeLessThan(iso.rel_tol);
  });

  it.each(iso.wheels)("converts L10 to miles on a $diameter_in in wheel", (wheel) => {
    // field-check-values.json iso281.wheels (arithmetic)
    expect(rel(l10Miles(iso.L10_Mrev_roller, wheel.diameter_in), wheel.L10_miles_roller)).toBeLessThan(iso.rel_tol);
  });

  it("refuses non-positive loads and lives", () => {
    expect(() => basicRatingLifeL10(0, 60, "roller")).toThrow(RangeError);
    expect(() => basicRatingLifeL10(500, -1, "ball")).toThrow(/Equivalent dynamic load P/);
    expect(() => l10Miles(0, 36)).toThrow(RangeError);
    expect(() => l10Miles(100, 0)).toThrow(/Wheel diameter/);
  });
});
