// Uploading the fleet list: who may, row-numbered errors with nothing stored, and the batch in use.
import { describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { as, ApiClient } from "../../support/api";
import { db, t } from "../../support/db";
import { tag } from "./casebook";

const CLASS = tag();
const header = "serial,bearing_class,mounted_on,as_of,service_months,service_miles";
const unitCount = async () => Number((await db.select({ n: sql<number>`count(*)` }).from(t.fleetUnits))[0].n);

describe("fleet list upload", () => {
  it("is for engineers, managers and admins only", async () => {
    const csv = `${header}\nX1,${CLASS},,2026-01-31,10,\n`;
    expect((await new ApiClient().request("POST", "/api/fleet", csv, { "content-type": "text/csv" })).status).toBe(401);
    for (const role of ["inspector", "analyst"] as const) {
      const before = await unitCount();
      expect((await (await as(role)).request("POST", "/api/fleet", csv, { "content-type": "text/csv" })).status, role).toBe(403);
      expect(await unitCount()).toBe(before);
    }
  });

  it("stores a good list as one new batch and reports it as the list in use", async () => {
    const csv = [
      header,
      `${CLASS}-1,${CLASS},2020-01-31,2026-01-31,,`,
      `${CLASS}-2,${CLASS},,2026-01-31,48.5,310000`,
      `${CLASS}-3,${CLASS},,2026-01-31,,120000`,
    ].join("\r\n");
    const res = await (await as("engineer")).json<{ batchId: string; units: number }>("POST", "/api/fleet", undefined);
    expect(res.status).toBe(400); // no body at all
    const up = await (await as("engineer")).request("POST", "/api/fleet", csv, { "content-type": "text/csv" });
    expect(up.status).toBe(201);
    const body = (await up.json()) as { batchId: string; units: number };
    expect(body.units).toBe(3);
    const rows = await db.select().from(t.fleetUnits).where(eq(t.fleetUnits.batchId, body.batchId));
    expect(rows.map((r) => r.serial).sort()).toEqual([`${CLASS}-1`, `${CLASS}-2`, `${CLASS}-3`]);
    // 2020-01-31 to 2026-01-31 is 2192 days; / 30.436875 = 72.02 months (Gregorian calendar arithmetic)
    expect(rows.find((r) => r.serial === `${CLASS}-1`)!.serviceMonths).toBe(72.02);
    expect(rows.find((r) => r.serial === `${CLASS}-2`)).toMatchObject({ serviceMonths: 48.5, serviceMiles: 310000 });
    const inUse = await (await as("manager")).json<{ batch: { batchId: string; units: number } }>("GET", "/api/fleet");
    expect(inUse.body.batch).toMatchObject({ batchId: body.batchId, units: 3 });
  });

  it("accepts the file from a form upload", async () => {
    const form = new FormData();
    form.set("file", new Blob([`${header}\n${CLASS}-9,${CLASS},,2026-02-28,7,\n`], { type: "text/csv" }), "fleet.csv");
    const up = await (await as("manager")).request("POST", "/api/fleet", form);
    expect(up.status).toBe(201);
    expect(((await up.json()) as { units: number }).units).toBe(1);
  });

  it("refuses a list with bad rows, naming each row, and stores nothing", async () => {
    const before = await unitCount();
    const csv = [header, `${CLASS}-1,${CLASS},,2026-01-31,10,`, `${CLASS}-2,${CLASS},,31/01/2026,10,`, `${CLASS}-3,,,2026-01-31,-2,`].join(
      "\n",
    );
    const res = await (
      await as("admin")
    ).json<{ error: string; rows: { row: number; column: string; message: string }[]; errorCount: number }>(
      "POST",
      "/api/fleet",
      undefined,
    );
    expect(res.status).toBe(400);
    const bad = await (await as("admin")).request("POST", "/api/fleet", csv, { "content-type": "text/csv" });
    expect(bad.status).toBe(422);
    const body = (await bad.json()) as { error: string; rows: { row: number; column: string; message: string }[]; errorCount: number };
    expect(body.error).toMatch(/3 problems; nothing was stored/);
    expect(body.rows.map((r) => [r.row, r.column])).toEqual([
      [3, "as_of"],
      [4, "bearing_class"],
      [4, "service_months"],
    ]);
    expect(await unitCount()).toBe(before);
  });
});
