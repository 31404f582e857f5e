// The tallies page's roll-ups (tally_cells, recurrence_car_counts, recurrence_lot_counts) are kept by
// triggers on cases. After inserts, single and many-row updates (status, verdict, removal day, site,
// class, trigger, car, lot), reopening and deletes, each must equal a full recount from the cases, and
// an inspector's counts must equal a count of the cases they may read at their own shop.
import { and, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { tallyCounts } from "@/db/queries/tallies/counts";
import { db, pool, t } from "../../support/db";
import { createCase, userId } from "../../support/factories";
import { makeSites, rng, tag } from "./casebook";
import { reopenAndResign } from "../../support/reopen-resign";

const CLASS = tag();
const OTHER_CLASS = tag();

/** Rows of the roll-up that a recount does not give, and the other way round, in one snapshot. */
async function differences(rollUp: string, recount: string): Promise<{ extra: unknown[]; missing: unknown[] }> {
  const { rows } = await pool.query<{ side: string; r: unknown }>(`
    with roll as (${rollUp}), fresh as (${recount})
    select 'extra' as side, to_jsonb(x) as r from (select * from roll except all select * from fresh) x
    union all
    select 'missing', to_jsonb(y) from (select * from fresh except all select * from roll) y`);
  return {
    extra: rows.filter((r) => r.side === "extra").map((r) => r.r),
    missing: rows.filter((r) => r.side === "missing").map((r) => r.r),
  };
}

const clusterable = `status = 'signed' and removed_on is not null and primary_cause is not null`;
const ROLL_UPS = {
  tally_cells: {
    rollUp: `select month, site_id, bearing_class, trigger, signed, primary_cause, outcome, n::bigint from tally_cells where n <> 0`,
    recount: `select date_trunc('month', removed_on::timestamp)::date, site_id, bearing_class, trigger, status = 'signed', primary_cause, removal_confirmed, count(*)
      from cases group by 1, 2, 3, 4, 5, 6, 7`,
  },
  recurrence_car_counts: {
    rollUp: `select car_mark, car_number, primary_cause, n::bigint from recurrence_car_counts where n <> 0`,
    recount: `select car_mark, car_number, primary_cause, count(*) from cases where ${clusterable} and car_mark <> '' and car_number <> '' group by 1, 2, 3`,
  },
  recurrence_lot_counts: {
    rollUp: `select lot, primary_cause, n::bigint from recurrence_lot_counts where n <> 0`,
    recount: `select lot, primary_cause, count(*) from cases where ${clusterable} and coalesce(lot, '') <> '' group by 1, 2`,
  },
};

async function expectExact() {
  for (const [name, q] of Object.entries(ROLL_UPS)) {
    expect({ name, ...(await differences(q.rollUp, q.recount)) }).toEqual({ name, extra: [], missing: [] });
    const negative = await pool.query(`select * from ${name} where n < 0`);
    expect(negative.rows).toEqual([]);
  }
}

let ids: string[] = [];
let sites: Record<"A" | "B", string>;

beforeAll(async () => {
  const made = await makeSites(CLASS);
  sites = { A: made.A, B: made.B };
  const r = rng(2031);
  const people = [await userId("inspector"), await userId("analyst")];
  for (let i = 0; i < 50; i++) {
    const status = r.pick(["signed", "signed", "bench", "field"] as const);
    const row = await createCase({
      bearingClass: r.pick([CLASS, OTHER_CLASS]),
      status,
      trigger: r.pick(["wayside-hot", "hand-roll", "end-play-high"] as const),
      primaryCause: status === "signed" ? r.pick(["seal", "water-ingress", null] as const) : null,
      removalConfirmed: status === "signed" ? r.pick(["confirmed", "no-defect", null] as const) : null,
      siteId: r.pick([sites.A, sites.B]),
      createdBy: r.pick(people),
      carMark: r.pick(["RLUX", ""]),
      carNumber: String(r.int(1, 3)),
      lot: r.pick([`${CLASS}-1`, `${CLASS}-2`, "", null]),
      removedOn: r.next() < 0.1 ? null : `1986-${String(r.int(1, 12)).padStart(2, "0")}-${String(r.int(1, 28)).padStart(2, "0")}`,
    });
    ids.push(row.id);
  }
});

describe("tallies roll-ups", () => {
  it("equal a full recount after inserts", async () => {
    await expectExact();
  });

  it("give an inspector the cases they may read at their own shop, counted from the cases", async () => {
    const inspector = { id: await userId("inspector"), role: "inspector", siteId: sites.A };
    const { cube, months } = await tallyCounts({ cluster: "site", window: 30 }, inspector);
    const { rows } = await pool.query<{ signed: number; all: number }>(
      `select (count(*) filter (where status = 'signed'))::int as signed, (count(*) filter (where removed_on is not null))::int as all
       from cases where site_id = $1`,
      [sites.A],
    );
    expect(cube.reduce((s, c) => s + c.count, 0)).toBe(rows[0].signed);
    expect(months.reduce((s, m) => s + m.count, 0)).toBe(rows[0].all);
    expect(cube.every((c) => c.siteId === sites.A)).toBe(true);
    expect(rows[0].signed).toBeGreaterThan(0);
  });

  it("equal a full recount after single and many-row updates of every counted column", async () => {
    await db.update(t.cases).set({ status: "signed", primaryCause: "impact", removalConfirmed: "confirmed" }).where(eq(t.cases.id, ids[0]));
    await db
      .update(t.cases)
      .set({ removedOn: "1986-02-28" })
      .where(inArray(t.cases.id, ids.slice(1, 10)));
    await db
      .update(t.cases)
      .set({ siteId: sites.B, trigger: "seal-grease" })
      .where(inArray(t.cases.id, ids.slice(10, 20)));
    await db
      .update(t.cases)
      .set({ bearingClass: OTHER_CLASS, removedOn: null })
      .where(inArray(t.cases.id, ids.slice(20, 25)));
    await db
      .update(t.cases)
      .set({ carNumber: "9", lot: `${CLASS}-3` })
      .where(inArray(t.cases.id, ids.slice(25, 35)));
    await db
      .update(t.cases)
      .set({ updatedAt: new Date() })
      .where(inArray(t.cases.bearingClass, [CLASS, OTHER_CLASS]));
    await expectExact();
  });

  it("equal a full recount after signed cases are reopened, then signed again with another verdict", async () => {
    const signed = await db
      .select({ id: t.cases.id })
      .from(t.cases)
      .where(and(eq(t.cases.bearingClass, CLASS), eq(t.cases.status, "signed")));
    const chosen = signed.slice(0, 6).map((c) => c.id);
    expect(chosen.length).toBeGreaterThan(2);
    await reopenAndResign(chosen, expectExact);
    await expectExact();
  });

  it("equal a full recount after deletes", async () => {
    await db.delete(t.cases).where(inArray(t.cases.id, ids.slice(0, 20)));
    ids = ids.slice(20);
    await expectExact();
  });
});
