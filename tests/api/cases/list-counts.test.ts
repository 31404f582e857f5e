// The case list's total sums case_list_counts, cells kept by triggers on cases. After inserts, single
// and many-row updates of every counted column, and deletes, the cells must equal a full recount; and
// the total GET /api/cases gives (from the cells, or from the cases for a date range) must equal the
// cases counted in JavaScript with the reach rule of lib/cases/access.ts.
import { eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { canReadCase } from "@/lib/cases/access";
import { as } from "../../support/api";
import { db, pool, t } from "../../support/db";
import { createCase, userId } from "../../support/factories";
import { makeSites, rng, tag } from "../tallies/casebook";

const CODE = tag();
let sites: { A: string; B: string; MJC: string };
let ids: string[] = [];

/** Cells the recount does not give, and the other way round, in one snapshot. */
async function differences(): Promise<{ extra: unknown[]; missing: unknown[] }> {
  const { rows } = await pool.query<{ side: string; r: unknown }>(`
    with roll as (select site_id, created_by, status, trigger, bearing_class, primary_cause, n::bigint from case_list_counts where n <> 0),
      fresh as (select site_id, created_by, status, trigger, bearing_class, primary_cause, count(*) from cases group by 1, 2, 3, 4, 5, 6)
    select 'extra' as side, to_jsonb(x) as r from (select * from roll except all select * from fresh) x
    union all
    select 'missing', to_jsonb(y) from (select * from fresh except all select * from roll) y`);
  return {
    extra: rows.filter((r) => r.side === "extra").map((r) => r.r),
    missing: rows.filter((r) => r.side === "missing").map((r) => r.r),
  };
}

async function expectExact() {
  expect(await differences()).toEqual({ extra: [], missing: [] });
}

beforeAll(async () => {
  sites = await makeSites(CODE);
  const r = rng(2213);
  const people = [await userId("inspector"), await userId("analyst")];
  for (let i = 0; i < 40; i++) {
    const row = await createCase({
      status: r.pick(["field", "bench", "signoff", "signed"] as const),
      trigger: r.pick(["wayside-hot", "hand-roll", "seal-grease"]),
      bearingClass: r.pick(["F", "G", "K"]),
      primaryCause: r.pick([null, "water-ingress", "seal"]),
      siteId: r.pick([sites.A, sites.B, sites.MJC]),
      createdBy: r.pick(people),
      removedOn: `1991-${String(r.int(1, 12)).padStart(2, "0")}-${String(r.int(1, 28)).padStart(2, "0")}`,
    });
    ids.push(row.id);
  }
});

describe("case list count cells", () => {
  it("equal a full recount after inserts", async () => {
    await expectExact();
  });

  it("equal a full recount after single and many-row updates of every counted column", async () => {
    const analyst = await userId("analyst");
    await db.update(t.cases).set({ status: "signed" }).where(eq(t.cases.id, ids[0]));
    await db
      .update(t.cases)
      .set({ siteId: sites.B, createdBy: analyst })
      .where(inArray(t.cases.id, ids.slice(1, 10)));
    await db
      .update(t.cases)
      .set({ trigger: "welding", bearingClass: "E", primaryCause: null })
      .where(inArray(t.cases.id, ids.slice(10, 18)));
    await db
      .update(t.cases)
      .set({ siteId: null })
      .where(inArray(t.cases.id, ids.slice(18, 21)));
    await db.update(t.cases).set({ updatedAt: new Date() }).where(inArray(t.cases.id, ids)); // no counted column: no cell moves
    await expectExact();
  });

  it("equal a full recount after deletes", async () => {
    await db.delete(t.cases).where(inArray(t.cases.id, ids.slice(0, 12)));
    ids = ids.slice(12);
    await expectExact();
  });
});

describe("the case list's total", () => {
  type Page = { total: number; pageCount: number; rows: { number: string }[] };
  const byRole = ["manager", "inspector"] as const;

  async function casesHere() {
    return db
      .select({
        id: t.cases.id,
        number: t.cases.number,
        status: t.cases.status,
        trigger: t.cases.trigger,
        bearingClass: t.cases.bearingClass,
        siteId: t.cases.siteId,
        createdBy: t.cases.createdBy,
        removedOn: t.cases.removedOn,
      })
      .from(t.cases)
      .where(inArray(t.cases.siteId, [sites.A, sites.B]));
  }
  async function viewer(role: (typeof byRole)[number]) {
    const [u] = await db
      .select({ id: t.user.id, role: t.user.role, siteId: t.user.siteId })
      .from(t.user)
      .where(eq(t.user.id, await userId(role)));
    return u;
  }

  it.each(byRole)("equals the cases in reach for every filter the cells answer, and for a date range (%s)", async (role) => {
    const who = await viewer(role);
    const here = (await casesHere()).filter((c) => canReadCase(who, c));
    const client = await as(role);
    const cases: [string, (c: (typeof here)[number]) => boolean][] = [
      ["", () => true],
      ["status=signed,bench", (c) => ["signed", "bench"].includes(c.status)],
      ["trigger=hand-roll", (c) => c.trigger === "hand-roll"],
      ["class=F,K&status=field,signoff,signed", (c) => ["F", "K"].includes(c.bearingClass) && c.status !== "bench"],
      ["from=1991-03-01&to=1991-08-31", (c) => c.removedOn !== null && c.removedOn >= "1991-03-01" && c.removedOn <= "1991-08-31"],
    ];
    expect(here.length).toBeGreaterThan(5);
    for (const [query, keep] of cases) {
      const res = await client.json<Page>("GET", `/api/cases?site=${CODE}A,${CODE}B&pageSize=10&${query}`);
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      const want = here.filter(keep);
      expect({ query, total: res.body.total, pageCount: res.body.pageCount }).toEqual({
        query,
        total: want.length,
        pageCount: Math.max(1, Math.ceil(want.length / 10)),
      });
      expect(res.body.rows.length).toBe(Math.min(10, want.length));
    }
  });

  it("over the inspector's whole reach equals a count of every readable case", async () => {
    const who = await viewer("inspector");
    const all = await db.select({ siteId: t.cases.siteId, createdBy: t.cases.createdBy }).from(t.cases);
    const res = await (await as("inspector")).json<Page>("GET", "/api/cases?pageSize=10");
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(all.filter((c) => canReadCase(who, c)).length);
  });
});
