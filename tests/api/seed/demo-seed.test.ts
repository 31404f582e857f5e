// The demo casebook as loaded before the suite: the stories the charts should tell are there,
// and every stored case obeys the app's rules. Only demo cases are counted (filed before the demo's
// end date, numbers below the large generator's range), so cases other tests create do not matter.
import { sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { summariseFieldChecks } from "@/lib/cases/compute";
import { fieldChecksSchema } from "@/lib/cases/schemas";
import { ROOT_CAUSES, TRIGGERS } from "@/lib/classification";
import { weibullMle } from "@/lib/stats";
import { db } from "../../support/db";

type Row = Record<string, unknown>;
const DEMO = sql`c.created_at <= '2026-11-30T16:00:00Z' and split_part(c.number, '-', 3)::int < 50000`;
const rows = async <T = Row>(q: ReturnType<typeof sql>) => (await db.execute(q)).rows as T[];

let demo: Row[];
beforeAll(async () => {
  demo = await rows(
    sql`select c.*, s.code as site_code, l.code as lab_code from cases c join sites s on s.id = c.site_id left join sites l on l.id = c.lab_site_id where ${DEMO}`,
  );
});

describe("demo casebook coverage", () => {
  it("holds about 150 cases in every stage, trigger, cause and shop", () => {
    expect(demo.length).toBeGreaterThanOrEqual(140); // demo scenario: about 150 cases
    expect(new Set(demo.map((c) => c.status))).toEqual(new Set(["field", "bench", "signoff", "signed"]));
    expect(new Set(demo.map((c) => c.trigger))).toEqual(new Set(TRIGGERS.map((t) => t.code)));
    expect(new Set(demo.map((c) => c.primary_cause).filter(Boolean))).toEqual(new Set(ROOT_CAUSES.map((c) => c.code)));
    expect(new Set(demo.map((c) => c.site_code))).toEqual(new Set(["MJC", "PYC", "OSW"]));
    expect(new Set(demo.map((c) => c.lab_code).filter(Boolean))).toEqual(new Set(["CFL"]));
    const signed = demo.filter((c) => c.status === "signed").length;
    expect(signed / demo.length).toBeGreaterThan(0.7); // demo scenario: most cases signed
  });

  it("spreads removals over the 24 months before 2026-11-30, numbered by removal year", () => {
    const days = demo.map((c) => String(c.removed_on)).sort();
    expect(days[0] >= "2024-11-30").toBe(true);
    expect(days.at(-1)! <= "2026-11-30").toBe(true);
    for (const c of demo) expect(String(c.number).slice(3, 5)).toBe(String(c.removed_on).slice(2, 4));
  });
});

describe("demo stories", () => {
  const share = (list: Row[]) => list.filter((c) => c.removal_confirmed === "no-defect").length / list.length;
  const decided = (pred: (c: Row) => boolean) => demo.filter((c) => c.removal_confirmed && pred(c));

  it("Pellham Yard's hand-roll removals are far more often not confirmed than Marrow Junction's", () => {
    const pyc = decided((c) => c.trigger === "hand-roll" && c.site_code === "PYC");
    const mjc = decided((c) => c.trigger === "hand-roll" && c.site_code === "MJC");
    expect(pyc.length).toBeGreaterThanOrEqual(10);
    expect(share(pyc) - share(mjc)).toBeGreaterThan(0.3); // demo scenario: a clear training signal
  });

  it("about 40% of wayside hot-bearing removals found no defect", () => {
    // About 40% of removals after a wayside alarm are not verified at teardown (UTRGV UTCRS bearing studies).
    const hot = decided((c) => c.trigger === "wayside-hot");
    expect(share(hot)).toBeGreaterThan(0.3);
    expect(share(hot)).toBeLessThan(0.5);
  });

  it("has a run of water etch in spring 2025", async () => {
    const water = await rows<{ removed_on: string }>(sql`
      select c.removed_on::text from cases c where ${DEMO} and c.primary_cause = 'water-ingress'
        and exists (select 1 from findings f where f.case_id = c.id and f.damage_code = 'corrosion.moisture')
        and (exists (select 1 from findings f where f.case_id = c.id and f.damage_code = 'lubricant.water') or c.lubricant->'conditions' ? 'water')`);
    const spring = water.filter((w) => w.removed_on >= "2025-03-01" && w.removed_on <= "2025-06-30");
    expect(spring.length).toBeGreaterThanOrEqual(6); // demo scenario: a wet-season run
    expect(spring.length / water.length).toBeGreaterThan(0.5);
  });

  it("has a cluster of arc burns at one shop within a few weeks", async () => {
    const arcs = await rows<{ site: string; day: string }>(sql`
      select s.code as site, c.removed_on::text as day from cases c join sites s on s.id = c.site_id
      where ${DEMO} and c.trigger = 'welding' and c.primary_cause = 'electrical'
        and exists (select 1 from findings f where f.case_id = c.id and f.damage_code = 'electrical.arc') order by 2`);
    const best = Math.max(
      ...arcs.map(
        (a) => arcs.filter((b) => b.site === a.site && b.day >= a.day && Date.parse(b.day) - Date.parse(a.day) <= 35 * 86_400_000).length,
      ),
    );
    expect(best).toBeGreaterThanOrEqual(4); // demo scenario: shop welding burns several bearings
  });

  it("wears out late at end of life and fails early after reconditioning or mounting", () => {
    const life = (causes: string[]) =>
      demo
        .filter((c) => causes.includes(String(c.primary_cause)) && c.service_months)
        .map((c) => ({ time: Number(c.service_months), failed: true }));
    // Weibull shape above 1 means wear-out, below about 1 early failures (Abernethy, The New Weibull Handbook).
    expect(weibullMle(life(["end-of-life"])).beta).toBeGreaterThan(2);
    expect(weibullMle(life(["reconditioning", "mounting"])).beta).toBeLessThan(1.3);
  });

  it("has cars that came back and a bearing lot with several failures, linked both ways", async () => {
    const cars = await rows<{ n: number }>(
      sql`select count(*)::int as n from cases c where ${DEMO} group by c.car_mark, c.car_number having count(*) > 1`,
    );
    expect(cars.length).toBeGreaterThanOrEqual(2);
    const lots = await rows<{ n: number }>(
      sql`select count(*)::int as n from cases c where ${DEMO} and c.lot is not null and c.primary_cause = 'material' group by c.lot order by 1 desc limit 1`,
    );
    expect(lots[0].n).toBeGreaterThanOrEqual(4);
    const oneWay = await rows(sql`select 1 from case_links a join cases c on c.id = a.case_id where ${DEMO}
      and not exists (select 1 from case_links b where b.case_id = a.related_id and b.related_id = a.case_id)`);
    expect(oneWay).toEqual([]);
  });
});

describe("demo cases obey the app's rules", () => {
  it("signed cases carry a signer, a time and a primary cause consistent with the outcome", () => {
    for (const c of demo.filter((x) => x.status === "signed")) {
      expect(c.signed_by && c.signed_at && c.primary_cause, String(c.number)).toBeTruthy();
      if (c.primary_cause === "no-defect") expect(c.removal_confirmed).toBe("no-defect");
      else if (c.primary_cause !== "undetermined") expect(c.removal_confirmed).toBe("confirmed");
    }
  });

  it("stores the field call and end-play mean that the field checks compute to", async () => {
    const policies = await rows<{ id: string; max: number; dial: number; tape: number }>(
      sql`select id, end_play_max_in::float as max, dial_spread_in::float as dial, tape_spread_in::float as tape from sites`,
    );
    for (const c of demo) {
      const p = policies.find((s) => s.id === c.site_id)!;
      const again = summariseFieldChecks(
        fieldChecksSchema.parse(c.field_checks),
        { maxIn: p.max, dialSpreadIn: p.dial, tapeSpreadIn: p.tape },
        c.trigger as string,
      );
      expect(c.field_call, String(c.number)).toBe(again.fieldCall);
      expect(c.end_play_mean_in === null ? null : Number(c.end_play_mean_in)).toBe(again.endPlayMeanIn);
    }
  });

  it("keeps a history for every stage step, with reasons for returns and reopenings", async () => {
    const steps = await rows<{ status: string; actions: string[]; reasons: number }>(sql`
      select c.status, array_agg(e.action order by e.at) as actions, count(e.reason)::int as reasons
      from cases c join case_events e on e.case_id = c.id where ${DEMO} group by c.id`);
    expect(steps.length).toBe(demo.length);
    for (const s of steps) {
      expect(s.actions[0]).toBe("created");
      if (s.status !== "field") expect(s.actions).toContain("receive");
      if (s.status === "signed") expect(s.actions.at(-1)).toBe("sign");
    }
    expect(steps.filter((s) => s.actions.includes("return") && s.status === "signed").length).toBeGreaterThanOrEqual(2);
    expect(steps.some((s) => s.actions.includes("reopen"))).toBe(true);
    for (const s of steps.filter((x) => x.actions.includes("return") || x.actions.includes("reopen"))) expect(s.reasons).toBeGreaterThan(0);
  });
});
