import { describe, expect, it } from "vitest";
import { damageSearchEntries } from "@/lib/classification";
import { codesIn, parseSearchText } from "@/lib/search/parse-query";

const entries = damageSearchEntries();
const parse = (q: string) => parseSearchText(q, entries);

describe("search text → clauses", () => {
  it("lets a shop word stand for its damage code", () => {
    const [rust] = parse("rust");
    expect(rust.codes).toEqual(["corrosion.moisture"]); // rust = water etch (common practice)
    expect(rust.correctable).toBe(false); // a known shop word is never swapped for another
    expect(rust.highlight).toContain("Water etch");
    expect(parse("flaking")[0].codes).toEqual(["fatigue.subsurface"]); // flaking = spall (common practice)
    expect(parse("pitting")[0].codes).toEqual(["fatigue.surface"]); // pitting = surface distress (common practice)
  });

  it("keeps a several-word term together as one clause", () => {
    const clauses = parse("water etch on cup");
    expect(clauses.map((c) => c.text)).toEqual(["water etch", "cup"]);
    expect(clauses[0].codes).toEqual(["corrosion.moisture"]); // label of the moisture-corrosion code
    expect(clauses[1].components).toEqual(["cup"]);
  });

  it("names both cones, both roller rows and the grease from shop words", () => {
    expect(parse("cone")[0].components).toEqual(["cone-inboard", "cone-outboard"]);
    expect(parse("rollers")[0].components).toEqual(["rollers-inboard", "rollers-outboard"]);
    expect(parse("grease")[0].components).toEqual(["lubricant"]);
  });

  it("forgives a typo in a shop word and marks plain words as correctable", () => {
    const [spaling] = parse("spaling");
    expect(spaling.codes).toEqual(["fatigue.subsurface"]); // one letter short of "spalling" (common practice)
    expect(spaling.correctable).toBe(true);
    const [milkey] = parse("milkey");
    expect(milkey.correctable).toBe(true);
  });

  it("treats tokens with digits as serials, car or case numbers", () => {
    const clauses = parse("SRRX 204518 TL-26-00042");
    expect(clauses.map((c) => [c.kind, c.text])).toEqual([
      ["words", "srrx"],
      ["identifier", "204518"],
      ["identifier", "TL-26-00042"],
    ]);
  });

  it("keeps quoted phrases in order and drops stop words", () => {
    const clauses = parse('"heat checking" the of');
    expect(clauses).toHaveLength(1);
    expect(clauses[0]).toMatchObject({ kind: "phrase", words: ["heat", "checking"], codes: ["fracture.thermal"] });
  });

  it("collects every code the query names once", () => {
    expect(codesIn(parse("rust and rusty spall"))).toEqual(["corrosion.moisture", "fatigue.subsurface"]);
    expect(parse("")).toEqual([]);
  });
});
