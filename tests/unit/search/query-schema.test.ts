import { describe, expect, it } from "vitest";
import { hasCriteria, parseSearchParams, readSearchParams, recordOf } from "@/lib/search/query-schema";
import { activeFilterCount, clearFilters, searchHref, toggleValue } from "@/lib/search/url-state";

describe("search parameters in the URL", () => {
  it("reads comma lists and repeated keys into one list without repeats", () => {
    const p = parseSearchParams(recordOf(new URLSearchParams("q=rust&trigger=wayside-hot,hand-roll&trigger=hand-roll&status=signed")));
    expect(p.trigger).toEqual(["wayside-hot", "hand-roll"]);
    expect(p.status).toEqual(["signed"]);
    expect(p.page).toBe(1);
    expect(p.sort).toBe("relevance");
  });

  it("refuses what it cannot read, strictly for the API and leniently for the page", () => {
    expect(() => parseSearchParams({ severity: "7" })).toThrow();
    expect(() => parseSearchParams({ status: "lost" })).toThrow();
    expect(() => parseSearchParams({ from: "2026-13-45" })).toThrow();
    const { params, dropped } = readSearchParams({ q: "spall", severity: "7", status: "lost" });
    expect(params.q).toBe("spall");
    expect(params.severity).toBeUndefined();
    expect(dropped.sort()).toEqual(["severity", "status"]);
  });

  it("round-trips through a link", () => {
    const p = parseSearchParams({ q: "water etch", code: "corrosion.moisture", severity: "3", from: "2026-01-01", page: "2" });
    const href = searchHref(p);
    expect(href).toBe("/search?q=water+etch&code=corrosion.moisture&severity=3&from=2026-01-01&page=2");
    expect(parseSearchParams(recordOf(new URL(href, "http://x").searchParams))).toEqual(p);
  });

  it("toggles facet values, starting again at page 1", () => {
    const p = parseSearchParams({ q: "spall", page: "3", component: "cup" });
    const on = toggleValue(p, "component", "cone-inboard");
    expect(on.component).toEqual(["cup", "cone-inboard"]);
    expect(on.page).toBe(1);
    expect(toggleValue(on, "component", "cup").component).toEqual(["cone-inboard"]);
    expect(activeFilterCount(on)).toBe(2);
    const cleared = clearFilters({ ...on, severity: 2 });
    expect(activeFilterCount(cleared)).toBe(0);
    expect(cleared.q).toBe("spall");
    expect(hasCriteria(cleared)).toBe(true);
    expect(hasCriteria(parseSearchParams({}))).toBe(false);
  });
});

describe("empty form fields", () => {
  it("reads an empty date or text field as not given", () => {
    const p = parseSearchParams(recordOf(new URLSearchParams("q=&from=&to=2026-02-01&trigger=")));
    expect(p.from).toBeUndefined();
    expect(p.to).toBe("2026-02-01");
    expect(p.trigger).toEqual([]);
    expect(readSearchParams({ from: "" }).dropped).toEqual([]);
  });
});
