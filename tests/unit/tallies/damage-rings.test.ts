import { describe, expect, it } from "vitest";
import { binFindings, ringsOf, sectorsCovered, sectorSpan, sumSpanGroups } from "@/lib/damage-map/rings";

describe("placing findings on the raceway rings", () => {
  it("puts cup findings on the named row, on both cup raceways when no row is given, and skips parts without a raceway", () => {
    expect(ringsOf("cup", "inboard")).toEqual(["cup-inboard"]);
    expect(ringsOf("cup", null)).toEqual(["cup-outboard", "cup-inboard"]);
    expect(ringsOf("cone-outboard", "outboard")).toEqual(["cone-outboard"]);
    expect(ringsOf("rollers-inboard", "inboard")).toEqual([]);
  });

  it("covers the sectors an arc centred on the clock position touches (10 degree sectors, arithmetic)", () => {
    expect(sectorsCovered(90, 30)).toEqual([7, 8, 9, 10]); // 75..105 degrees touches 70-80 up to 100-110
    expect(sectorsCovered(95, 10)).toEqual([9]); // 90..100
    expect(sectorsCovered(355, null)).toEqual([35]); // a spot at 355
    expect(sectorsCovered(0, 40)).toEqual([0, 1, 34, 35]); // 340..20 wraps past 12 o'clock
    expect(sectorsCovered(123, 360)).toHaveLength(36);
    expect(sectorSpan(0, 40)).toEqual({ first: -2, count: 4 });
    expect(sectorsCovered(180, 355)).toHaveLength(36); // never more than the whole ring
  });

  it("sums findings per sector with the worst severity there", () => {
    const { sectors, placed, unplaced } = binFindings([
      { component: "cup", row: "outboard", clockDeg: 0, arcDeg: 20, severity: 2 },
      { component: "cup", row: "outboard", clockDeg: 5, arcDeg: null, severity: 4 },
      { component: "cup", row: null, clockDeg: 180, arcDeg: 10, severity: 1 },
      { component: "cone-inboard", row: "inboard", clockDeg: null, arcDeg: 30, severity: 3 },
      { component: "seal-inboard", row: "inboard", clockDeg: 90, arcDeg: 10, severity: 3 },
    ]);
    expect([placed, unplaced]).toEqual([3, 2]);
    expect(sectors).toEqual([
      { ring: "cup-outboard", sector: 0, findings: 2, maxSeverity: 4 },
      { ring: "cup-outboard", sector: 17, findings: 1, maxSeverity: 1 }, // 175..185 touches 170-180 and 180-190
      { ring: "cup-outboard", sector: 18, findings: 1, maxSeverity: 1 },
      { ring: "cup-outboard", sector: 35, findings: 1, maxSeverity: 2 }, // 350..10 touches 350-360 and 0-10
      { ring: "cup-inboard", sector: 17, findings: 1, maxSeverity: 1 },
      { ring: "cup-inboard", sector: 18, findings: 1, maxSeverity: 1 },
    ]);
  });

  it("adds up database span groups the same way", () => {
    const cells = sumSpanGroups([
      { ring: "cone-outboard", severity: 2, first: 35, count: 2, findings: 5 },
      { ring: "cone-outboard", severity: 3, first: 0, count: 1, findings: 1 },
    ]);
    expect(cells).toEqual([
      { ring: "cone-outboard", sector: 0, findings: 6, maxSeverity: 3 },
      { ring: "cone-outboard", sector: 35, findings: 5, maxSeverity: 2 },
    ]);
  });
});
