// Two people saving the same case, bad input, and who may touch which case.
import { count, eq } from "drizzle-orm";
import { describe, expect, test } from "vitest";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { siteId } from "../../support/factories";
import { fieldReport } from "./fixtures";

type CaseBody = { case: { id: string; number: string; version: number; carNumber: string; fieldNotes: string } };

describe("saving a case", () => {
  test("the second save based on an old version is refused with 409 and nothing is lost", async () => {
    const inspector = await as("inspector");
    const analyst = await as("analyst");
    const created = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    const { id, version } = created.body.case;
    const first = await inspector.json<CaseBody>("PATCH", `/api/cases/${id}`, {
      version,
      section: "field",
      data: { fieldNotes: "First person's note" },
    });
    expect(first.status).toBe(200);
    const second = await analyst.json<{ error: string; details: { updatedBy: string; current: Record<string, unknown> } }>(
      "PATCH",
      `/api/cases/${id}`,
      { version, section: "field", data: { fieldNotes: "Second person's note" } },
    );
    expect(second.status).toBe(409);
    expect(second.body.error).toMatch(/Dana Okafor saved this case/);
    expect(second.body.details.current.fieldNotes).toBe("First person's note");
    const [row] = await db.select().from(t.cases).where(eq(t.cases.id, id));
    expect(row.fieldNotes).toBe("First person's note");
    expect(row.version).toBe(version + 1);
  });

  test("bad input gets a clear 400 and writes nothing", async () => {
    const inspector = await as("inspector");
    const before = (await db.select({ n: count() }).from(t.cases))[0].n;
    const cases: [Record<string, unknown>, RegExp][] = [
      [await fieldReport({ carMark: "S1" }), /Reporting mark is 2 to 4 letters/],
      [await fieldReport({ axle: 5 }), /Axle is 1 to 4/],
      [await fieldReport({ removedOn: "20/10/2026" }), /date like 2026-03-14/],
      [await fieldReport({ trigger: undefined }), /trigger/i],
      [await fieldReport({ wheelDiameterIn: "thirty-six" }), /Wheel diameter/],
      [await fieldReport({ fieldChecks: { endPlay: { method: "laser", unit: "in", trials: [] } } }), /dial indicator or tape/],
    ];
    for (const [body, message] of cases) {
      const r = await inspector.json<{ error: string }>("POST", "/api/cases", body);
      expect(r.status, JSON.stringify(body).slice(0, 80)).toBe(400);
      expect(r.body.error).toMatch(message);
    }
    const raw = await inspector.request("POST", "/api/cases", "{not json");
    expect(raw.status).toBe(400);
    const after = (await db.select({ n: count() }).from(t.cases))[0].n;
    expect(after).toBe(before);
  });

  test("a section save with an unknown field is refused and changes nothing", async () => {
    const inspector = await as("inspector");
    const created = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    const r = await inspector.json("PATCH", `/api/cases/${created.body.case.id}`, {
      version: created.body.case.version,
      section: "field",
      data: { status: "signed" },
    });
    expect(r.status).toBe(400);
    const [row] = await db.select().from(t.cases).where(eq(t.cases.id, created.body.case.id));
    expect(row.status).toBe("field");
  });

  test("roles: managers and engineers cannot file; inspectors only for their own shop and only see their shop", async () => {
    for (const role of ["manager", "engineer"] as const) {
      expect((await (await as(role)).json("POST", "/api/cases", await fieldReport())).status, role).toBe(403);
    }
    const inspector = await as("inspector");
    const elsewhere = await inspector.json("POST", "/api/cases", await fieldReport({ siteId: await siteId("PYC") }));
    expect(elsewhere.status).toBe(403);
    const mine = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    const pellham = await as("inspector.pellham");
    expect((await pellham.json("GET", `/api/cases/${mine.body.case.id}`)).status).toBe(404);
    expect(
      (await pellham.json("PATCH", `/api/cases/${mine.body.case.id}`, { version: 1, section: "field", data: { fieldNotes: "x" } })).status,
    ).toBe(404);
    expect((await (await as("manager")).json("GET", `/api/cases/${mine.body.case.number}`)).status).toBe(200);
    expect(
      (
        await (
          await as("manager")
        ).json("PATCH", `/api/cases/${mine.body.case.id}`, { version: 1, section: "field", data: { fieldNotes: "x" } })
      ).status,
    ).toBe(403);
  });

  test("an inspector cannot edit the field report once the lab has the bearing", async () => {
    const inspector = await as("inspector");
    const created = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    const r = await (
      await as("analyst")
    ).json<CaseBody>("POST", `/api/cases/${created.body.case.id}/transitions`, { version: created.body.case.version, action: "receive" });
    const edit = await inspector.json("PATCH", `/api/cases/${created.body.case.id}`, {
      version: r.body.case.version,
      section: "field",
      data: { fieldNotes: "late" },
    });
    expect(edit.status).toBe(403);
  });
});
