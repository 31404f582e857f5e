// Linking cases as related: stored both ways, listed on both, recorded in both histories;
// self-links and second links refused; only engineers and admins may link.
import { beforeAll, describe, expect, it } from "vitest";
import { and, eq, inArray } from "drizzle-orm";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { caseWith, markerWord, people } from "./casebook";

const marker = markerWord();
let a: { id: string; number: string }, b: { id: string; number: string }, hidden: { id: string; number: string };
type Links = { links: { id: string; number: string; note: string }[] };

beforeAll(async () => {
  const p = await people();
  a = await caseWith(marker, { notes: "Spall on the cup.", siteId: p.mjc });
  b = await caseWith(marker, { notes: "Spall on the cup again, same lot.", siteId: p.mjc });
  hidden = await caseWith(marker, { notes: "Another shop.", siteId: p.pyc, createdBy: p.analyst });
});

describe("related cases", () => {
  it("links both ways in one step and lists the link on both cases", async () => {
    const engineer = await as("engineer");
    const res = await engineer.json<Links>("POST", `/api/cases/${a.number}/links`, { relatedId: b.number, note: "Same lot of cups" });
    expect(res.status).toBe(201);
    expect(res.body.links.map((l) => l.id)).toEqual([b.id]);
    const fromB = await engineer.json<Links>("GET", `/api/cases/${b.id}/links`);
    expect(fromB.body.links.map((l) => [l.id, l.note])).toEqual([[a.id, "Same lot of cups"]]);
    const rows = await db
      .select()
      .from(t.caseLinks)
      .where(inArray(t.caseLinks.caseId, [a.id, b.id]));
    expect(rows).toHaveLength(2);
    const events = await db
      .select()
      .from(t.caseEvents)
      .where(and(inArray(t.caseEvents.caseId, [a.id, b.id]), eq(t.caseEvents.action, "linked")));
    expect(events).toHaveLength(2);
  });

  it("refuses a second link of the same pair (409) and a link to itself (400)", async () => {
    const engineer = await as("engineer");
    const again = await engineer.json<{ error: string }>("POST", `/api/cases/${b.id}/links`, { relatedId: a.id });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatch(/already linked/);
    const self = await engineer.json<{ error: string }>("POST", `/api/cases/${a.id}/links`, { relatedId: a.number });
    expect(self.status).toBe(400);
    expect(self.body.error).toMatch(/itself/);
    expect((await engineer.json("POST", `/api/cases/${a.id}/links`, { relatedId: "TL-99-99999" })).status).toBe(404);
  });

  it("lets only engineers and admins link; inspectors and managers are refused and nothing is written", async () => {
    for (const role of ["inspector", "manager", "analyst"] as const) {
      const res = await (await as(role)).json("POST", `/api/cases/${a.id}/links`, { relatedId: hidden.id });
      expect(res.status, role).toBe(403);
    }
    const rows = await db.select().from(t.caseLinks).where(eq(t.caseLinks.caseId, hidden.id));
    expect(rows).toEqual([]);
  });

  it("shows an inspector only the links to cases they may read", async () => {
    const admin = await as("admin");
    expect((await admin.json("POST", `/api/cases/${a.id}/links`, { relatedId: hidden.id })).status).toBe(201);
    const seen = await (await as("inspector")).json<Links>("GET", `/api/cases/${a.id}/links`);
    expect(seen.status).toBe(200);
    expect(seen.body.links.map((l) => l.id)).toEqual([b.id]);
  });

  it("unlinks both ways, and a second unlink finds nothing", async () => {
    const engineer = await as("engineer");
    const res = await engineer.json<Links>("DELETE", `/api/cases/${b.id}/links?relatedId=${a.number}`);
    expect(res.status).toBe(200);
    expect(res.body.links).toEqual([]);
    expect((await engineer.json<Links>("GET", `/api/cases/${a.id}/links`)).body.links.map((l) => l.id)).toEqual([hidden.id]);
    expect((await engineer.json("DELETE", `/api/cases/${b.id}/links?relatedId=${a.id}`)).status).toBe(404);
  });
});
