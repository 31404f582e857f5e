import { describe, expect, it } from "vitest";
import { chartCsv, downloadName, filtersLine, parseCsv, toCsv } from "@/lib/tallies/csv";

describe("CSV", () => {
  it("quotes fields with commas, quotes and line breaks, and ends rows with CRLF (RFC 4180 section 2)", () => {
    const csv = toCsv(
      ["Site", "Note"],
      [
        ["Marrow Junction, east", 'said "rough"'],
        ["Two\nlines", 3],
      ],
    );
    expect(csv).toBe('Site,Note\r\n"Marrow Junction, east","said ""rough"""\r\n"Two\nlines",3\r\n');
  });

  it("keeps text that looks like a spreadsheet formula as text (OWASP CSV injection advice)", () => {
    expect(toCsv(["x"], [["=HYPERLINK(1)"], ["-5 C"], [-5]])).toBe("x\r\n'=HYPERLINK(1)\r\n'-5 C\r\n-5\r\n");
  });

  it("writes empty cells for missing numbers and yes/no for flags (common practice)", () => {
    expect(toCsv(["a", "b", "c"], [[null, Number.NaN, true]])).toBe("a,b,c\r\n,,yes\r\n");
  });

  it("parses what it writes back into the same fields", () => {
    const rows = [
      ["a", "b,c"],
      ['say "hi"', ""],
      ["x\r\ny", "z"],
    ];
    const parsed = parseCsv(toCsv(rows[0], rows.slice(1)));
    expect(parsed).toEqual(rows);
  });

  it("reads LF files, a byte-order mark and a last line without newline", () => {
    expect(parseCsv("\uFEFFserial,class\nA1,F\nA2,G")).toEqual([
      ["serial", "class"],
      ["A1", "F"],
      ["A2", "G"],
    ]);
  });

  it("names downloads after the chart", () => {
    expect(downloadName("Cause Pareto (signed)", "csv", "2026-03-31")).toBe("tearline-cause-pareto-signed-2026-03-31.csv");
  });

  it("states the filters that made a chart's numbers on its first line", () => {
    expect(filtersLine("?site=MJC&from=2026-01-01&cause=seal")).toBe("Filters: site MJC; from 2026-01-01");
    expect(filtersLine("")).toBe("Filters: none (every case you may see)");
    expect(chartCsv("?class=F", ["a"], [[1]])).toBe("Filters: class F\r\na\r\n1\r\n");
  });
});
