// The removal-yield roll-ups (yield_cells, yield_alarm_cells, keep_gaps) are kept by triggers on
// cases. After inserts, single and many-row updates, position changes and deletes, each roll-up must
// equal a full recount from the cases, made here with the page's own reading of the trigger detail.
import { and, eq, inArray, isNotNull } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, pool, t } from "../../support/db";
import { createCase, userId } from "../../support/factories";
import { makeSites, rng, tag } from "./casebook";
import { reopenAndResign } from "../../support/reopen-resign";

const CLASS = tag();

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

const month = `date_trunc('month', removed_on::timestamp)::date`;
const CELLS = {
  rollUp: `select month, site_id, bearing_class, trigger, created_by, remove_call, outcome, n::bigint from yield_cells where n <> 0`,
  recount: `select ${month}, site_id, bearing_class, trigger, created_by, coalesce(field_call = 'remove', false), removal_confirmed, count(*)
    from cases where status = 'signed' and removal_confirmed is not null group by 1, 2, 3, 4, 5, 6, 7`,
};
const ALARMS = {
  rollUp: `select month, site_id, bearing_class, trigger, created_by, signed, outcome, margin, reading, alarm_level, detector_id, detector_location, n::bigint from yield_alarm_cells where n <> 0`,
  recount: `select ${month}, site_id, bearing_class, trigger, created_by, status = 'signed', removal_confirmed,
      case when trigger = 'wayside-hot' and jsonb_typeof(trigger_detail->'readingF') = 'number' and jsonb_typeof(trigger_detail->'thresholdF') = 'number'
        then round((trigger_detail->>'readingF')::numeric - (trigger_detail->>'thresholdF')::numeric)::int end,
      case when trigger = 'wayside-hot' and jsonb_typeof(trigger_detail->'readingF') = 'number' then round((trigger_detail->>'readingF')::numeric)::int end,
      case when trigger = 'wayside-acoustic' then coalesce(nullif(trim(trigger_detail->>'alarmLevel'), ''), 'not recorded') end,
      nullif(trim(trigger_detail->>'detectorId'), ''), nullif(trim(trigger_detail->>'detectorLocation'), ''), count(*)
    from cases where trigger in ('wayside-hot', 'wayside-acoustic') group by 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12`,
};
const KEEPS = {
  rollUp: `select case_id, removed_on, site_id, bearing_class, trigger, created_by, next_any, next_same_site from keep_gaps`,
  recount: `select k.id, k.removed_on, k.site_id, k.bearing_class, k.trigger, k.created_by,
      (select min(l.removed_on) from cases l where l.car_mark = k.car_mark and l.car_number = k.car_number and l.axle = k.axle and l.side = k.side and l.removed_on > k.removed_on),
      (select min(l.removed_on) from cases l where l.car_mark = k.car_mark and l.car_number = k.car_number and l.axle = k.axle and l.side = k.side and l.removed_on > k.removed_on and l.site_id = k.site_id)
    from cases k where k.field_call = 'keep' and k.axle is not null and k.side is not null and k.removed_on is not null`,
};

async function expectExact() {
  for (const [name, q] of Object.entries({ CELLS, ALARMS, KEEPS })) {
    const d = await differences(q.rollUp, q.recount);
    expect({ name, ...d }).toEqual({ name, extra: [], missing: [] });
  }
}

let ids: string[] = [];
let sites: Record<"A" | "B", string>;

beforeAll(async () => {
  const made = await makeSites(CLASS);
  sites = { A: made.A, B: made.B };
  const r = rng(2017);
  const people = [await userId("inspector"), await userId("analyst")];
  for (let i = 0; i < 60; i++) {
    const trigger = r.pick(["wayside-hot", "wayside-acoustic", "hand-roll"] as const);
    const status = r.pick(["signed", "signed", "bench"] as const);
    const detail =
      trigger === "wayside-hot"
        ? r.next() < 0.1
          ? { readingF: "hot", thresholdF: 170 }
          : {
              readingF: 170 + r.int(0, 60) + 0.5,
              thresholdF: 170,
              detectorId: ` RU-${r.int(1, 3)} `,
              detectorLocation: r.pick(["MP 1.0", ""]),
            }
        : trigger === "wayside-acoustic"
          ? { alarmLevel: r.pick(["level 2", " ", "level 3"]), detectorId: `RU-${r.int(1, 3)}` }
          : {};
    const row = await createCase({
      bearingClass: CLASS,
      status,
      trigger,
      triggerDetail: detail,
      removalConfirmed: status === "signed" ? r.pick(["confirmed", "no-defect", null] as const) : null,
      fieldCall: r.pick(["remove", "remove", "keep", "undecided"] as const),
      siteId: r.pick([sites.A, sites.B]),
      createdBy: r.pick(people),
      carMark: "RLUX",
      carNumber: String(r.int(1, 4)),
      axle: r.int(1, 2),
      side: r.pick(["L", "R"] as const),
      removedOn: `1987-${String(r.int(1, 12)).padStart(2, "0")}-${String(r.int(1, 28)).padStart(2, "0")}`,
    });
    ids.push(row.id);
  }
});

describe("removal-yield roll-ups", () => {
  it("equal a full recount after inserts", async () => {
    await expectExact();
  });

  it("equal a full recount after single and many-row updates, including moved positions and changed readings", async () => {
    await db.update(t.cases).set({ status: "signed", removalConfirmed: "no-defect" }).where(eq(t.cases.id, ids[0]));
    await db
      .update(t.cases)
      .set({ fieldCall: "keep", axle: 3, removedOn: "1987-06-30" })
      .where(inArray(t.cases.id, ids.slice(1, 12)));
    await db
      .update(t.cases)
      .set({ triggerDetail: { readingF: 240, thresholdF: 200, detectorId: "RU-9" } })
      .where(inArray(t.cases.id, ids.slice(12, 20)));
    await db
      .update(t.cases)
      .set({ siteId: sites.B, carNumber: "2" })
      .where(inArray(t.cases.id, ids.slice(20, 30)));
    await db.update(t.cases).set({ updatedAt: new Date() }).where(eq(t.cases.bearingClass, CLASS));
    await expectExact();
  });

  it("equal a full recount after deletes", async () => {
    await db.delete(t.cases).where(inArray(t.cases.id, ids.slice(0, 25)));
    ids = ids.slice(25);
    await expectExact();
  });

  it("equal a full recount after signed cases are reopened, then signed again with another outcome", async () => {
    const signed = await db
      .select({ id: t.cases.id })
      .from(t.cases)
      .where(and(eq(t.cases.bearingClass, CLASS), eq(t.cases.status, "signed"), isNotNull(t.cases.removalConfirmed)));
    const chosen = signed.slice(0, 8).map((c) => c.id);
    expect(chosen.length).toBeGreaterThan(3);
    await reopenAndResign(chosen, expectExact);
    await expectExact();
  });

  it("see a later removal written at the same position by a writer that commits after the keep call's writer", async () => {
    const first = await pool.connect();
    const second = await pool.connect();
    try {
      const insert = (number: string, call: string, day: string) =>
        `insert into cases (number, bearing_class, car_mark, car_number, axle, side, removed_on, field_call, site_id, trigger)
         values ('${number}', '${CLASS}', 'RLUX', '77', 1, 'L', '${day}', '${call}', '${sites.A}', 'hand-roll') returning id`;
      await first.query("begin");
      const keep = (await first.query<{ id: string }>(insert(`RLU-${CLASS}-1`, "keep", "1987-03-01"))).rows[0].id;
      await second.query("begin");
      const later = second.query(insert(`RLU-${CLASS}-2`, "remove", "1987-03-20")).then(() => second.query("commit"));
      await new Promise((r) => setTimeout(r, 200)); // the second writer now waits on the position
      await first.query("commit");
      await later;
      const { rows } = await pool.query<{ next_any: string }>(`select next_any::text from keep_gaps where case_id = $1`, [keep]);
      expect(rows).toEqual([{ next_any: "1987-03-20" }]);
      await expectExact();
    } finally {
      first.release();
      second.release();
    }
  });
});
