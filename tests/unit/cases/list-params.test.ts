import { describe, expect, it } from "vitest";
import { ZodError } from "zod";
import {
  activeFilterCount,
  DEFAULT_LIST_PARAMS,
  listParamsToQuery,
  parseListParams,
  readListParams,
  toggleSort,
  withFilters,
} from "@/lib/cases/list-params";

const parse = (q: string) => parseListParams(new URLSearchParams(q));
const message = (q: string) => {
  try {
    parse(q);
  } catch (e) {
    if (e instanceof ZodError) return e.issues.map((i) => i.message).join(" | ");
    throw e;
  }
  throw new Error(`"${q}" was accepted`);
};

describe("reading the case list query", () => {
  it("gives the defaults for an empty query", () => {
    // common practice: newest activity first, 25 a page
    expect(parse("")).toEqual({ filters: {}, sort: { field: "updatedAt", dir: "desc" }, page: 1, pageSize: 25 });
  });

  it("reads comma lists, drops repeats and blanks, and upper-cases site codes", () => {
    const p = parse("status=signoff,bench,signoff,&trigger=wayside-hot&site=mjc,PYC&class=F,other");
    expect(p.filters).toEqual({ status: ["signoff", "bench"], trigger: ["wayside-hot"], site: ["MJC", "PYC"], class: ["F", "other"] });
  });

  it("reads a repeated key as one list", () => {
    expect(parse("status=field&status=bench").filters.status).toEqual(["field", "bench"]);
    expect(parseListParams({ status: ["field", "signed"] }).filters.status).toEqual(["field", "signed"]);
  });

  it("takes the last value of a key that is not a list", () => {
    expect(parse("q=first&q=second%20one&page=2&page=3")).toMatchObject({ filters: { q: "second one" }, page: 3 });
  });

  it("reads page, page size, sort, dates and text", () => {
    const p = parse("page=3&pageSize=50&sort=removedOn:asc&from=2026-01-01&to=2026-06-30&q=%20SRRL%2012%20");
    expect(p).toEqual({
      filters: { from: "2026-01-01", to: "2026-06-30", q: "SRRL 12" },
      sort: { field: "removedOn", dir: "asc" },
      page: 3,
      pageSize: 50,
    });
  });

  it("treats blank values as not given", () => {
    expect(parse("status=&q=%20%20&page=&sort=")).toEqual(DEFAULT_LIST_PARAMS);
  });

  it("accepts one-day ranges and page sizes at both limits", () => {
    expect(parse("from=2026-03-14&to=2026-03-14").filters).toEqual({ from: "2026-03-14", to: "2026-03-14" });
    expect(parse("pageSize=10").pageSize).toBe(10);
    expect(parse("pageSize=200").pageSize).toBe(200);
  });
});

describe("refusing a bad query, with a message that says what to do", () => {
  it.each([
    ["page=0", /Page must be at least 1/],
    ["page=2.5", /Page must be a whole number/],
    ["page=abc", /Page must be a number/],
    ["pageSize=9", /Page size must be at least 10/],
    ["pageSize=201", /Page size must be at most 200/],
    ["sort=colour:asc", /Sort must be a column and a direction/],
    ["sort=removedOn:up", /Sort must be a column and a direction/],
    ["sort=removedOn", /Sort must be a column and a direction/],
    ["status=open", /Unknown stage "open"; use field, bench, signoff, signed/],
    ["class=Z", /Unknown bearing class "Z"/],
    ["trigger=Hot Box", /Unknown trigger "Hot Box"/],
    ["site=M%20J", /Unknown site "M J"/],
    ["from=2026-02-30", /From must be a real date written YYYY-MM-DD/],
    ["to=14/03/2026", /To must be a real date/],
    ["from=2026-06-01&to=2026-05-31", /From is after To/],
    [`q=${"x".repeat(101)}`, /at most 100 characters/],
  ])("%s", (q, expected) => {
    expect(message(q)).toMatch(expected);
  });

  it("accepts 29 February only in a leap year", () => {
    // Gregorian calendar: 2024 is a leap year, 2026 is not
    expect(parse("from=2024-02-29").filters.from).toBe("2024-02-29");
    expect(message("from=2026-02-29")).toMatch(/real date/);
  });

  it("lets a page fall back to the default list and say why", () => {
    const r = readListParams({ pageSize: "5000" });
    expect(r.params).toEqual(DEFAULT_LIST_PARAMS);
    expect(r.error).toMatch(/at most 200/);
  });
});

describe("writing the query back", () => {
  it("leaves defaults out", () => {
    expect(listParamsToQuery(DEFAULT_LIST_PARAMS)).toBe("");
  });

  it("writes a stable, readable query that reads back to the same state", () => {
    const p = parse("q=a%2Cb%20%26c&site=PYC,MJC&status=signoff&sort=car:asc&page=2&pageSize=100&to=2026-12-31");
    const q = listParamsToQuery(p);
    expect(q).toBe("status=signoff&site=PYC,MJC&to=2026-12-31&q=a%2Cb%20%26c&sort=car:asc&page=2&pageSize=100");
    expect(parse(q)).toEqual(p);
  });

  it("can leave paging out for the export link", () => {
    const p = parse("status=bench&page=4&pageSize=50");
    expect(listParamsToQuery(p, { paging: false })).toBe("status=bench");
  });
});

describe("changing the state", () => {
  it("goes back to page 1 when a filter changes, and drops emptied filters", () => {
    const p = { ...parse("status=bench&q=x"), page: 5 };
    const next = withFilters(p, { status: [], cause: ["seal"] });
    expect(next.page).toBe(1);
    expect(next.filters).toEqual({ q: "x", cause: ["seal"] });
  });

  it("flips the direction on the same column and starts a new column in its natural direction", () => {
    const p = parse("sort=serial:asc&page=3");
    expect(toggleSort(p, "serial").sort).toEqual({ field: "serial", dir: "desc" });
    expect(toggleSort(p, "removedOn").sort).toEqual({ field: "removedOn", dir: "desc" });
    expect(toggleSort(p, "site").sort).toEqual({ field: "site", dir: "asc" });
    expect(toggleSort(p, "site").page).toBe(1);
  });

  it("counts a date range once", () => {
    expect(activeFilterCount(parse("from=2026-01-01&to=2026-02-01&status=bench&q=x").filters)).toBe(3);
    expect(activeFilterCount({})).toBe(0);
  });
});
