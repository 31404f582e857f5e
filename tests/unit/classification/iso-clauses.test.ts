import { describe, expect, it } from "vitest";
import { DAMAGE_CODES, DAMAGE_FAMILIES, familyOfCode } from "@/lib/classification";

// ISO 15243:2017 clause 5: 5.1 fatigue, 5.2 wear, 5.3 corrosion, 5.4 electrical
// erosion, 5.5 plastic deformation, 5.6 fracture and cracking. The other
// families are Tearline's own and carry no clause.
const EXPECTED_CLAUSE: Record<string, string | null> = {
  "fatigue.subsurface": "5.1",
  "fatigue.surface": "5.1", // ISO 15243:2017 5.1 fatigue
  "wear.abrasive": "5.2",
  "wear.adhesive": "5.2", // ISO 15243:2017 5.2 wear
  "corrosion.moisture": "5.3",
  "corrosion.fretting": "5.3",
  "corrosion.false-brinell": "5.3", // 5.3 corrosion
  "electrical.arc": "5.4",
  "electrical.fluting": "5.4", // ISO 15243:2017 5.4 electrical erosion
  "deformation.overload": "5.5",
  "deformation.debris": "5.5",
  "deformation.handling": "5.5", // 5.5 plastic deformation
  "fracture.forced": "5.6",
  "fracture.fatigue": "5.6",
  "fracture.thermal": "5.6", // 5.6 fracture and cracking
  "heat.discoloration": null,
  "cage.deformed": null,
  "cage.broken": null,
  "seal.damaged": null,
  "seal.leaking": null,
  "lubricant.water": null,
  "lubricant.debris": null,
  "lubricant.starved": null,
  "lubricant.degraded": null,
  "mounting.cap-screw": null,
  "mounting.backing-ring": null,
  "mounting.fit": null,
  none: null,
};

describe("ISO 15243:2017 clauses", () => {
  it.each(Object.entries(EXPECTED_CLAUSE))("%s is under clause %s", (code, clause) => {
    const info = DAMAGE_CODES.find((d) => d.code === code);
    expect(info).toBeDefined();
    expect(info!.isoClause).toBe(clause);
    // a mode name exactly where there is a clause
    expect(info!.isoMode === null).toBe(clause === null);
  });

  it("names the six families by their ISO 15243:2017 clause 5 modes", () => {
    const byClause = Object.fromEntries(DAMAGE_FAMILIES.filter((f) => f.isoClause).map((f) => [f.isoClause, f.isoMode]));
    expect(byClause).toEqual({
      "5.1": "Fatigue", // ISO 15243:2017 5.1
      "5.2": "Wear", // ISO 15243:2017 5.2
      "5.3": "Corrosion", // ISO 15243:2017 5.3
      "5.4": "Electrical erosion", // ISO 15243:2017 5.4
      "5.5": "Plastic deformation", // ISO 15243:2017 5.5
      "5.6": "Fracture and cracking", // ISO 15243:2017 5.6
    });
  });

  it("words each mode after its ISO family", () => {
    // e.g. "Fatigue, subsurface initiated" under 5.1 (ISO 15243:2017 clause 5 mode names)
    expect(DAMAGE_CODES.find((d) => d.code === "fatigue.subsurface")?.isoMode).toBe("Fatigue, subsurface initiated");
    expect(DAMAGE_CODES.find((d) => d.code === "electrical.fluting")?.isoMode).toBe("Electrical erosion, current leakage");
  });

  it("reads the family of codes added later from their prefix", () => {
    expect(familyOfCode("wear.rib-scoring")).toBe("wear");
    expect(familyOfCode("none")).toBe("none");
  });
});
