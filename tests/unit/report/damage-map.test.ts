import { describe, expect, it } from "vitest";
import { damageArcs } from "@/lib/report/damage-map";

describe("damageArcs", () => {
  const f = (over: Record<string, unknown>) => ({
    id: "x",
    component: "cup",
    row: null,
    damageCode: "fatigue.subsurface",
    severity: 3,
    clockDeg: 30,
    arcDeg: 20,
    zone: null,
    lengthMm: null,
    widthMm: null,
    notes: "",
    ...over,
  });

  it("draws a cup finding without a row on both rows, centred on its clock position", () => {
    const { arcs } = damageArcs([f({})], () => "Spall");
    expect(arcs.map((a) => [a.ring, a.row, a.startDeg, a.endDeg])).toEqual([
      ["cup", "inboard", 20, 40],
      ["cup", "outboard", 20, 40],
    ]);
  });

  it("leaves rollers and findings without a clock position off the map", () => {
    const { arcs, offMap } = damageArcs(
      [f({ component: "rollers-inboard" }), f({ clockDeg: null }), f({ component: "cone-outboard" })],
      () => "",
    );
    expect(arcs).toHaveLength(1);
    expect(arcs[0]).toMatchObject({ ring: "cone", row: "outboard" });
    expect(offMap).toBe(2);
  });

  it("gives a finding without an extent a short mark centred on its clock position", () => {
    const { arcs } = damageArcs([f({ component: "cone-inboard", clockDeg: 90, arcDeg: null })], () => "");
    expect(arcs).toEqual([expect.objectContaining({ ring: "cone", row: "inboard", startDeg: 86, endDeg: 94, estimated: true })]); // 8° mark (POINT_ARC_DEG), arithmetic
  });
});
