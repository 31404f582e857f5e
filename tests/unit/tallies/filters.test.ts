import { describe, expect, it } from "vitest";
import { addMonths, filtersToQuery, monthRange, parseTallyFilters, periodBounds, readTallyFilters } from "@/lib/tallies/filters";

describe("tally filters", () => {
  it("reads a shared link and fills the recurrence defaults", () => {
    const f = parseTallyFilters({ from: "2025-04", to: "2026-03", site: "MJC", class: "F", trigger: "wayside-hot" });
    expect(f).toEqual({ from: "2025-04", to: "2026-03", site: "MJC", class: "F", trigger: "wayside-hot", cluster: "site", window: 30 });
  });

  it("treats blank fields as no filter", () => {
    expect(parseTallyFilters({ from: "", site: " ", cluster: "" })).toEqual({ cluster: "site", window: 30 });
  });

  it("refuses a period that ends before it starts and impossible months", () => {
    expect(() => parseTallyFilters({ from: "2026-03", to: "2025-04" })).toThrow(/start before it ends/);
    expect(() => parseTallyFilters({ from: "2026-13" })).toThrow(/YYYY-MM/);
    expect(() => parseTallyFilters({ window: "0" })).toThrow();
    expect(readTallyFilters({ from: "garbage" })).toEqual({ cluster: "site", window: 30 });
  });

  it("turns months into a half-open date range, rolling over the year (calendar arithmetic)", () => {
    expect(periodBounds({ from: "2025-12", to: "2025-12" })).toEqual({ start: "2025-12-01", endExclusive: "2026-01-01" });
    expect(periodBounds({ to: "2024-02" })).toEqual({ endExclusive: "2024-03-01" });
  });

  it("lists the months of a period and shifts months across years (calendar arithmetic)", () => {
    expect(monthRange("2025-11", "2026-02")).toEqual(["2025-11", "2025-12", "2026-01", "2026-02"]);
    expect(monthRange("2026-02", "2025-11")).toEqual([]);
    expect(addMonths("2026-01", -1)).toEqual("2025-12");
    expect(addMonths("2025-06", 18)).toEqual("2026-12");
  });

  it("writes only non-default filters back into the URL", () => {
    expect(filtersToQuery({ from: "2025-01", site: "PYC", cluster: "site", window: 30 })).toBe("from=2025-01&site=PYC");
    expect(filtersToQuery({ cluster: "car", window: 14 })).toBe("cluster=car&window=14");
  });
});
