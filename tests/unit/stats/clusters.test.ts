import { describe, expect, it } from "vitest";
import { findClusters, type ClusterEvent } from "@/lib/stats/clusters";

const ev = (id: string, key: string, cause: string, date: string): ClusterEvent => ({ id, key, cause, date });

describe("findClusters", () => {
  it("finds two removals of one car for one cause within the window (default size 2 for a car)", () => {
    const clusters = findClusters(
      [
        ev("a", "CAR 1001", "water-ingress", "2025-01-01"),
        ev("b", "CAR 1001", "water-ingress", "2025-01-20"),
        ev("c", "CAR 1001", "seal", "2025-01-05"),
        ev("d", "CAR 2002", "water-ingress", "2025-01-02"),
      ],
      { keyKind: "car", windowDays: 30 },
    );
    expect(clusters).toHaveLength(1);
    expect(clusters[0]).toMatchObject({ key: "CAR 1001", cause: "water-ingress", memberIds: ["a", "b"] });
    expect(clusters[0].firstDate.toISOString().slice(0, 10)).toBe("2025-01-01");
    expect(clusters[0].lastDate.toISOString().slice(0, 10)).toBe("2025-01-20");
  });

  it("needs three at a site by default and respects the window edge", () => {
    const events = [
      ev("1", "North yard", "electrical", "2025-03-01"),
      ev("2", "North yard", "electrical", "2025-03-10"),
      ev("3", "North yard", "electrical", "2025-03-31"), // 30 days after the first: inside a 30-day window
      ev("4", "North yard", "electrical", "2025-06-01"),
    ];
    const clusters = findClusters(events, { keyKind: "site", windowDays: 30 });
    expect(clusters.map((c) => c.memberIds)).toEqual([["1", "2", "3"]]);
    expect(findClusters(events, { keyKind: "site", windowDays: 29 })).toEqual([]);
    expect(findClusters(events.slice(0, 2), { keyKind: "site", windowDays: 30 })).toEqual([]);
  });

  it("merges overlapping windows into one cluster and keeps separate bursts apart", () => {
    const events = [
      ev("p", "LOT 7", "material", "2025-01-01"),
      ev("q", "LOT 7", "material", "2025-01-08"),
      ev("r", "LOT 7", "material", "2025-01-15"),
      ev("s", "LOT 7", "material", "2025-05-01"),
      ev("t", "LOT 7", "material", "2025-05-03"),
    ];
    const clusters = findClusters([...events].reverse(), { keyKind: "lot", windowDays: 10 });
    expect(clusters.map((c) => c.memberIds)).toEqual([
      ["p", "q", "r"],
      ["s", "t"],
    ]);
    // p..r span 14 days: no 10-day window holds three of them, a 14-day one does
    expect(findClusters(events, { keyKind: "lot", windowDays: 10, minSize: 3 })).toEqual([]);
    expect(findClusters(events, { keyKind: "lot", windowDays: 14, minSize: 3 }).map((c) => c.memberIds)).toEqual([["p", "q", "r"]]);
  });

  it("accepts Date objects and rejects bad dates", () => {
    const d = new Date("2025-02-01T00:00:00Z");
    const clusters = findClusters(
      [
        { id: "x", key: "K", cause: "seal", date: d },
        { id: "y", key: "K", cause: "seal", date: "2025-02-02T12:00:00Z" },
      ],
      { keyKind: "car" },
    );
    expect(clusters).toHaveLength(1);
    expect(() => findClusters([ev("z", "K", "seal", "not a date")], { keyKind: "car" })).toThrow(RangeError);
    expect(findClusters([], { keyKind: "site" })).toEqual([]);
  });
});
