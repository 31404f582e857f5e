import { describe, expect, it } from "vitest";
import { bandPath, clockPoint, damageArcs, severityColour } from "@/lib/report/damage-map";
import { clockWords } from "@/lib/report/format";

// Clock convention (product domain notes): 0° = 12 o'clock, clockwise seen from the outboard end.
describe("clock geometry", () => {
  it("puts 0° at the top, 90° at the right (3 o'clock) and 180° at the bottom", () => {
    const close = (p: [number, number], q: [number, number]) => {
      expect(p[0]).toBeCloseTo(q[0], 9);
      expect(p[1]).toBeCloseTo(q[1], 9);
    };
    close(clockPoint(100, 100, 50, 0), [100, 50]);
    close(clockPoint(100, 100, 50, 90), [150, 100]);
    close(clockPoint(100, 100, 50, 180), [100, 150]);
    close(clockPoint(100, 100, 50, 270), [50, 100]);
  });

  it("names clock positions to the nearest half hour (30° per hour on a clock face)", () => {
    expect(clockWords(0)).toBe("12 o'clock (0°)");
    expect(clockWords(60)).toBe("2 o'clock (60°)");
    expect(clockWords(75)).toBe("2:30 (75°)");
    expect(clockWords(350)).toBe("11:30 (350°)");
    expect(clockWords(-90)).toBe("9 o'clock (270°)");
  });
});

describe("bandPath", () => {
  it("draws a quarter band as two arcs joined by straight ends", () => {
    const d = bandPath(0, 0, 5, 10, 0, 90);
    expect(d).toBe("M 0 -10 A 10 10 0 0 1 10 0 L 5 0 A 5 5 0 0 0 0 -5 Z");
  });

  it("uses the large-arc flag past half a turn and two half circles for a full ring", () => {
    expect(bandPath(0, 0, 5, 10, 0, 270)).toContain("A 10 10 0 1 1");
    expect(bandPath(0, 0, 5, 10, 0, 360).match(/A /g)).toHaveLength(4);
  });
});

describe("damageArcs", () => {
  const f = (over: Record<string, unknown>) => ({ id: "x", component: "cup", row: null, damageCode: "fatigue.subsurface", severity: 3, clockDeg: 30, arcDeg: 20, zone: null, lengthMm: null, widthMm: null, notes: "", ...over });

  it("draws a cup finding without a row on both rows, centred on its clock position", () => {
    const { arcs } = damageArcs([f({})], () => "Spall");
    expect(arcs.map((a) => [a.ring, a.row, a.startDeg, a.endDeg])).toEqual([
      ["cup", "inboard", 20, 40],
      ["cup", "outboard", 20, 40],
    ]);
  });

  it("leaves rollers and findings without a clock position off the map", () => {
    const { arcs, offMap } = damageArcs([f({ component: "rollers-inboard" }), f({ clockDeg: null }), f({ component: "cone-outboard" })], () => "");
    expect(arcs).toHaveLength(1);
    expect(arcs[0]).toMatchObject({ ring: "cone", row: "outboard" });
    expect(offMap).toBe(2);
  });

  it("colours by severity and clamps out-of-range values", () => {
    expect(severityColour(0)).toBe("#94a3b8");
    expect(severityColour(9)).toBe(severityColour(4));
  });
});
