// Who sees which tallies: everyone may read them, inspectors only their own shop's removals
// (whatever filter they send), the other roles every site.
import { beforeAll, describe, expect, it } from "vitest";
import type { TalliesData } from "@/lib/tallies/types";
import type { LifeData } from "@/lib/tallies/life-data";
import { ALL_ROLES, ApiClient, as } from "../../support/api";
import { insertCasebook, makeSites, specs, tag, type Inserted } from "./casebook";

const CLASS = tag();
let cases: Inserted[] = [];

beforeAll(async () => {
  const sites = await makeSites(CLASS);
  // Half of the removals at the demo inspector's own shop (MJC), the rest at the test sites.
  const list = specs(40, 99, 1992).map((s, i) => ({ ...s, site: i % 2 === 0 ? ("MJC" as const) : s.site }));
  cases = await insertCasebook(CLASS, list, sites);
});

const get = async (role: Parameters<typeof as>[0], query: string) =>
  (await as(role)).json<TalliesData>("GET", `/api/tallies?class=${CLASS}${query}`);

describe("tallies by role", () => {
  it("refuses anyone not signed in", async () => {
    expect((await new ApiClient().json("GET", "/api/tallies")).status).toBe(401);
    expect((await new ApiClient().json("GET", "/api/tallies/life")).status).toBe(401);
  });

  it("lets every role read tallies", async () => {
    for (const role of ALL_ROLES) expect((await get(role, "")).status, role).toBe(200);
  });

  it("gives managers, engineers and analysts every site", async () => {
    for (const role of ["manager", "engineer", "analyst", "admin"] as const) {
      const res = await get(role, "");
      expect(res.body.totals.removals, role).toBe(cases.length);
      expect(res.body.siteLimit, role).toBeNull();
    }
  });

  it("limits an inspector to the removals of their own shop", async () => {
    const res = await get("inspector", "");
    const own = cases.filter((c) => c.site === "MJC");
    expect(res.body.siteLimit).toMatchObject({ code: "MJC" });
    expect(res.body.totals.removals).toBe(own.length);
    expect(res.body.totals.signed).toBe(own.filter((c) => c.status === "signed").length);
    expect(res.body.byShop.rows.every((r) => r.label === "Marrow Junction car shop")).toBe(true);
    expect(res.body.causeSite.sites.map((s) => s.label)).toEqual(
      own.some((c) => c.status === "signed") ? ["Marrow Junction car shop"] : [],
    );
  });

  it("keeps an inspector to their shop even when they ask for another site", async () => {
    const res = await get("inspector", `&site=${CLASS}A`);
    expect(res.status).toBe(200);
    expect(res.body.totals.removals).toBe(0);
    expect(res.body.clusters.items).toEqual([]);
    expect(res.body.damage.placed).toBe(0);
  });

  it("shows the other shop's inspector none of these removals", async () => {
    const res = await get("inspector.pellham", "");
    expect(res.body.totals.removals).toBe(0);
    expect(res.body.siteLimit).toMatchObject({ code: "PYC" });
  });

  it("applies the same limit to the life analysis", async () => {
    const own = cases.filter((c) => c.site === "MJC" && c.status === "signed" && (c.serviceMonths ?? 0) > 0);
    const inspector = await (await as("inspector")).json<LifeData>("GET", `/api/tallies/life?class=${CLASS}`);
    expect(inspector.status).toBe(200);
    const failures = inspector.body.causes.reduce((s, c) => s + c.failures, 0);
    expect(failures).toBe(own.filter((c) => c.cause !== "no-defect").length);
    const manager = await (await as("manager")).json<LifeData>("GET", `/api/tallies/life?class=${CLASS}`);
    const all = cases.filter((c) => c.status === "signed" && (c.serviceMonths ?? 0) > 0 && c.cause !== "no-defect");
    expect(manager.body.causes.reduce((s, c) => s + c.failures, 0)).toBe(all.length);
  });

  it("refuses filters it cannot read with a 400 naming the field", async () => {
    const bad = await (await as("manager")).json<{ error: string; fields: Record<string, string> }>("GET", "/api/tallies?from=2026-13");
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toContain("from");
    expect((await (await as("manager")).json("GET", "/api/tallies?from=2026-05&to=2026-01")).status).toBe(400);
    expect((await (await as("manager")).json("GET", "/api/tallies?window=0")).status).toBe(400);
    expect((await (await as("manager")).json("GET", "/api/tallies/life?measure=hours")).status).toBe(400);
  });
});
