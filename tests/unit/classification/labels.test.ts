// The one code-to-words lookup used by screens, the report, mail, search and tallies.
import { describe, expect, it } from "vitest";
import {
  bearingClassLabel,
  causeLabel,
  componentLabel,
  componentPhrase,
  damageLabel,
  NO_CODE,
  rowLabel,
  severityLabel,
  triggerLabel,
  zoneLabel,
} from "@/lib/classification/labels";
import { COMPONENTS, ROOT_CAUSES, TRIGGERS } from "@/lib/classification";

describe("labels for codes", () => {
  it("reads each listed code as its label in the classification lists", () => {
    for (const c of COMPONENTS) expect(componentLabel(c.code)).toBe(c.label);
    for (const c of ROOT_CAUSES) expect(causeLabel(c.code)).toBe(c.label);
    for (const t of TRIGGERS) expect(triggerLabel(t.code)).toBe(t.label);
    expect(rowLabel("inboard")).toBe("Inboard");
    expect(zoneLabel("raceway")).toBe("Raceway");
    expect(severityLabel(3)).toBe("Part condemned");
    expect(componentPhrase("cup")).toBe("the cup");
  });

  it("reads a code an admin added later as itself, and no code as a dash", () => {
    expect(damageLabel("shop.new-code")).toBe("shop.new-code");
    expect(causeLabel(null)).toBe(NO_CODE);
    expect(zoneLabel(undefined)).toBe(NO_CODE);
    expect(triggerLabel("")).toBe(NO_CODE);
  });

  it("prefers an admin's own label when the caller loaded them", () => {
    const code = ROOT_CAUSES[0].code;
    expect(causeLabel(code, { [code]: "Our shop's word" })).toBe("Our shop's word");
    expect(causeLabel(code, { other: "x" })).toBe(ROOT_CAUSES[0].label);
  });

  it("names bearing classes the same way everywhere", () => {
    expect(bearingClassLabel("K")).toBe("Class K");
    expect(bearingClassLabel("other")).toBe("Other class");
    expect(bearingClassLabel("other", true)).toBe("Other");
  });
});
