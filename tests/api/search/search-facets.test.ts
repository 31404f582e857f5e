// Facets: each narrows the search, values within one widen it, counts leave out the facet's
// own choice (so other values can be added), and every read is held to the caller's scope.
import { beforeAll, describe, expect, it } from "vitest";
import { as } from "../../support/api";
import { caseWith, facetCount, hitIds, markerWord, people, type SearchBody } from "./casebook";

const marker = markerWord();
const book: Record<string, { id: string }> = {};

const search = async (query: string, role: Parameters<typeof as>[0] = "engineer") => {
  const res = await (await as(role)).json<SearchBody>("GET", `/api/search?q=${marker}&${query}`);
  expect(res.status).toBe(200);
  return res.body;
};
const set = (...names: string[]) => new Set(names.map((n) => book[n].id));

beforeAll(async () => {
  const p = await people();
  // Invented cases; trigger, site, class, stage, severity and dates chosen so each filter picks a known subset.
  book.hotMjc = await caseWith(marker, {
    notes: "Alarm.",
    trigger: "wayside-hot",
    siteId: p.mjc,
    bearingClass: "F",
    status: "signed",
    primaryCause: "water-ingress",
    removedOn: "2025-03-10",
    findings: [{ component: "cup", damageCode: "corrosion.moisture", severity: 3 }],
  });
  book.hotPyc = await caseWith(marker, {
    notes: "Alarm.",
    trigger: "wayside-hot",
    siteId: p.pyc,
    createdBy: p.analyst,
    bearingClass: "G",
    status: "bench",
    removedOn: "2025-07-01",
    findings: [{ component: "cone-inboard", damageCode: "fatigue.subsurface", severity: 4 }],
  });
  book.rollMjc = await caseWith(marker, {
    notes: "Rough.",
    trigger: "hand-roll",
    siteId: p.mjc,
    bearingClass: "F",
    status: "bench",
    removedOn: "2025-11-20",
    findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 2 }],
  });
  book.rollPyc = await caseWith(marker, {
    notes: "Rough.",
    trigger: "hand-roll",
    siteId: p.pyc,
    createdBy: p.analyst,
    bearingClass: "K",
    status: "signed",
    primaryCause: "end-of-life",
    removedOn: "2026-01-15",
    findings: [{ component: "rollers-outboard", damageCode: "fatigue.surface", severity: 1 }],
  });
  book.sealMjc = await caseWith(marker, {
    notes: "Purged.",
    trigger: "seal-grease",
    siteId: p.mjc,
    bearingClass: "F",
    status: "field",
    removedOn: "2026-02-02",
  });
});

describe("search facets", () => {
  it("narrows across facets and widens within one", async () => {
    expect(new Set(hitIds(await search("trigger=wayside-hot")))).toEqual(set("hotMjc", "hotPyc"));
    expect(new Set(hitIds(await search("trigger=wayside-hot,hand-roll")))).toEqual(set("hotMjc", "hotPyc", "rollMjc", "rollPyc"));
    expect(new Set(hitIds(await search("trigger=wayside-hot,hand-roll&site=PYC")))).toEqual(set("hotPyc", "rollPyc"));
    expect(new Set(hitIds(await search("code=fatigue.subsurface&component=cup")))).toEqual(set("rollMjc"));
    expect(new Set(hitIds(await search("class=F&status=bench,field")))).toEqual(set("rollMjc", "sealMjc"));
    expect(new Set(hitIds(await search("cause=water-ingress,end-of-life")))).toEqual(set("hotMjc", "rollPyc"));
  });

  it("filters by worst finding and removal dates", async () => {
    expect(new Set(hitIds(await search("severity=3")))).toEqual(set("hotMjc", "hotPyc"));
    expect(new Set(hitIds(await search("from=2025-06-01&to=2025-12-31")))).toEqual(set("hotPyc", "rollMjc"));
    expect(new Set(hitIds(await search("severity=2&from=2025-06-01")))).toEqual(set("hotPyc", "rollMjc"));
  });

  it("counts each facet without its own choice, and the rest with all filters", async () => {
    const body = await search("trigger=wayside-hot&site=MJC");
    expect(hitIds(body)).toEqual([book.hotMjc.id]);
    expect(body.total).toBe(1);
    // Trigger counts within MJC (the other filter), all triggers offered.
    expect(facetCount(body, "trigger", "wayside-hot")).toBe(1);
    expect(facetCount(body, "trigger", "hand-roll")).toBe(1);
    expect(facetCount(body, "trigger", "seal-grease")).toBe(1);
    // Site counts among hot-box cases (the other filter).
    expect(facetCount(body, "site", "MJC")).toBe(1);
    expect(facetCount(body, "site", "PYC")).toBe(1);
    // Other facets count the one matching case.
    expect(facetCount(body, "code", "corrosion.moisture")).toBe(1);
    expect(facetCount(body, "code", "fatigue.subsurface")).toBe(0);
    expect(body.facets.trigger.find((v) => v.value === "wayside-hot")?.selected).toBe(true);
  });

  it("sorts by most severe and pages", async () => {
    const body = await search("sort=severity");
    expect(hitIds(body).slice(0, 2)).toEqual([book.hotPyc.id, book.hotMjc.id]);
    const oldest = await search("sort=oldest");
    expect(hitIds(oldest)[0]).toBe(book.hotMjc.id);
    expect((await search("page=2")).hits).toEqual([]);
  });

  it("shows an inspector only their shop's cases and their own, in results and counts", async () => {
    const mjcInspector = await search("", "inspector");
    expect(new Set(hitIds(mjcInspector))).toEqual(set("hotMjc", "rollMjc", "sealMjc"));
    expect(facetCount(mjcInspector, "site", "PYC")).toBe(0);
    const pycInspector = await search("", "inspector.pellham");
    expect(new Set(hitIds(pycInspector))).toEqual(set("hotPyc", "rollPyc"));
    expect((await search("", "manager")).total).toBe(5);
  });
});
