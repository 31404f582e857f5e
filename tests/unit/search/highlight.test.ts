import { describe, expect, it } from "vitest";
import { compileTerms, highlight, highlightSubstrings, snippet } from "@/lib/search/highlight";

const marked = (segments: { text: string; hit: boolean }[]) => segments.filter((s) => s.hit).map((s) => s.text);

describe("highlight", () => {
  it("marks other forms of a word and keeps the text intact", () => {
    const text = "Spalled cup raceway; spalling also on the cone.";
    const segments = highlight(text, compileTerms(["spall"]));
    expect(segments.map((s) => s.text).join("")).toBe(text);
    expect(marked(segments)).toEqual(["Spalled", "spalling"]);
  });

  it("marks a several-word term only as a whole run", () => {
    const segments = highlight("Water etch at roller spacing; water in grease.", compileTerms(["water etch"]));
    expect(marked(segments)).toEqual(["Water etch"]);
  });

  it("prefers the longer term where two overlap", () => {
    const segments = highlight("Grease with water, milky.", compileTerms(["water", "grease with water"]));
    expect(marked(segments)).toEqual(["Grease with water"]);
  });

  it("ignores stop-word terms and accents", () => {
    expect(marked(highlight("Café crème on the cup", compileTerms(["the", "creme"])))).toEqual(["crème"]);
  });
});

describe("snippet", () => {
  const long = `${"Bearing received cleaned and measured before teardown. ".repeat(6)}Deep spall on the cup outboard raceway in the load zone, spalling about 20 mm long. ${"Rollers and cages were within limits. ".repeat(6)}`;

  it("cuts around the marks, with ellipses where it cut", () => {
    const s = snippet(long, compileTerms(["spall"]), 120)!;
    const text = s.segments.map((x) => x.text).join("");
    expect(s.hits).toBe(2);
    expect(text.startsWith("…")).toBe(true);
    expect(text.endsWith("…")).toBe(true);
    expect(text.length).toBeLessThanOrEqual(120 + 2 + 10);
    expect(marked(s.segments)).toEqual(["spall", "spalling"]);
  });

  it("returns the whole short text, or null without a match", () => {
    expect(
      snippet("Milky grease.", compileTerms(["milky"]))!
        .segments.map((s) => s.text)
        .join(""),
    ).toBe("Milky grease.");
    expect(snippet(long, compileTerms(["fluting"]))).toBeNull();
  });
});

describe("highlightSubstrings", () => {
  it("marks serial and car number fragments, merging overlaps", () => {
    const segments = highlightSubstrings("SRRX 204518", ["2045", "4518", "srrx"]);
    expect(marked(segments)).toEqual(["SRRX", "204518"]);
    expect(segments.map((s) => s.text).join("")).toBe("SRRX 204518");
  });
});
