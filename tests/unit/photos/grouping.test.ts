import { describe, expect, it } from "vitest";
import { displayOrder, findingLabel, groupByComponent } from "@/lib/photos/grouping";

const p = (id: string, component: string | null, takenAt: string | null, createdAt = "2026-06-01T00:00:00Z") => ({
  id,
  component,
  takenAt,
  createdAt,
});

describe("grouping photos by part", () => {
  it("follows the part list order (cup before cones before rollers) and puts untagged photos last", () => {
    const groups = groupByComponent([
      p("1", null, null),
      p("2", "rollers-inboard", null),
      p("3", "cup", null),
      p("4", "cone-inboard", null),
    ]);
    expect(groups.map((g) => g.code)).toEqual(["cup", "cone-inboard", "rollers-inboard", "untagged"]);
    expect(groups[0].label).toBe("Cup");
  });

  it("orders each group by time taken, else by upload time", () => {
    const groups = groupByComponent([
      p("late", "cup", "2026-03-02T10:00:00Z"),
      p("early", "cup", "2026-03-01T10:00:00Z"),
      p("upl", "cup", null, "2026-02-01T00:00:00Z"),
    ]);
    expect(groups[0].photos.map((x) => x.id)).toEqual(["upl", "early", "late"]);
  });

  it("keeps a part code it does not know, after the known ones", () => {
    const order = displayOrder([p("a", "adapter-pad", null), p("b", "journal", null), p("c", null, null)]);
    expect(order.map((x) => x.component)).toEqual(["journal", "adapter-pad", null]);
  });
});

describe("finding labels", () => {
  it("name the part, damage, severity and clock position", () => {
    expect(findingLabel({ id: "f", component: "cup", row: "inboard", damageCode: "fatigue.subsurface", severity: 3, clockDeg: 90 })).toBe(
      "Cup · inboard row · Subsurface spall · severity 3 · 3 o'clock (90°)",
    );
    expect(findingLabel({ id: "f", component: "cone-inboard", row: "inboard", damageCode: "no.such", severity: 1, clockDeg: null })).toBe(
      "Cone, inboard · no.such · severity 1",
    );
  });
});
