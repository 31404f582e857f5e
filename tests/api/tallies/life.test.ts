// Life analysis end to end: the NIST/SEMATECH e-Handbook example (8.4.1.3) filed as cases, with
// removals for another cause and fleet units still in service as its suspensions.
import { beforeAll, describe, expect, it } from "vitest";
import type { LifeData } from "@/lib/tallies/life-data";
import { as } from "../../support/api";
import { createCase } from "../../support/factories";
import { checkValues } from "../../unit/stats/check-values";
import { tag } from "./casebook";

// 10 failures (54 ... 386 hours) and 10 units still running at 500 (fixture, with its source).
const nist = checkValues.weibull.nist_8_4_1_3;
const failures: number[] = nist.times.filter((_: number, i: number) => nist.status[i] === 1);
const CLASS = tag();
const FLEET_CLASS = tag();

async function file(bearingClass: string, cause: string, serviceMonths: number | null, serviceMiles: number | null = null) {
  return createCase({
    bearingClass,
    status: "signed",
    primaryCause: cause,
    removalConfirmed: "confirmed",
    serviceMonths,
    serviceMiles,
    removedOn: "1991-06-15",
  });
}

beforeAll(async () => {
  for (const time of failures) await file(CLASS, "water-ingress", time);
  for (let i = 0; i < 10; i++) await file(CLASS, "seal", 500);
  await file(CLASS, "impact", null); // no service life: left out
  // Same failures, but four of the ten survivors are on the fleet list instead of removed.
  for (const time of failures) await file(FLEET_CLASS, "water-ingress", time);
  for (let i = 0; i < 6; i++) await file(FLEET_CLASS, "seal", 500);
});

const life = async (query: string) => {
  const res = await (await as("engineer")).json<LifeData>("GET", `/api/tallies/life?${query}`);
  expect(res.status).toBe(200);
  return res.body;
};

describe("life analysis", () => {
  it("fits the NIST example by maximum likelihood (published beta 1.7208, eta 606.528)", async () => {
    const d = await life(`class=${CLASS}&cause=water-ingress`);
    const s = d.selected!;
    expect([s.cause, s.failures, s.suspensions]).toEqual(["water-ingress", 10, 10]);
    expect(Math.abs(s.mle!.beta - nist.published.beta)).toBeLessThanOrEqual(nist.published.abs_tol.beta);
    expect(Math.abs(s.mle!.eta - nist.published.eta)).toBeLessThanOrEqual(nist.published.abs_tol.eta);
    expect(s.likelihoodRatio).not.toBeNull();
    expect(s.plotPoints).toHaveLength(10);
    expect(d.withoutLife).toBe(1);
    expect(d.causes.map((c) => c.cause)).toEqual(["seal", "water-ingress"]);
  });

  it("counts fleet units still in service as suspensions", async () => {
    const manager = await as("manager");
    const csv = [
      "serial,bearing_class,as_of,service_months",
      ...[1, 2, 3, 4].map((i) => `${FLEET_CLASS}-${i},${FLEET_CLASS},2026-01-31,500`),
    ].join("\n");
    const up = await manager.request("POST", "/api/fleet", csv, { "content-type": "text/csv" });
    expect(up.status).toBe(201);
    const d = await life(`class=${FLEET_CLASS}&cause=water-ingress`);
    expect(d.fleet.used).toBe(4);
    expect([d.selected!.failures, d.selected!.suspensions]).toEqual([10, 10]);
    expect(Math.abs(d.selected!.mle!.beta - nist.published.beta)).toBeLessThanOrEqual(nist.published.abs_tol.beta);
    // One site's removals (these are filed at MJC) are not compared with the whole fleet's survivors.
    const atSite = await life(`class=${FLEET_CLASS}&site=MJC&cause=water-ingress`);
    expect(atSite.fleet.used).toBe(0);
    expect(atSite.fleet.why).toMatch(/one site/);
  });

  it("works in miles too, and says what is missing", async () => {
    const d = await life(`class=${CLASS}&measure=miles`);
    expect(d.measure).toBe("miles");
    expect(d.causes).toEqual([]);
    expect(d.selected).toBeNull();
    expect(d.withoutLife).toBe(21);
  });
});
