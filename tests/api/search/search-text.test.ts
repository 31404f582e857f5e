// Free-text search against the running app: typos, shop words, serials and car numbers,
// highlighting, and codes an admin adds later.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { caseWith, hitIds, marked, markerWord, type SearchBody } from "./casebook";

const marker = markerWord();
const extraCode = `test.${marker}`;
let spalledText: { id: string }, spallCoded: { id: string }, waterCoded: { id: string }, rustText: { id: string };
let unrelated: { id: string }, serialCase: { id: string; serial: string; carMark: string; carNumber: string };

const search = async (query: string) => {
  const engineer = await as("engineer");
  const res = await engineer.json<SearchBody>("GET", `/api/search?${query}`);
  expect(res.status).toBe(200);
  return res.body;
};

beforeAll(async () => {
  spalledText = await caseWith(marker, { notes: "Deep spalling in the load zone of the cup outboard raceway." });
  spallCoded = await caseWith(marker, {
    notes: "Metal gone from the raceway.",
    findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 4 }],
  });
  waterCoded = await caseWith(marker, {
    notes: "Dark marks at roller spacing.",
    findings: [{ component: "cup", damageCode: "corrosion.moisture", severity: 3 }],
  });
  rustText = await caseWith(marker, { notes: "Rust on the cone bore after the yard flooded." });
  unrelated = await caseWith(marker, {
    notes: "Grey bands across the raceway.",
    findings: [{ component: "rollers-inboard", damageCode: "electrical.fluting", severity: 3 }],
  });
  serialCase = await caseWith(marker, {
    notes: "Checked in.",
    serial: `ZX${marker.slice(2, 6).toUpperCase()}7731`,
    carMark: "QZRX",
    carNumber: "551208",
  });
  // An admin adds a code with its own shop word after the fact.
  await db
    .insert(t.codeEntries)
    .values({ list: "damage", code: extraCode, label: "Zebra banding", synonyms: [`${marker}band`], sortOrder: 999 });
});

afterAll(async () => {
  await db.delete(t.codeEntries).where(and(eq(t.codeEntries.list, "damage"), eq(t.codeEntries.code, extraCode)));
});

describe("search by words", () => {
  it("finds 'spalling' and the spall code from the typo 'spaling'", async () => {
    const body = await search(`q=spaling+${marker}`);
    expect(new Set(hitIds(body))).toEqual(new Set([spalledText.id, spallCoded.id])); // one letter short of "spalling" (common practice)
    expect(body.understood[0].corrections).toContain("spalling");
    expect(marked(body, spalledText.id)).toContain("spalling");
  });

  it("finds water etch through the shop word 'rust', by code and by text", async () => {
    const body = await search(`q=rust+${marker}`);
    expect(new Set(hitIds(body))).toEqual(new Set([waterCoded.id, rustText.id])); // rust = water etch (common practice)
    expect(body.understood[0].codes.map((c) => c.code)).toEqual(["corrosion.moisture"]);
    const coded = body.hits.find((h) => h.id === waterCoded.id)!;
    expect(coded.findings.find((f) => f.code === "corrosion.moisture")?.matched).toBe(true);
    expect(marked(body, rustText.id)).toContain("rust");
  });

  it("requires every word: the marker alone finds all, with another word only the matches", async () => {
    expect((await search(`q=${marker}`)).total).toBe(6);
    expect(hitIds(await search(`q=fluting+${marker}`))).toEqual([unrelated.id]);
    expect((await search(`q=brinelling+${marker}`)).total).toBe(0);
  });

  it("finds a serial in part and a car by mark and number, marking them", async () => {
    const bySerial = await search(`q=${serialCase.serial.slice(2, 8)}`);
    expect(hitIds(bySerial)).toContain(serialCase.id);
    expect(bySerial.hits.find((h) => h.id === serialCase.id)!.serial.some((s) => s.hit)).toBe(true);
    const byCar = await search(`q=QZRX551208`);
    expect(hitIds(byCar)).toContain(serialCase.id);
  });

  it("uses codes and shop words an admin added to the list", async () => {
    const coded = await caseWith(marker, { notes: "Odd pattern.", findings: [{ component: "cup", damageCode: extraCode, severity: 2 }] });
    const body = await search(`q=${marker}band+${marker}`);
    expect(hitIds(body)).toEqual([coded.id]);
  });

  it("refuses a malformed search with 400 and an anonymous caller with 401", async () => {
    const engineer = await as("engineer");
    expect((await engineer.get("/api/search?severity=9")).status).toBe(400);
    expect((await engineer.get("/api/search?status=lost")).status).toBe(400);
    const { ApiClient } = await import("../../support/api");
    expect((await new ApiClient().get("/api/search?q=rust")).status).toBe(401);
  });
});
