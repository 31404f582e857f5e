// The tallies API against counts made here, independently, from the cases this file inserts
// (isolated by a bearing class of their own at two test sites).
import { beforeAll, describe, expect, it } from "vitest";
import { findClusters } from "@/lib/stats";
import { binFindings } from "@/lib/damage-map/rings";
import type { TalliesData } from "@/lib/tallies/types";
import { as } from "../../support/api";
import { countBy, insertCasebook, makeSites, specs, tag, wilson, type Inserted } from "./casebook";

const CLASS = tag();
let cases: Inserted[] = [];
let names: Record<string, string> = {};
let siteCodes: { A: string; B: string };
const signed = () => cases.filter((c) => c.status === "signed");

async function tallies(query: string): Promise<TalliesData> {
  const res = await (await as("manager")).json<TalliesData>("GET", `/api/tallies?class=${CLASS}&${query}`);
  expect(res.status).toBe(200);
  return res.body;
}

beforeAll(async () => {
  const sites = await makeSites(CLASS);
  names = sites.names;
  siteCodes = { A: `${CLASS}A`, B: `${CLASS}B` };
  cases = await insertCasebook(CLASS, specs(70, 4242, 1993), sites);
  // Three in the next year, to see the period filter leave them out.
  cases.push(...(await insertCasebook(CLASS, specs(3, 77, 1994), sites)));
});

describe("tallies over the test casebook", () => {
  it("totals removals at every stage and signed verdicts by teardown outcome", async () => {
    const d = await tallies("");
    const s = signed();
    expect(d.totals).toEqual({
      removals: cases.length,
      signed: s.length,
      confirmed: s.filter((c) => c.outcome === "confirmed").length,
      noDefect: s.filter((c) => c.outcome === "no-defect").length,
      outcomeNotRecorded: s.filter((c) => c.outcome === null).length,
    });
  });

  it("counts each root cause for the Pareto, largest first, running share ending at 1", async () => {
    const d = await tallies("");
    const expected = countBy(signed(), (c) => c.cause);
    expect(Object.fromEntries(d.pareto.map((p) => [p.code, p.count]))).toEqual(expected);
    expect(d.pareto.map((p) => p.count)).toEqual([...d.pareto.map((p) => p.count)].sort((a, b) => b - a));
    expect(d.pareto.at(-1)!.cumulativeShare).toBe(1);
  });

  it("crosses trigger with verdict and gives each trigger's confirmed share with its Wilson interval", async () => {
    const d = await tallies("");
    for (const trigger of new Set(signed().map((c) => c.trigger))) {
      const mine = signed().filter((c) => c.trigger === trigger);
      const confirmed = mine.filter((c) => c.outcome === "confirmed").length;
      const noDefect = mine.filter((c) => c.outcome === "no-defect").length;
      const row = d.triggerVerdict.find((r) => r.trigger === trigger)!;
      expect([row.confirmed, row.noDefect, row.notRecorded, row.total]).toEqual([
        confirmed,
        noDefect,
        mine.length - confirmed - noDefect,
        mine.length,
      ]);
      const rate = d.byTrigger.rows.find((r) => r.id === trigger)!;
      expect([rate.confirmed, rate.n]).toEqual([confirmed, confirmed + noDefect]);
      // Wilson (1927) closed form written out in casebook.ts, z = 1.959963985 to ten digits (fixture)
      const [lo, hi] = wilson(confirmed, confirmed + noDefect);
      expect(rate.rate.lower).toBeCloseTo(lo, 9);
      expect(rate.rate.upper).toBeCloseTo(hi, 9);
    }
  });

  it("gives each removal site its confirmed share, lowest first", async () => {
    const d = await tallies("");
    const rows = d.byShop.rows;
    expect(rows.map((r) => r.label).sort()).toEqual(
      Object.entries(names)
        .filter(([id]) => signed().some((c) => c.siteId === id))
        .map(([, n]) => n)
        .sort(),
    );
    for (const r of rows) {
      const mine = signed().filter((c) => c.siteId === r.id && c.outcome !== null);
      expect([r.confirmed, r.n]).toEqual([mine.filter((c) => c.outcome === "confirmed").length, mine.length]);
    }
    expect(rows[0].rate.p!).toBeLessThanOrEqual(rows[rows.length - 1].rate.p!);
  });

  it("tests cause x site with the Pearson statistic worked out here", async () => {
    const d = await tallies("");
    const t = d.causeSite;
    t.sites.forEach((s, i) =>
      t.causes.forEach((c, j) =>
        expect(t.counts[i][j]).toBe(signed().filter((x) => x.siteId === s.id && (x.cause ?? "") === c.code).length),
      ),
    );
    // Pearson (1900): sum over cells of (O - E)^2 / E with E = row total x column total / N
    const rows = t.counts.map((r) => r.reduce((a, b) => a + b, 0));
    const cols = t.causes.map((_, j) => t.counts.reduce((a, r) => a + r[j], 0));
    const n = rows.reduce((a, b) => a + b, 0);
    let x2 = 0;
    t.counts.forEach((r, i) =>
      r.forEach((o, j) => {
        const e = (rows[i] * cols[j]) / n;
        x2 += (o - e) ** 2 / e;
      }),
    );
    expect(t.statistic!).toBeCloseTo(x2, 9);
    expect(t.df).toBe((t.sites.length - 1) * (t.causes.length - 1));
  });

  it("counts removals per month over the chosen period, every stage and per cause", async () => {
    const d = await tallies("from=1993-01&to=1993-12");
    const in93 = cases.filter((c) => c.removedOn.startsWith("1993"));
    expect(d.totals.removals).toBe(in93.length);
    expect(d.monthly.months).toHaveLength(12);
    const all = d.monthly.series.find((s) => s.id === "all-removals")!;
    expect(all.counts).toEqual(d.monthly.months.map((m) => in93.filter((c) => c.removedOn.startsWith(m)).length));
    for (const s of d.monthly.series.filter((x) => !x.id.startsWith("all-"))) {
      expect(s.counts).toEqual(
        d.monthly.months.map((m) => in93.filter((c) => c.status === "signed" && c.cause === s.id && c.removedOn.startsWith(m)).length),
      );
    }
  });

  it("narrows every count by trigger and by site", async () => {
    const hot = await tallies("trigger=wayside-hot");
    expect(hot.totals.signed).toBe(signed().filter((c) => c.trigger === "wayside-hot").length);
    expect(hot.totals.removals).toBe(cases.filter((c) => c.trigger === "wayside-hot").length);
    const a = await tallies(`site=${siteCodes.A}`);
    expect(a.totals.removals).toBe(cases.filter((c) => c.site === "A").length);
    expect(a.byShop.rows.map((r) => r.label)).toEqual(
      signed().some((c) => c.site === "A") ? [names[cases.find((c) => c.site === "A")!.siteId]] : [],
    );
  });

  for (const [kind, keyOf] of [
    ["car", (c: Inserted) => c.car],
    ["lot", (c: Inserted) => c.lot],
    ["site", (c: Inserted) => c.siteId],
  ] as const) {
    it(`finds the same ${kind} clusters as the reference rule (findClusters)`, async () => {
      const d = await tallies(`cluster=${kind}&window=45`);
      const expected = findClusters(
        signed().map((c) => ({ id: c.number, key: keyOf(c), cause: c.cause!, date: c.removedOn })),
        { keyKind: kind, windowDays: 45 },
      );
      expect(d.clusters.total).toBe(expected.length);
      const got = d.clusters.items.map((c) => `${c.key}|${c.cause}|${c.firstDate}|${c.lastDate}|${c.size}`).sort();
      const want = expected
        .map(
          (c) =>
            `${c.key}|${c.cause}|${c.firstDate.toISOString().slice(0, 10)}|${c.lastDate.toISOString().slice(0, 10)}|${c.memberIds.length}`,
        )
        .sort();
      expect(got).toEqual(want);
      for (const item of d.clusters.items) {
        const ref = expected.find(
          (c) => c.key === item.key && c.cause === item.cause && c.firstDate.toISOString().startsWith(item.firstDate),
        )!;
        expect(new Set(item.caseNumbers).size).toBe(Math.min(24, ref.memberIds.length));
        expect(item.caseNumbers.every((n) => ref.memberIds.includes(n))).toBe(true);
      }
    });
  }

  it("sums the findings of signed cases into the same damage-map sectors as the one-case drawing", async () => {
    const d = await tallies("");
    const findings = signed().flatMap((c) => c.findings);
    const want = binFindings(findings);
    expect(d.damage.placed).toBe(want.placed);
    expect(d.damage.sectors).toEqual(want.sectors);
  });
});
