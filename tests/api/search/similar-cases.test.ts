// Similar earlier cases over a small invented casebook whose right neighbours are known by
// construction (common practice: the same damage on the same part with the same cause and
// trigger is the closest match). All are dated in 1986-87, before any other test's cases.
import { beforeAll, describe, expect, it } from "vitest";
import { as } from "../../support/api";
import { caseWith, markerWord, people } from "./casebook";

const marker = markerWord();
type Similar = { id: string; number: string; score: number; reasons: { kind: string; text: string; weight: number }[]; linked: boolean };
const book: Record<string, { id: string; number: string }> = {};

const water = [
  { component: "cup", damageCode: "corrosion.moisture", severity: 3 },
  { component: "lubricant", damageCode: "lubricant.water", severity: 2 },
  { component: "seal-inboard", damageCode: "seal.damaged", severity: 2 },
];

beforeAll(async () => {
  const p = await people();
  const base = { siteId: p.mjc, bearingClass: "F", trigger: "wayside-hot", primaryCause: "water-ingress" };
  book.twin = await caseWith(marker, {
    ...base,
    removedOn: "1986-03-01",
    notes: "Seal lip torn, grease milky with water. Cup etched at roller spacing.",
    findings: water,
  });
  book.waterOnCone = await caseWith(marker, {
    ...base,
    bearingClass: "G",
    trigger: "hand-roll",
    removedOn: "1986-04-01",
    notes: "Outboard cone stained, grease emulsified.",
    findings: [
      { component: "cone-outboard", damageCode: "corrosion.moisture", severity: 3 },
      { component: "lubricant", damageCode: "lubricant.water", severity: 2 },
    ],
  });
  book.cupOnly = await caseWith(marker, {
    ...base,
    primaryCause: null,
    trigger: "scheduled",
    bearingClass: "K",
    removedOn: "1986-05-01",
    notes: "Stain on the cup.",
    findings: [water[0]],
  });
  // Another shop's twin: as close as the first, but an inspector at Marrow Junction may not see it.
  book.otherShopTwin = await caseWith(marker, {
    ...base,
    siteId: p.pyc,
    createdBy: p.analyst,
    removedOn: "1986-06-01",
    notes: "Seal lip torn, grease milky with water. Cup etched at roller spacing.",
    findings: water,
  });
  for (const [i, code] of ["electrical.fluting", "electrical.arc", "deformation.handling"].entries()) {
    book[`unrelated${i}`] = await caseWith(marker, {
      siteId: p.mjc,
      bearingClass: "E",
      trigger: "welding",
      primaryCause: "electrical",
      removedOn: "1986-07-01",
      notes: "Grey bands across the raceway.",
      findings: [{ component: "rollers-inboard", damageCode: code, severity: 3 }],
    });
  }
  book.target = await caseWith(marker, {
    ...base,
    removedOn: "1987-01-10",
    notes: "Milky grease behind the inboard seal. Water etch on the cup at roller spacing; seal lip torn.",
    findings: water,
  });
  // A later case is never an "earlier" neighbour, however alike.
  book.later = await caseWith(marker, {
    ...base,
    removedOn: "1987-06-01",
    notes: "Milky grease behind the inboard seal.",
    findings: water,
  });
});

const similarFor = async (key: string, role: Parameters<typeof as>[0] = "engineer") =>
  (await as(role)).json<{ similar: Similar[] }>("GET", `/api/cases/${key}/similar`);

describe("similar earlier cases", () => {
  it("puts the known nearest neighbour first and leaves unrelated cases out of the ten", async () => {
    const res = await similarFor(book.target.number);
    expect(res.status).toBe(200);
    const list = res.body.similar;
    const order = list.map((s) => s.id);
    expect(order.length).toBeLessThanOrEqual(10);
    expect([book.twin.id, book.otherShopTwin.id]).toContain(order[0]);
    expect(order.slice(0, 2).sort()).toEqual([book.twin.id, book.otherShopTwin.id].sort());
    expect(order.indexOf(book.waterOnCone.id)).toBeGreaterThan(1);
    expect(order).toContain(book.cupOnly.id);
    for (const i of [0, 1, 2]) expect(order).not.toContain(book[`unrelated${i}`].id);
    expect(order).not.toContain(book.later.id);
    expect(order).not.toContain(book.target.id);
  });

  it("gives each neighbour its score and readable reasons, best first", async () => {
    const list = (await similarFor(book.target.id)).body.similar;
    for (let i = 1; i < list.length; i++) expect(list[i - 1].score).toBeGreaterThanOrEqual(list[i].score);
    const twin = list.find((s) => s.id === book.twin.id)!;
    expect(twin.score).toBeGreaterThan(0.8);
    expect(twin.reasons.map((r) => r.kind)).toEqual(
      expect.arrayContaining(["same-finding", "same-cause", "same-trigger", "same-bearing-class", "shared-words"]),
    );
    expect(twin.reasons.find((r) => r.kind === "same-finding")!.text).toMatch(/on the cup in both/);
    const sum = twin.reasons.reduce((s, r) => s + r.weight, 0);
    expect(twin.score).toBeCloseTo(Math.min(1, sum), 9);
  });

  it("holds an inspector to their scope: another shop's twin is left out", async () => {
    const res = await similarFor(book.target.id, "inspector");
    expect(res.status).toBe(200);
    const order = res.body.similar.map((s) => s.id);
    expect(order[0]).toBe(book.twin.id);
    expect(order).not.toContain(book.otherShopTwin.id);
    expect((await similarFor(book.target.id, "inspector.pellham")).status).toBe(404);
  });

  it("answers 404 for a case that does not exist", async () => {
    expect((await similarFor("TL-86-99999")).status).toBe(404);
  });
});
