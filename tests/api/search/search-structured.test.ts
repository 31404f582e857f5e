// Words that name a part, a row, a zone, a damage, a trigger or a class act on the recorded
// findings and case fields: the case holding that very finding comes first.
import { beforeAll, describe, expect, it } from "vitest";
import { as } from "../../support/api";
import { caseWith, markerWord, type SearchBody } from "./casebook";

const hitIds = (b: { hits: { id: string }[] }) => b.hits.map((h) => h.id);

const marker = markerWord();
type Case = { id: string };
let cupOutboard: Case,
  cupInboardSaysOutboard: Case,
  coneOutboard: Case,
  waterCupOutboard: Case,
  textOnly: Case,
  raceway: Case,
  acoustic: Case;

type Reading = Omit<SearchBody, "understood"> & { understood: { text: string; reading: string; role: string; without: string }[] };
const search = async (q: string) => {
  const engineer = await as("engineer");
  const res = await engineer.json<Reading>("GET", `/api/search?q=${encodeURIComponent(`${q} ${marker}`)}`);
  expect(res.status).toBe(200);
  return res.body;
};

beforeAll(async () => {
  // Invented cases: the notes of the first never name the part, row or damage.
  cupOutboard = await caseWith(marker, {
    notes: "Metal gone in the load zone.",
    bearingClass: "K",
    findings: [{ component: "cup", row: "outboard", zone: "raceway", damageCode: "fatigue.subsurface", severity: 4 }],
  });
  cupInboardSaysOutboard = await caseWith(marker, {
    notes: "Spalled cup, found at the outboard end of the car.",
    findings: [{ component: "cup", row: "inboard", damageCode: "fatigue.subsurface", severity: 3 }],
  });
  coneOutboard = await caseWith(marker, {
    notes: "Flaked.",
    findings: [{ component: "cone-outboard", damageCode: "fatigue.subsurface", severity: 3 }],
  });
  waterCupOutboard = await caseWith(marker, {
    notes: "Stained.",
    findings: [{ component: "cup", row: "outboard", damageCode: "corrosion.moisture", severity: 2 }],
  });
  textOnly = await caseWith(marker, { notes: "Spall on the cup outboard row, not yet coded." });
  raceway = await caseWith(marker, {
    notes: "Marks.",
    findings: [{ component: "cone-inboard", zone: "rib", damageCode: "wear.adhesive", severity: 2 }],
  });
  acoustic = await caseWith(marker, {
    notes: "Noise.",
    trigger: "wayside-acoustic",
    findings: [{ component: "rollers-inboard", damageCode: "none", severity: 0 }],
  });
});

describe("search that knows parts and rows", () => {
  // Each query with the case it must find first (invented casebook above).
  const firsts: [string, () => Case][] = [
    ["spall cup outboard row", () => cupOutboard],
    ["spall cup outboard", () => cupOutboard],
    ["subsurface spall on the cup ob", () => cupOutboard],
    ["spaling cup outbaord row", () => cupOutboard],
    ["outboard cone spall", () => coneOutboard],
    ["spall cup inboard row", () => cupInboardSaysOutboard],
    ["rust cup outboard", () => waterCupOutboard],
    ["smearing rib", () => raceway],
  ];
  for (const [q, first] of firsts) {
    it(`"${q}" finds the case holding that finding first`, async () => {
      const body = await search(q);
      expect(hitIds(body)[0]).toBe(first().id);
    });
  }

  it("still finds cases whose words say it, after the ones whose findings do", async () => {
    const ids = hitIds(await search("spall cup outboard row"));
    expect(ids[0]).toBe(cupOutboard.id);
    expect(new Set(ids)).toEqual(new Set([cupOutboard.id, cupInboardSaysOutboard.id, textOnly.id]));
  });

  it("says how the words were read and offers each part to drop", async () => {
    const body = await search("spall cup outboard row");
    expect(body.understood.slice(0, 3).map((u) => [u.reading, u.role])).toEqual([
      ["subsurface spall", "damage"],
      ["cup", "part"],
      ["outboard row", "row"],
    ]);
    expect(body.understood[2].without).toBe(`spall cup ${marker}`);
    // dropping the row: every cup spall again, recorded on either row
    const wider = await as("engineer").then((e) =>
      e.json<Reading>("GET", `/api/search?q=${encodeURIComponent(body.understood[2].without)}`),
    );
    expect(hitIds(wider.body)).toEqual(expect.arrayContaining([cupOutboard.id, cupInboardSaysOutboard.id]));
  });

  it("acts on the case's trigger and bearing class", async () => {
    expect(hitIds(await search("acoustic"))).toEqual([acoustic.id]);
    expect(hitIds(await search("class K"))).toEqual([cupOutboard.id]);
    expect((await search("class E")).total).toBe(0);
  });
});
