import { describe, expect, it } from "vitest";
import { damageSearchEntries, expandQueryWithSynonyms, stem } from "@/lib/classification";

const entries = damageSearchEntries();
const expand = (q: string) => expandQueryWithSynonyms(q, entries);

describe("query expansion", () => {
  it("turns shop words into the code and label they mean", () => {
    expect(expand("rust on the cup")).toEqual(["corrosion.moisture", "Water etch"]); // rust = water etch (common practice)
    expect(expand("pitting")).toEqual(["fatigue.surface", "Surface distress"]); // pitting = surface distress (common practice)
    expect(expand("flaking")).toEqual(["fatigue.subsurface", "Subsurface spall"]); // flaking = spall (common practice)
  });

  it("matches other forms of a word and multi-word terms", () => {
    expect(expand("two spalls near the load zone")).toContain("fatigue.subsurface");
    expect(expand("torn lip on inboard seal")).toEqual(["seal.damaged", "Seal damaged or displaced"]);
    expect(expand("micro-pitting")).toContain("fatigue.surface");
  });

  it("keeps the order of the query and names each code once", () => {
    expect(expand("milky grease, spall, spalled")).toEqual([
      "lubricant.water",
      "Grease with water",
      "fatigue.subsurface",
      "Subsurface spall",
    ]);
  });

  it("forgives one typo in a longer word", () => {
    expect(expand("russt")).toEqual(["corrosion.moisture", "Water etch"]); // typo of "rust" (common practice)
  });

  it("expands nothing for words that are not shop terms", () => {
    expect(expand("car 4471 axle 2 left")).toEqual([]);
    expect(expand("")).toEqual([]);
  });
});

describe("stemming", () => {
  it("brings the forms of a shop word together", () => {
    for (const w of ["spall", "spalls", "spalled", "spalling"]) expect(stem(w)).toBe(stem("spall"));
    for (const w of ["pit", "pits", "pitting"]) expect(stem(w)).toBe(stem("pit"));
    for (const w of ["flake", "flaked", "flaking"]) expect(stem(w)).toBe(stem("flake"));
    expect(stem("brinelling")).toBe(stem("brinell"));
  });
});
