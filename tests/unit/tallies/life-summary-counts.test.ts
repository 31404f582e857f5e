// The life section summarises every cause from the counted rows; it must give what the same fit
// over one unit per removal gives (the two paths share the Weibull MLE and Fisher bounds).
import { describe, expect, it } from "vitest";
import {
  countedFor,
  countedFromTotals,
  lifeTotalsOf,
  summariseCause,
  summariseEveryCause,
  summariseTotals,
  unitsFor,
  type FleetCountRow,
  type LifeCountRow,
} from "@/lib/tallies/life";

// Invented counts: two causes over 1..60 months, some lives without a cause, and fleet survivors.
const rows: LifeCountRow[] = [];
for (let t = 1; t <= 60; t++) {
  rows.push({ cause: "water-ingress", time: t, count: 1 + (t % 4) });
  rows.push({ cause: "fatigue", time: t, count: t % 3 });
  if (t % 10 === 0) rows.push({ cause: null, time: t, count: 2 });
}
const fleet: FleetCountRow[] = [
  { time: 30, count: 40 },
  { time: 72, count: 25 },
];

describe("summariseEveryCause", () => {
  it("matches the unit-by-unit summary for every cause", () => {
    for (const cause of ["water-ingress", "fatigue"]) {
      const a = summariseEveryCause(rows, fleet).find((s) => s.cause === cause)!;
      const b = summariseCause(cause, unitsFor(cause, rows, fleet));
      expect(a.failures).toBe(b.failures);
      expect(a.suspensions).toBe(b.suspensions);
      expect(a.fit!.beta).toBeCloseTo(b.fit!.beta, 9);
      expect(a.fit!.eta).toBeCloseTo(b.fit!.eta, 6);
      expect(a.fit!.betaBounds[0]).toBeCloseTo(b.fit!.betaBounds[0], 9);
    }
  });

  it("refuses the same data the unit path refuses, in the same words", () => {
    const one: LifeCountRow[] = [
      { cause: "seal", time: 12, count: 1 },
      { cause: "other", time: 20, count: 5 },
    ];
    expect(summariseEveryCause(one, []).find((s) => s.cause === "seal")!.note).toBe(summariseCause("seal", unitsFor("seal", one, [])).note);
    const same: LifeCountRow[] = [
      { cause: "seal", time: 12, count: 3 },
      { cause: "other", time: 20, count: 5 },
    ];
    expect(summariseEveryCause(same, []).find((s) => s.cause === "seal")!.note).toBe(
      summariseCause("seal", unitsFor("seal", same, [])).note,
    );
  });
});

describe("the life section from the database's totals", () => {
  it("summarises every cause as from the counted rows", () => {
    const totals = lifeTotalsOf(rows);
    expect(summariseTotals(totals, fleet)).toEqual(summariseEveryCause(rows, fleet));
    // the totals hold every life once, whatever its cause
    expect(totals.byTime.reduce((s, b) => s + b.count, 0)).toBe(rows.reduce((s, r) => s + r.count, 0));
  });

  it("rebuilds one cause's failures and suspensions from its own lives and the totals", () => {
    const byTime = lifeTotalsOf(rows).byTime;
    for (const cause of ["water-ingress", "fatigue"]) {
      const own = rows.filter((r) => r.cause === cause && r.count > 0).map((r) => ({ time: r.time, count: r.count }));
      const key = (g: { time: number; failed: boolean; count: number }) => `${g.failed}|${g.time}|${g.count}`;
      expect(countedFromTotals(own, byTime, fleet).map(key).sort()).toEqual(
        countedFor(cause, rows, fleet)
          .filter((g) => g.count > 0)
          .map(key)
          .sort(),
      );
    }
  });
});
