// The removal-yield API against counts made here from the cases this file inserts (isolated by a
// bearing class of their own at two test sites, one with a cost per removal), and who sees whose calls.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import type { YieldData } from "@/lib/tallies/yield-data";
import { ApiClient, as } from "../../support/api";
import { db, t } from "../../support/db";
import { createCase, userId } from "../../support/factories";
import { makeSites, rng, tag, wilson } from "./casebook";

const CLASS = tag();
const COST_A = 4250; // invented cost per removal at test site A

type Spec = {
  site: "A" | "B" | "MJC";
  by: "inspector" | "pellham" | "analyst";
  status: "signed" | "bench";
  trigger: "wayside-hot" | "wayside-acoustic" | "hand-roll";
  outcome: "confirmed" | "no-defect" | null;
  call: "remove" | "keep";
  margin: number;
  threshold: number;
  detector: string;
  level: string;
  car: string;
  axle: number;
  side: "L" | "R";
  removedOn: string;
};
let list: Spec[] = [];

function build(): Spec[] {
  const r = rng(1717);
  const out: Spec[] = [];
  for (let i = 0; i < 90; i++) {
    const trigger = r.pick(["wayside-hot", "wayside-hot", "wayside-acoustic", "hand-roll"] as const);
    const margin = r.int(1, 80);
    // confirmation more likely with the margin, so the fit has something to find
    const confirmed = r.next() < 0.2 + margin / 110;
    const status = r.next() < 0.85 ? "signed" : "bench";
    out.push({
      site: r.pick(["A", "B", "MJC"] as const),
      by: r.pick(["inspector", "pellham", "analyst"] as const),
      status,
      trigger,
      outcome: status === "signed" ? (r.next() < 0.08 ? null : confirmed ? "confirmed" : "no-defect") : null,
      call: r.next() < 0.8 ? "remove" : "keep",
      margin,
      threshold: r.pick([170, 200]),
      detector: r.pick(["TD-1", "TD-2", "TD-3"]),
      level: r.pick(["level 2", "level 3"]),
      car: r.pick(["YLDX 1", "YLDX 2", "YLDX 3", "YLDX 4"]),
      axle: r.int(1, 2),
      side: r.pick(["L", "R"] as const),
      removedOn: `1991-${String(r.int(1, 12)).padStart(2, "0")}-${String(r.int(1, 28)).padStart(2, "0")}`,
    });
  }
  return out;
}

const signedWithOutcome = (s: Spec) => s.status === "signed" && s.outcome !== null;
const days = (a: string, b: string) => (Date.parse(b) - Date.parse(a)) / 86400000;

/** Keep calls followed by a removal of the same car and position within the window, counted here. */
function missed(keeps: Spec[], all: Spec[], window: number): number {
  return keeps.filter((k) =>
    all.some(
      (o) =>
        o !== k &&
        o.car === k.car &&
        o.axle === k.axle &&
        o.side === k.side &&
        days(k.removedOn, o.removedOn) > 0 &&
        days(k.removedOn, o.removedOn) <= window,
    ),
  ).length;
}

let siteIds: Record<"A" | "B" | "MJC", string>;
/** Each site's cost per removal as stored (the demo shop MJC has its own; B has none). */
let costOf: Record<"A" | "B" | "MJC", number | null>;
const priced = (xs: Spec[]) => xs.reduce((sum, s) => sum + (costOf[s.site] ?? 0), 0);
const unpriced = (xs: Spec[]) => xs.filter((s) => costOf[s.site] === null).length;
let people: Record<Spec["by"], string>;

beforeAll(async () => {
  const sites = await makeSites(CLASS);
  siteIds = { A: sites.A, B: sites.B, MJC: sites.MJC };
  await db.update(t.sites).set({ removalCostUsd: COST_A }).where(eq(t.sites.id, sites.A));
  const [mjc] = await db.select({ cost: t.sites.removalCostUsd }).from(t.sites).where(eq(t.sites.id, sites.MJC));
  costOf = { A: COST_A, B: null, MJC: mjc.cost };
  people = {
    inspector: await userId("inspector"),
    pellham: (await db.select({ id: t.user.id }).from(t.user).where(eq(t.user.email, "inspector.pellham@sable-river.example")))[0].id,
    analyst: await userId("analyst"),
  };
  list = build();
  for (const s of list) {
    const [mark, number] = s.car.split(" ");
    const detail =
      s.trigger === "wayside-hot"
        ? {
            readingF: s.threshold + s.margin,
            thresholdF: s.threshold,
            detectorId: s.detector,
            detectorLocation: `MP ${s.detector.slice(3)}0.0`,
          }
        : s.trigger === "wayside-acoustic"
          ? { alarmLevel: s.level, detectorId: s.detector, detectorLocation: `MP ${s.detector.slice(3)}0.0` }
          : { felt: "roughness" };
    await createCase({
      bearingClass: CLASS,
      status: s.status,
      trigger: s.trigger,
      triggerDetail: detail,
      primaryCause: s.status === "signed" ? (s.outcome === "no-defect" ? "no-defect" : "end-of-life") : null,
      removalConfirmed: s.outcome,
      fieldCall: s.call,
      siteId: siteIds[s.site],
      createdBy: people[s.by],
      removedOn: s.removedOn,
      carMark: mark,
      carNumber: number,
      axle: s.axle,
      side: s.side,
    });
  }
});

async function get(role: Parameters<typeof as>[0], query = ""): Promise<YieldData> {
  const res = await (await as(role)).json<YieldData>("GET", `/api/tallies/yield?class=${CLASS}${query}`);
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(200);
  return res.body;
}

describe("removal yield counts", () => {
  it("counts hot-bearing alarms by margin into the same bands as counted here, with Wilson intervals", async () => {
    const d = await get("manager");
    const hot = list.filter((s) => s.trigger === "wayside-hot" && signedWithOutcome(s));
    expect(d.hot.margin.n).toBe(hot.length);
    expect(d.hot.margin.confirmed).toBe(hot.filter((s) => s.outcome === "confirmed").length);
    expect(d.hot.margin.bins.reduce((a, b) => a + b.n, 0)).toBe(hot.length);
    for (const b of d.hot.margin.bins) {
      const mine = hot.filter((s) => s.margin >= b.from && s.margin < b.to);
      const yes = mine.filter((s) => s.outcome === "confirmed").length;
      expect([b.n, b.confirmed]).toEqual([mine.length, yes]);
      // Wilson (1927) closed form written out in casebook.ts
      const [lo, hi] = wilson(yes, mine.length);
      if (yes > 0 && yes < mine.length) {
        expect(b.rate.lower).toBeCloseTo(lo, 9);
        expect(b.rate.upper).toBeCloseTo(hi, 9);
      }
    }
    const readings = d.hot.reading.bins.reduce((a, b) => a + b.n, 0);
    expect(readings).toBe(hot.length);
    expect(d.hot.margin.fit, d.hot.margin.noFit ?? "").not.toBeNull();
    expect(d.hot.margin.fit!.slope).toBeGreaterThan(0);
  });

  it("counts each acoustic level and each detector, with the no-defect money at the site's cost", async () => {
    const d = await get("manager");
    for (const level of ["level 2", "level 3"]) {
      const mine = list.filter((s) => s.trigger === "wayside-acoustic" && signedWithOutcome(s) && s.level === level);
      const row = d.acoustic.find((r) => r.label === level);
      expect(row?.n ?? 0, level).toBe(mine.length);
      expect(row?.confirmed ?? 0).toBe(mine.filter((s) => s.outcome === "confirmed").length);
    }
    for (const id of ["TD-1", "TD-2", "TD-3"]) {
      for (const trigger of ["wayside-hot", "wayside-acoustic"] as const) {
        const all = list.filter((s) => s.trigger === trigger && s.detector === id);
        const row = d.detectors.rows.find(
          (r) => r.id === id && r.trigger === (trigger === "wayside-hot" ? "Wayside hot-bearing alarm" : "Wayside acoustic alarm"),
        );
        const done = all.filter(signedWithOutcome);
        const noDefect = done.filter((s) => s.outcome === "no-defect");
        expect(row?.alarms ?? 0, `${id} ${trigger}`).toBe(all.length);
        expect(row?.n ?? 0).toBe(done.length);
        expect(row?.confirmed ?? 0).toBe(done.filter((s) => s.outcome === "confirmed").length);
        expect(row?.costUsd ?? 0).toBeCloseTo(priced(noDefect), 6);
        expect(row?.uncosted ?? 0).toBe(unpriced(noDefect));
      }
    }
    const done = list.filter((s) => s.trigger !== "hand-roll" && signedWithOutcome(s));
    expect(d.detectors.fleet.n).toBe(done.length);
  });

  it("sums the no-defect money by trigger", async () => {
    const d = await get("manager");
    for (const row of d.cost.byTrigger) {
      const trigger = list.find((s) =>
        row.label
          .toLowerCase()
          .includes(s.trigger === "hand-roll" ? "hand roll" : s.trigger === "wayside-hot" ? "hot-bearing" : "acoustic"),
      );
      const mine = list.filter((s) => s.trigger === trigger!.trigger && s.status === "signed" && s.outcome === "no-defect");
      expect(row.noDefect).toBe(mine.length);
      expect(row.costUsd).toBeCloseTo(priced(mine), 6);
      expect(row.uncosted).toBe(unpriced(mine));
    }
    expect(d.cost.totalUsd).toBeCloseTo(priced(list.filter((s) => s.status === "signed" && s.outcome === "no-defect")), 6);
  });

  it("counts remove calls per shop and per person, and keep calls followed by a removal (missed)", async () => {
    const d = await get("manager", "&miss=60");
    expect(d.missWindow).toBe(60);
    for (const site of ["A", "B", "MJC"] as const) {
      const calls = list.filter((s) => s.site === site && s.call === "remove" && signedWithOutcome(s));
      const keeps = list.filter((s) => s.site === site && s.call === "keep");
      const row = d.calls.shops.find((r) => r.id === siteIds[site]);
      expect(row?.n ?? 0, site).toBe(calls.length);
      expect(row?.confirmed ?? 0).toBe(calls.filter((s) => s.outcome === "confirmed").length);
      expect(row?.keeps ?? 0).toBe(keeps.length);
      expect(row?.missed ?? 0).toBe(missed(keeps, list, 60));
    }
    for (const by of ["inspector", "pellham", "analyst"] as const) {
      const row = d.calls.inspectors.find((r) => r.id === people[by]);
      const calls = list.filter((s) => s.by === by && s.call === "remove" && signedWithOutcome(s));
      expect(row?.n ?? 0, by).toBe(calls.length);
      expect(row?.missed ?? 0).toBe(
        missed(
          list.filter((s) => s.by === by && s.call === "keep"),
          list,
          60,
        ),
      );
    }
    // managers see names
    expect(d.namesShown).toBe(true);
    expect(d.calls.inspectors.map((r) => r.label)).toContain("Dana Okafor");
  });

  it("narrows by the Tallies filters", async () => {
    const d = await get("manager", `&site=${CLASS}A&trigger=wayside-hot`);
    const hot = list.filter((s) => s.site === "A" && s.trigger === "wayside-hot" && signedWithOutcome(s));
    expect(d.hot.margin.n).toBe(hot.length);
    expect(d.acoustic).toEqual([]);
    expect(d.calls.shops.every((r) => r.id === siteIds.A)).toBe(true);
    expect(d.detectors.rows.every((r) => r.trigger === "Wayside hot-bearing alarm")).toBe(true);
  });
});

describe("who sees whose calls", () => {
  it("gives an inspector only their own calls at their own shop, without names", async () => {
    const d = await get("inspector");
    expect(d.ownCallsOnly).toBe(true);
    expect(d.namesShown).toBe(false);
    const own = list.filter((s) => s.by === "inspector" && s.site === "MJC");
    expect(d.calls.inspectors.map((r) => r.label)).toEqual(own.length ? ["You"] : []);
    const calls = own.filter((s) => s.call === "remove" && signedWithOutcome(s));
    expect(d.calls.inspectors[0]?.n ?? 0).toBe(calls.length);
    expect(d.calls.shops.map((r) => r.id)).toEqual([siteIds.MJC]);
    expect(d.calls.shops[0].n).toBe(calls.length);
    // the alarm figures are held to the inspector's shop
    expect(d.hot.margin.n).toBe(list.filter((s) => s.site === "MJC" && s.trigger === "wayside-hot" && signedWithOutcome(s)).length);
    expect(JSON.stringify(d)).not.toContain("Luis Ferreira");
  });

  it("shows analysts numbered inspectors, not names", async () => {
    const d = await get("analyst");
    expect(d.namesShown).toBe(false);
    expect(d.calls.inspectors.length).toBe(3);
    expect(d.calls.inspectors.every((r) => /^Inspector \d$|^You$/.test(r.label))).toBe(true);
    expect(JSON.stringify(d)).not.toContain("Dana Okafor");
  });

  it("refuses bad settings with a clear message and anyone not signed in", async () => {
    const res = await (await as("manager")).json<{ error: string }>("GET", `/api/tallies/yield?miss=0`);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain("at least 1 day");
    expect((await new ApiClient().json("GET", "/api/tallies/yield")).status).toBe(401);
  });
});
