import { describe, expect, it } from "vitest";
import { codeCreateSchema, codePatchSchema, parseSynonyms } from "@/lib/validation/code-entry";

// Code formats are Tearline's own convention (common practice: dotted family.name, kebab-case).
describe("new classification codes", () => {
  const base = { label: "Micro-pitting", description: "", synonyms: [] };

  it("takes a damage code as family.name under a known family, and derives nothing else", () => {
    expect(codeCreateSchema.safeParse({ ...base, list: "damage", code: "fatigue.micro-pitting" }).success).toBe(true);
    expect(codeCreateSchema.safeParse({ ...base, list: "damage", code: "Fatigue.Micro-Pitting" }).data?.code).toBe("fatigue.micro-pitting");
  });

  it("refuses damage codes without a family, with an unknown family, or with spaces", () => {
    for (const code of ["micropitting", "gremlins.bite", "fatigue.micro pitting", "fatigue.", ".pitting"]) {
      const r = codeCreateSchema.safeParse({ ...base, list: "damage", code });
      expect(r.success, code).toBe(false);
      expect(r.error?.issues[0].path).toEqual(["code"]);
    }
  });

  it("takes causes and triggers in kebab-case only", () => {
    expect(codeCreateSchema.safeParse({ ...base, list: "cause", code: "axle-current" }).success).toBe(true);
    expect(codeCreateSchema.safeParse({ ...base, list: "trigger", code: "acoustic-alarm" }).success).toBe(true);
    for (const code of ["axle_current", "axle.current", "-axle", "axle--current"]) {
      expect(codeCreateSchema.safeParse({ ...base, list: "cause", code }).success, code).toBe(false);
    }
  });

  it("keeps ISO 15243 modes to damage codes", () => {
    expect(codeCreateSchema.safeParse({ ...base, list: "cause", code: "axle-current", isoMode: "Electrical erosion" }).success).toBe(false);
  });

  it("refuses an unknown list", () => {
    expect(codeCreateSchema.safeParse({ ...base, list: "colour", code: "red" }).success).toBe(false);
  });
});

describe("editing a code", () => {
  it("never changes the code itself", () => {
    expect(codePatchSchema.safeParse({ code: "fatigue.other" }).success).toBe(false);
    expect(codePatchSchema.safeParse({}).success).toBe(false);
    expect(codePatchSchema.safeParse({ retired: true }).success).toBe(true);
  });

  it("cleans shop words: trims, drops blanks and repeats whatever the case", () => {
    expect(parseSynonyms(" rust, red stain\n\nRust; flaking ")).toEqual(["rust", "red stain", "flaking"]);
    expect(codePatchSchema.parse({ synonyms: ["pits ", "Pits", "frost"] }).synonyms).toEqual(["pits", "frost"]);
  });
});
