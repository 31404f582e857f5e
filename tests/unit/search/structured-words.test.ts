import { describe, expect, it } from "vitest";
import { damageSearchEntries } from "@/lib/classification";
import { namesFinding, parseSearchText, queryWithout } from "@/lib/search/parse-query";
import { oneEditApart, structuredForRun } from "@/lib/search/structured-words";

const entries = damageSearchEntries();
const parse = (q: string) => parseSearchText(q, entries);
const read = (q: string) => parse(q).map((c) => c.reading);

describe("words that name a row, zone, trigger or class", () => {
  it("reads 'spall cup outboard row' as a damage on a part's row", () => {
    const clauses = parse("spall cup outboard row");
    expect(clauses.map((c) => c.text)).toEqual(["spall", "cup", "outboard row"]);
    expect(clauses[0].codes).toContain("fatigue.subsurface"); // spall = subsurface spall (common practice)
    expect(clauses[1].components).toEqual(["cup"]);
    expect(clauses[2].rows).toEqual(["outboard"]);
    expect(clauses[2].searchText).toBe("outboard"); // "row" itself is not looked for in the notes
    expect(read("spall cup outboard row")).toEqual(["subsurface spall", "cup", "outboard row"]);
    expect(clauses.every(namesFinding)).toBe(true);
  });

  it("understands shop words and one slip of the keyboard for rows and zones", () => {
    expect(parse("ob")[0].rows).toEqual(["outboard"]); // ob = outboard (common practice)
    expect(parse("inbd")[0].rows).toEqual(["inboard"]);
    expect(parse("outbaord")[0].rows).toEqual(["outboard"]); // two letters swapped
    expect(parse("outbord row")[0].rows).toEqual(["outboard"]); // one letter left out
    expect(parse("racway")[0].zones).toEqual(["raceway"]);
    expect(parse("roller end")[0].zones).toEqual(["roller-end"]);
    expect(parse("rib")[0].zones).toEqual(["rib"]);
    // a short word is never stretched to a row: "rob" is not "ob"
    expect(parse("rob")[0].rows).toEqual([]);
  });

  it("reads triggers and bearing classes", () => {
    expect(parse("hbd")[0].triggers).toEqual(["wayside-hot"]); // HBD = hot-bearing detector (common practice)
    expect(parse("acoustic")[0].triggers).toEqual(["wayside-acoustic"]);
    // "hot box" is first the shop word for heat discoloration (damage names come first)
    expect(parse("hot box")[0].codes).toEqual(["heat.discoloration"]);
    expect(parse("class F")[0].classes).toEqual(["F"]);
    expect(parse("K class")[0].classes).toEqual(["K"]);
    expect(parse("class F")[0].searchText).toBe("");
    expect(read("hbd class K")).toEqual(["removed for: wayside hot-bearing alarm", "class K"]);
  });

  it("keeps damage and part names first: 'cone' is a part, 'roller' a part, 'roller end' a zone", () => {
    expect(parse("cone")[0].zones).toEqual([]);
    expect(parse("roller")[0].components).toEqual(["rollers-inboard", "rollers-outboard"]);
    expect(parse("roller end spall").map((c) => c.text)).toEqual(["roller end", "spall"]);
  });

  it("leaves plain words alone", () => {
    const [c] = parse("yard");
    expect([c.rows, c.zones, c.triggers, c.classes]).toEqual([[], [], [], []]);
    expect(namesFinding(c)).toBe(false);
    expect(structuredForRun(["blue"])).toBeNull();
  });

  it("drops one part of the reading from the search text", () => {
    const clauses = parse('spall cup outboard row "load zone"');
    expect(queryWithout(clauses, 2)).toBe('spall cup "load zone"');
    expect(queryWithout(clauses, 0)).toBe('cup outboard row "load zone"');
  });

  it("counts one edit between words (arithmetic)", () => {
    expect(oneEditApart("outboard", "outbaord")).toBe(true);
    expect(oneEditApart("outboard", "outbord")).toBe(true);
    expect(oneEditApart("outboard", "outbboard")).toBe(true);
    expect(oneEditApart("outboard", "inboard")).toBe(false);
    expect(oneEditApart("raceway", "raceway")).toBe(false);
  });
});
