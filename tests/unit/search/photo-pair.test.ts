import { describe, expect, it } from "vitest";
import { partsToCompare, pickPhotoPair } from "@/lib/search/photo-pair";

// Invented cases; the preference order (same damage, then same kind, then any damaged part) is common practice.
const target = [
  { component: "cup", damageCode: "fatigue.subsurface" },
  { component: "cone-inboard", damageCode: "corrosion.moisture" },
  { component: "seal-inboard", damageCode: "none" },
];
const similar = [
  { component: "cone-inboard", damageCode: "corrosion.fretting" },
  { component: "cup", damageCode: "fatigue.subsurface" },
  { component: "seal-inboard", damageCode: "none" },
];

describe("photo pairs for similar cases", () => {
  it("ranks the part with the same damage first, then the same family", () => {
    expect(partsToCompare(target, similar)).toEqual(["cup", "cone-inboard"]);
  });

  it("takes the first photo of the preferred part from each case", () => {
    const a = [
      { id: "a1", component: "cone-inboard" },
      { id: "a2", component: "cup" },
      { id: "a3", component: "cup" },
    ];
    const b = [
      { id: "b1", component: "cup" },
      { id: "b2", component: "cone-inboard" },
    ];
    expect(pickPhotoPair(a, b, partsToCompare(target, similar))).toEqual({ component: "cup", a: "a2", b: "b1" });
  });

  it("falls back to any part both photographed, or none", () => {
    const a = [{ id: "a1", component: "seal-inboard" }];
    const b = [
      { id: "b1", component: null },
      { id: "b2", component: "seal-inboard" },
    ];
    expect(pickPhotoPair(a, b, ["cup"])).toEqual({ component: "seal-inboard", a: "a1", b: "b2" });
    expect(pickPhotoPair(a, [{ id: "b1", component: "cup" }], ["cup"])).toBeNull();
  });
});
