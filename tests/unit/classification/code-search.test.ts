import { describe, expect, it } from "vitest";
import { createCodeSearch, damageSearchEntries, type CodeSearchEntry } from "@/lib/classification";

const search = createCodeSearch(damageSearchEntries());
const top = (query: string) => search(query)[0]?.entry.code;

describe("damage code search: shop words", () => {
  // Each word below is what inspectors and analysts write for that damage (common practice).
  it.each([
    ["rust", "corrosion.moisture"],
    ["stain", "corrosion.moisture"],
    ["etching", "corrosion.moisture"],
    ["pitting", "fatigue.surface"],
    ["frosting", "fatigue.surface"],
    ["micropitting", "fatigue.surface"],
    ["flaking", "fatigue.subsurface"],
    ["spall", "fatigue.subsurface"],
    ["spalling", "fatigue.subsurface"],
    ["peeling", "fatigue.subsurface"],
    ["weld", "electrical.arc"],
    ["arc", "electrical.arc"],
    ["crater", "electrical.arc"],
    ["washboard", "electrical.fluting"],
    ["corrugation", "electrical.fluting"],
    ["brinell", "deformation.overload"],
    ["dent", "deformation.overload"],
    ["smearing", "wear.adhesive"],
    ["galling", "wear.adhesive"],
    ["milky", "lubricant.water"],
    ["gritty", "lubricant.debris"],
    ["heat checking", "fracture.thermal"],
    ["false brinelling", "corrosion.false-brinell"],
    ["fretting", "corrosion.fretting"],
    ["spun cone", "mounting.fit"],
    ["blued", "heat.discoloration"],
  ])('"%s" finds %s first', (word, code) => {
    expect(top(word)).toBe(code);
  });

  it("tolerates typos", () => {
    expect(top("spaling")).toBe("fatigue.subsurface"); // typo of "spalling" (common practice)
    expect(top("russt")).toBe("corrosion.moisture"); // typo of "rust" (common practice)
    expect(top("emulsifed")).toBe("lubricant.water"); // typo of "emulsified" (common practice)
  });

  it("says what matched", () => {
    const [hit] = search("Rust");
    expect(hit).toMatchObject({ matchedOn: "synonym", matchedText: "rust" });
    expect(search("Water etch")[0]).toMatchObject({ matchedOn: "label", score: 1 });
    expect(search("fatigue.subsurface")[0]).toMatchObject({ matchedOn: "code", score: 1 });
  });

  it("ranks an exact shop word above a word that merely contains it", () => {
    const hits = search("rust");
    const fretting = hits.findIndex((h) => h.entry.code === "corrosion.fretting"); // has "fretting rust"
    expect(fretting).toBeGreaterThan(0);
    expect(hits[0].score).toBeGreaterThan(hits[fretting].score);
  });

  it("finds a code from its appearance", () => {
    expect(top("grey bands")).toBe("electrical.fluting");
  });

  it("lets a part name in the query neither help nor block", () => {
    expect(top("rusty cup")).toBe("corrosion.moisture");
  });

  it("returns nothing for gibberish and everything for an empty query", () => {
    expect(search("xqzvw")).toEqual([]);
    expect(search("  ").map((h) => h.entry.code)).toEqual(damageSearchEntries().map((e) => e.code));
  });

  it("sorts best first and honours the limit", () => {
    const hits = search("fatigue", { limit: 3 });
    expect(hits).toHaveLength(3);
    for (let i = 1; i < hits.length; i++) expect(hits[i - 1].score).toBeGreaterThanOrEqual(hits[i].score);
  });
});

describe("retired codes", () => {
  const entries: CodeSearchEntry[] = [
    { code: "wear.old-scuff", label: "Scuffing (old)", synonyms: ["scuff"], retired: true },
    { code: "wear.adhesive", label: "Smearing / scoring", synonyms: ["scuffing"] },
  ];
  const local = createCodeSearch(entries);

  it("hides retired codes unless asked", () => {
    expect(local("scuff").map((h) => h.entry.code)).toEqual(["wear.adhesive"]);
    expect(local("scuff", { includeRetired: true }).map((h) => h.entry.code)).toEqual(["wear.old-scuff", "wear.adhesive"]);
  });
});
