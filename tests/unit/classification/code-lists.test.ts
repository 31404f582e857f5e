import { describe, expect, it } from "vitest";
import {
  COMPONENTS,
  CONFIDENCES,
  DAMAGE_CODES,
  DISPOSITIONS,
  LUBRICANT_CONDITIONS,
  ROOT_CAUSES,
  ROWS,
  SEVERITIES,
  TRIGGERS,
  ZONES,
  requiredTriggerFields,
} from "@/lib/classification";

// Each expected list is Tearline's own classification (the trade's part names,
// removal triggers, damage codes and verdicts), written out here so a dropped,
// renamed or doubled code fails.
const codesOf = (list: readonly { code: string | number }[]) => list.map((x) => x.code);
const expectExactlyOnce = (actual: readonly (string | number)[], expected: readonly (string | number)[]) => {
  expect(new Set(actual).size).toBe(actual.length);
  expect([...actual].sort()).toEqual([...expected].sort());
};

describe("bearing parts", () => {
  it("lists every part of a freight-car journal bearing exactly once", () => {
    // Tearline's own part codes, after the trade's part names (common practice)
    expectExactlyOnce(codesOf(COMPONENTS), [
      "cup",
      "cone-inboard",
      "cone-outboard",
      "rollers-inboard",
      "rollers-outboard",
      "cage-inboard",
      "cage-outboard",
      "seal-inboard",
      "seal-outboard",
      "spacer",
      "backing-ring",
      "end-cap",
      "cap-screws",
      "locking-plate",
      "lubricant",
      "journal",
    ]);
  });

  it("gives raceways to the cup and cones only, and a row choice to the one-piece double cup", () => {
    // cup = double outer ring, cones = inner rings; rollers run between their raceways (common practice)
    expect(
      COMPONENTS.filter((c) => c.hasRaceway)
        .map((c) => c.code)
        .sort(),
    ).toEqual(["cone-inboard", "cone-outboard", "cup"]);
    expect(COMPONENTS.filter((c) => c.hasRow).map((c) => c.code)).toEqual(["cup"]);
    expect(COMPONENTS.find((c) => c.code === "backing-ring")?.fixedRow).toBe("inboard"); // backing ring is inboard (common practice)
  });

  it("suggests only zones that exist", () => {
    const zones = new Set(codesOf(ZONES));
    for (const c of COMPONENTS) for (const z of c.zones) expect(zones.has(z)).toBe(true);
  });
});

describe("finding scales", () => {
  it("has the zones, rows, dispositions, confidences and grease conditions", () => {
    // Tearline's own lists (common practice)
    expectExactlyOnce(codesOf(ZONES), ["raceway", "rib", "roller-end", "roller-body", "bore", "outside-surface", "other"]);
    expectExactlyOnce(codesOf(ROWS), ["inboard", "outboard"]);
    expectExactlyOnce(codesOf(DISPOSITIONS), ["reuse", "recondition", "scrap"]);
    expectExactlyOnce(codesOf(CONFIDENCES), ["confirmed", "probable", "undetermined"]);
    expectExactlyOnce(codesOf(LUBRICANT_CONDITIONS), ["normal", "water", "debris", "starved", "degraded", "overheated", "mixed"]);
  });

  it("uses Tearline's 0–4 severity scale with its labels", () => {
    // Tearline's own severity scale (common practice)
    expect(SEVERITIES.map((s) => [s.code, s.label])).toEqual([
      [0, "None"],
      [1, "Cosmetic"],
      [2, "Minor, part can be reconditioned"],
      [3, "Part condemned"],
      [4, "Bearing condemned / safety-relevant"],
    ]);
  });
});

describe("removal triggers", () => {
  it("lists the 14 triggers exactly once", () => {
    // Tearline's own removal triggers (common practice)
    expectExactlyOnce(codesOf(TRIGGERS), [
      "wayside-hot",
      "wayside-acoustic",
      "hand-roll",
      "end-play-high",
      "end-play-tight",
      "seal-grease",
      "welding",
      "cap-screws",
      "backing-ring",
      "wheel-removal",
      "accident",
      "visual-other",
      "scheduled",
      "other",
    ]);
  });

  it("asks a hot-bearing alarm for the reading and the owner's threshold in °F, detector optional", () => {
    const hot = TRIGGERS.find((t) => t.code === "wayside-hot")!;
    const field = (key: string) => hot.fields.find((f) => f.key === key);
    expect(requiredTriggerFields("wayside-hot")).toEqual(["readingF", "thresholdF"]);
    expect(field("readingF")?.unit).toBe("°F");
    expect(field("thresholdF")?.unit).toBe("°F");
    expect(field("detectorId")?.required).toBe(false);
    expect(field("detectorLocation")?.required).toBe(false);
  });

  it("asks for the alarm level, the end play, and a description where the list cannot say", () => {
    expect(requiredTriggerFields("wayside-acoustic")).toEqual(["alarmLevel"]);
    expect(requiredTriggerFields("end-play-high")).toEqual(["endPlayIn"]);
    expect(requiredTriggerFields("other")).toEqual(["description"]);
    expect(requiredTriggerFields("visual-other")).toEqual(["description"]);
    expect(requiredTriggerFields("hand-roll")).toEqual([]);
    expect(requiredTriggerFields("no-such-trigger")).toEqual([]);
  });

  it("gives every trigger a label and description, and unique field keys", () => {
    for (const t of TRIGGERS) {
      expect(t.label.length).toBeGreaterThan(0);
      expect(t.description.length).toBeGreaterThan(0);
      const keys = t.fields.map((f) => f.key);
      expect(new Set(keys).size).toBe(keys.length);
    }
  });
});

describe("damage codes", () => {
  it("lists the 28 damage codes exactly once", () => {
    // Tearline's own classification; mode names per ISO 15243:2017 clause 5
    expectExactlyOnce(codesOf(DAMAGE_CODES), [
      "fatigue.subsurface",
      "fatigue.surface",
      "wear.abrasive",
      "wear.adhesive",
      "corrosion.moisture",
      "corrosion.fretting",
      "corrosion.false-brinell",
      "electrical.arc",
      "electrical.fluting",
      "deformation.overload",
      "deformation.debris",
      "deformation.handling",
      "fracture.forced",
      "fracture.fatigue",
      "fracture.thermal",
      "heat.discoloration",
      "cage.deformed",
      "cage.broken",
      "seal.damaged",
      "seal.leaking",
      "lubricant.water",
      "lubricant.debris",
      "lubricant.starved",
      "lubricant.degraded",
      "mounting.cap-screw",
      "mounting.backing-ring",
      "mounting.fit",
      "none",
    ]);
  });

  it("puts every code in the family its name starts with", () => {
    for (const d of DAMAGE_CODES) expect(d.code.split(".")[0]).toBe(d.family);
  });

  it("has labels and synonyms, no shop word on two codes", () => {
    const owner = new Map<string, string>();
    for (const d of DAMAGE_CODES) {
      expect(d.label.length).toBeGreaterThan(0);
      expect(d.synonyms.length).toBeGreaterThanOrEqual(3);
      for (const s of d.synonyms) {
        const key = s.toLowerCase();
        expect(owner.get(key) ?? d.code, `"${s}" is on two codes`).toBe(d.code);
        owner.set(key, d.code);
      }
    }
  });
});

describe("root causes", () => {
  it("lists the 13 root causes exactly once", () => {
    // Tearline's own verdict list (common practice)
    expectExactlyOnce(codesOf(ROOT_CAUSES), [
      "water-ingress",
      "debris-ingress",
      "lubrication",
      "seal",
      "electrical",
      "impact",
      "mounting",
      "handling",
      "reconditioning",
      "material",
      "end-of-life",
      "no-defect",
      "undetermined",
    ]);
  });

  it("marks only no-defect as not confirming the removal", () => {
    // a teardown that finds no defect means the removal was not confirmed ("non-verified", UTRGV UTCRS)
    expect(ROOT_CAUSES.filter((c) => !c.confirmsRemoval).map((c) => c.code)).toEqual(["no-defect"]);
  });
});
