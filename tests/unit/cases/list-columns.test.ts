import { describe, expect, it } from "vitest";
import {
  CASE_COLUMNS,
  defaultColumnVisibility,
  formatAgo,
  formatClass,
  formatDay,
  formatEndPlay,
  formatMonths,
  formatPosition,
} from "@/lib/cases/list-columns";

describe("case list formatting", () => {
  it("shows end play in inches to four decimals", () => {
    expect(formatEndPlay(0.0625)).toBe("0.0625"); // 1/16 in = 0.0625 in (arithmetic), the common interchange limit
    expect(formatEndPlay(0.015)).toBe("0.0150"); // four places: a dial indicator reads to 0.0001 in (common practice)
    expect(formatEndPlay(null)).toBe("");
  });

  it("spells dates one way whatever the locale", () => {
    expect(formatDay("2026-06-15")).toBe("15 Jun 2026"); // ISO 8601 calendar date read as day, month name, year
    expect(formatDay("2026-12-01T10:00:00Z")).toBe("1 Dec 2026");
    expect(formatDay(null)).toBe("");
  });

  it("shows position, class and months plainly", () => {
    expect(formatPosition(2, "L")).toBe("Axle 2 L");
    expect(formatPosition(null, null)).toBe("");
    expect(formatClass({ bearingClass: "other", bearingClassOther: "AP-2" })).toBe("AP-2");
    expect(formatClass({ bearingClass: "F", bearingClassOther: null })).toBe("F");
    expect(formatMonths(18.5)).toBe("18.5");
    expect(formatMonths(24)).toBe("24");
  });

  it("always shows the case number and offers every other column", () => {
    expect(CASE_COLUMNS.filter((c) => !c.hideable).map((c) => c.id)).toEqual(["number"]);
    expect(defaultColumnVisibility().number).toBe(true);
  });
});

describe("time since the last change", () => {
  const now = Date.parse("2026-06-15T12:00:00Z");
  it.each([
    ["2026-06-15T11:59:40Z", "just now"], // under a minute
    ["2026-06-15T11:48:00Z", "12 min ago"], // 12 × 60 s
    ["2026-06-15T07:00:00Z", "5 h ago"], // 5 × 3600 s
    ["2026-06-12T12:00:00Z", "3 d ago"], // 3 × 86 400 s
    ["2026-05-01T09:00:00Z", "6 wk ago"], // 45 days ÷ 7 = 6.4 weeks
    ["2026-01-10T12:00:00Z", "5 mo ago"], // 156 days ÷ 30.4375 (mean Gregorian month) = 5.1
    ["2023-06-01T12:00:00Z", "3 yr ago"], // 1110 days ÷ 365.25 = 3.04
  ])("%s reads %s", (iso, expected) => {
    expect(formatAgo(iso, now)).toBe(expected);
  });
});
