// Sites with their end-play limits, and the classification lists: edits, validation, and never deleting what cases use.
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import checks from "../../fixtures/field-check-values.json";
import { as, type DemoRole } from "../../support/api";
import { db, t } from "../../support/db";
import { createCase } from "../../support/factories";

type SiteBody = { site?: Record<string, unknown>; sites?: Array<Record<string, unknown>>; error?: string; fields?: Record<string, string> };
type CodeBody = { code?: Record<string, unknown>; codes?: Array<Record<string, unknown>>; error?: string; fields?: Record<string, string> };

const tag = () => randomBytes(3).toString("hex");
const admin = () => as("admin");
const MM_PER_IN = checks.units.in_to_mm; // 25.4 exactly (NIST SP 811; from memory)

async function newSite(extra: Record<string, unknown> = {}) {
  const code = `T${tag().toUpperCase()}`;
  const res = await (
    await admin()
  ).json<SiteBody>("POST", "/api/admin/sites", {
    code,
    name: `Test yard ${code}`,
    kind: "car-shop",
    railway: "Sable River Rail",
    location: "Test",
    ...extra,
  });
  expect(res.status).toBe(201);
  return res.body.site as { id: string; code: string; endPlayMaxIn: number; dialSpreadIn: number; tapeSpreadIn: number };
}

const storedSite = async (id: string) => (await db.select().from(t.sites).where(eq(t.sites.id, id)))[0];

describe("sites and their end-play limits", () => {
  it("starts a new site at the common limits", async () => {
    const site = await newSite();
    // More than 1/16 in removes (common interchange practice); dial trials within 0.002 in and
    // tape trials within 1/64 in (common practice), 1/64 = 0.015625 kept to 5 places = 0.01563.
    expect(site.endPlayMaxIn).toBe(0.0625);
    expect(site.dialSpreadIn).toBe(0.002);
    expect(site.tapeSpreadIn).toBe(0.01563);
  });

  it("keeps a limit typed in millimetres, converted to inches, to 5 places", async () => {
    const site = await newSite();
    const inches = 1.5 / MM_PER_IN; // 1.5 mm = 0.0590551… in (arithmetic)
    const res = await (
      await admin()
    ).json<SiteBody>("PATCH", `/api/admin/sites/${site.id}`, { endPlayMaxIn: inches, tapeSpreadIn: 1 / 32 });
    expect(res.status).toBe(200);
    expect((await storedSite(site.id)).endPlayMaxIn).toBe(0.05906);
    expect((await storedSite(site.id)).tapeSpreadIn).toBe(0.03125); // 1/32 in (arithmetic)
  });

  const bad: [string, Record<string, unknown>, string][] = [
    ["a zero limit", { endPlayMaxIn: 0 }, "endPlayMaxIn"],
    ["a negative limit", { endPlayMaxIn: -0.0625 }, "endPlayMaxIn"],
    ["a limit above 1/4 in", { endPlayMaxIn: 0.2501 }, "endPlayMaxIn"],
    ["a limit sent as text", { endPlayMaxIn: "1/16" }, "endPlayMaxIn"],
    ["a zero dial spread", { dialSpreadIn: 0 }, "dialSpreadIn"],
    ["a negative tape spread", { tapeSpreadIn: -0.01 }, "tapeSpreadIn"],
    ["an unknown kind", { kind: "depot" }, "kind"],
    ["a field that is not a site's", { colour: "red" }, "_"],
  ];
  for (const [what, body, field] of bad) {
    it(`refuses ${what} and leaves the site as it was`, async () => {
      const site = await newSite();
      const before = await storedSite(site.id);
      const res = await (await admin()).json<SiteBody>("PATCH", `/api/admin/sites/${site.id}`, body);
      expect(res.status).toBe(400);
      expect(res.body.fields?.[field]).toBeTruthy();
      expect(await storedSite(site.id)).toEqual(before);
    });
  }

  it("accepts exactly 1/4 in, the ceiling", async () => {
    const site = await newSite();
    expect((await (await admin()).json("PATCH", `/api/admin/sites/${site.id}`, { endPlayMaxIn: 0.25 })).status).toBe(200);
  });

  it("refuses a second site with the same code", async () => {
    const site = await newSite();
    const res = await (
      await admin()
    ).json<SiteBody>("POST", "/api/admin/sites", { code: site.code.toLowerCase(), name: "Copy", kind: "lab", railway: "Sable River Rail" });
    expect(res.status).toBe(409);
  });

  it("deactivates a site cases use but refuses to delete it; deletes one nothing uses", async () => {
    const used = await newSite();
    await createCase({ siteId: used.id });
    const refused = await (await admin()).json<SiteBody>("DELETE", `/api/admin/sites/${used.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatch(/1 case\b/);
    expect((await (await admin()).json("PATCH", `/api/admin/sites/${used.id}`, { active: false })).status).toBe(200);
    const picker = await (await as("inspector")).json<SiteBody>("GET", "/api/sites");
    expect(picker.body.sites?.find((s) => s.id === used.id)).toMatchObject({ active: false, code: used.code });
    expect(picker.body.sites?.[0]).not.toHaveProperty("endPlayMaxIn");

    const unused = await newSite();
    expect((await (await admin()).json("DELETE", `/api/admin/sites/${unused.id}`)).status).toBe(200);
    expect(await storedSite(unused.id)).toBeUndefined();
  });

  it("refuses site edits from every role but admin", async () => {
    const site = await newSite();
    for (const role of ["inspector", "analyst", "engineer", "manager"] as DemoRole[]) {
      expect((await (await as(role)).json("PATCH", `/api/admin/sites/${site.id}`, { endPlayMaxIn: 0.1 })).status, role).toBe(403);
    }
    expect((await storedSite(site.id)).endPlayMaxIn).toBe(0.0625);
  });
});

async function addCode(list: "damage" | "cause" | "trigger", code: string, extra: Record<string, unknown> = {}) {
  return (await admin()).json<CodeBody>("POST", "/api/admin/codes", {
    list,
    code,
    label: `Test ${code}`,
    description: "Made by a test",
    synonyms: ["testword"],
    ...extra,
  });
}
const pickerCodes = async (list: string, query = "") =>
  ((await (await as("inspector")).json<CodeBody>("GET", `/api/codes?list=${list}${query}`)).body.codes ?? []).map(
    (c) => c as { code: string; retired: boolean; label: string; synonyms: string[] },
  );

describe("classification lists", () => {
  it("adds a damage code under its family, and everyone's picker offers it", async () => {
    const code = `fatigue.t-${tag()}`;
    const res = await addCode("damage", code);
    expect(res.status).toBe(201);
    expect(res.body.code).toMatchObject({ code, family: "fatigue", list: "damage" });
    expect((await pickerCodes("damage")).map((c) => c.code)).toContain(code);
  });

  it("refuses codes that break the pattern, and duplicates", async () => {
    for (const [list, code] of [
      ["damage", "no-family"],
      ["damage", "gremlin.bite"],
      ["cause", "Has Spaces"],
      ["trigger", "dotted.code"],
    ] as const) {
      const res = await addCode(list, code);
      expect(res.status, code).toBe(400);
      expect(res.body.fields?.code).toBeTruthy();
    }
    expect((await addCode("damage", "fatigue.subsurface")).status).toBe(409);
  });

  it("edits the label and shop words, never the code", async () => {
    const code = `wear.t-${tag()}`;
    await addCode("damage", code);
    const url = `/api/admin/codes/damage/${code}`;
    expect((await (await admin()).json("PATCH", url, { label: "Renamed wear", synonyms: ["scuffy", "Scuffy", " rubbed "] })).status).toBe(
      200,
    );
    expect((await pickerCodes("damage")).find((c) => c.code === code)).toMatchObject({
      label: "Renamed wear",
      synonyms: ["scuffy", "rubbed"],
    });
    expect((await (await admin()).json("PATCH", url, { code: "wear.other" })).status).toBe(400);
  });

  it("retires and restores: hidden from pickers, still listed on request", async () => {
    const code = `t-${tag()}`;
    await addCode("trigger", code);
    const url = `/api/admin/codes/trigger/${code}`;
    expect((await (await admin()).json("PATCH", url, { retired: true })).status).toBe(200);
    expect((await pickerCodes("trigger")).map((c) => c.code)).not.toContain(code);
    expect((await pickerCodes("trigger", "&includeRetired=1")).find((c) => c.code === code)?.retired).toBe(true);
    expect((await (await admin()).json("PATCH", url, { retired: false })).status).toBe(200);
    expect((await pickerCodes("trigger")).map((c) => c.code)).toContain(code);
  });

  it("refuses to delete a code any case uses, naming how many, for each list", async () => {
    const damage = `heat.t-${tag()}`;
    const cause = `t-cause-${tag()}`;
    const trigger = `t-trigger-${tag()}`;
    for (const [list, code] of [
      ["damage", damage],
      ["cause", cause],
      ["trigger", trigger],
    ] as const)
      expect((await addCode(list, code)).status).toBe(201);
    // Two findings on one case count as one case.
    await createCase({ findings: [{ damageCode: damage }, { damageCode: damage, component: "cone-inboard" }] });
    await createCase({ findings: [{ damageCode: damage }] });
    await createCase({ primaryCause: "seal", contributingCauses: [cause] });
    await createCase({ trigger });
    for (const [list, code, n] of [
      ["damage", damage, 2],
      ["cause", cause, 1],
      ["trigger", trigger, 1],
    ] as const) {
      const res = await (await admin()).json<CodeBody>("DELETE", `/api/admin/codes/${list}/${code}`);
      expect(res.status, code).toBe(409);
      expect(res.body.error).toContain(`used by ${n} ${n === 1 ? "case" : "cases"}`);
      expect((await pickerCodes(list)).map((c) => c.code)).toContain(code);
    }
  });

  it("deletes a code nothing uses", async () => {
    const code = `seal.t-${tag()}`;
    await addCode("damage", code);
    expect((await (await admin()).json("DELETE", `/api/admin/codes/damage/${code}`)).status).toBe(200);
    expect((await pickerCodes("damage", "&includeRetired=1")).map((c) => c.code)).not.toContain(code);
    expect((await (await admin()).json("DELETE", `/api/admin/codes/damage/${code}`)).status).toBe(404);
  });

  it("asks which list a picker wants", async () => {
    expect((await (await as("analyst")).json("GET", "/api/codes")).status).toBe(400);
    expect((await (await as("analyst")).json("GET", "/api/codes?list=colours")).status).toBe(400);
  });
});
