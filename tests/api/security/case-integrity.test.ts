// What a case may be changed to, and what a change does to the version the signer sees:
// evidence freeze (photos and links move the version and are refused on signed cases),
// the own-shop rule on field saves, codes checked against the code lists, and unknown sites.
import { afterAll, describe, expect, test } from "vitest";
import { and, eq } from "drizzle-orm";
import { as, type ApiClient } from "../../support/api";
import { db, t } from "../../support/db";
import { siteId } from "../../support/factories";
import { smallPng } from "../../support/photo-files";
import { caseAwaitingSignoff, fieldReport } from "../cases/fixtures";
import { signVerdict } from "../../support/sign";

type CaseBody = {
  case: { id: string; number: string; version: number; status: string; siteId: string | null };
  error?: string;
  details?: { fields?: Record<string, string> };
};
type Answer = { error?: string; case?: CaseBody["case"]; photo?: { id: string } };
const MISSING_SITE = "00000000-0000-4000-8000-000000000000";

async function versionOf(id: string) {
  const [c] = await db.select({ version: t.cases.version }).from(t.cases).where(eq(t.cases.id, id));
  return c.version;
}

async function upload(client: ApiClient, caseId: string, seed: number) {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(await smallPng(seed))], { type: "image/png" }), `evidence-${seed}.png`);
  return client.request("POST", `/api/cases/${caseId}/photos`, form);
}

async function events(caseId: string, action: string) {
  return db
    .select()
    .from(t.caseEvents)
    .where(and(eq(t.caseEvents.caseId, caseId), eq(t.caseEvents.action, action)));
}

describe("evidence freeze", () => {
  test("a photo added while the verdict awaits sign-off moves the version, so a sign-off at the version seen before is refused", async () => {
    const [inspector, analyst, engineer] = [await as("inspector"), await as("analyst"), await as("engineer")];
    const c = await caseAwaitingSignoff(inspector, analyst);
    const up = await upload(analyst, c.id, 901);
    expect(up.status).toBe(201);
    expect(await versionOf(c.id)).toBe(c.version + 1);
    expect(await events(c.id, "photo-added")).toHaveLength(1);

    const stale = await signVerdict<Answer>(engineer, c.id, { version: c.version });
    expect(stale.status).toBe(409);
    const fresh = await signVerdict<Answer>(engineer, c.id, { version: c.version + 1 });
    expect(fresh.status).toBe(200);
    expect(fresh.body.case?.status).toBe("signed");
  });

  test("retagging and deleting a photo each move the version and are in the history", async () => {
    const [inspector, analyst] = [await as("inspector"), await as("analyst")];
    const c = await caseAwaitingSignoff(inspector, analyst);
    const up = await analyst.json<Answer>("POST", `/api/cases/${c.id}/photos`, undefined);
    expect(up.status).toBe(400); // no file: refused, nothing moves
    expect(await versionOf(c.id)).toBe(c.version);
    const added = await upload(analyst, c.id, 902);
    const photoId = ((await added.json()) as Answer).photo!.id;
    const tagged = await analyst.json<Answer>("PATCH", `/api/photos/${photoId}`, { caption: "Spall on the outboard cup raceway" });
    expect(tagged.status).toBe(200);
    expect(await versionOf(c.id)).toBe(c.version + 2);
    const removed = await analyst.json<Answer>("DELETE", `/api/photos/${photoId}`);
    expect(removed.status).toBe(200);
    expect(await versionOf(c.id)).toBe(c.version + 3);
    expect(await events(c.id, "photo-tagged")).toHaveLength(1);
    expect(await events(c.id, "photo-removed")).toHaveLength(1);
  });

  test("a link moves both cases' versions; a signed case refuses new links and unlinking until reopened", async () => {
    const [inspector, analyst, engineer] = [await as("inspector"), await as("analyst"), await as("engineer")];
    const a = await caseAwaitingSignoff(inspector, analyst);
    const b = await caseAwaitingSignoff(inspector, analyst);
    const linked = await engineer.json<Answer>("POST", `/api/cases/${a.id}/links`, { relatedId: b.id, note: "Same lot" });
    expect(linked.status).toBe(201);
    expect([await versionOf(a.id), await versionOf(b.id)]).toEqual([a.version + 1, b.version + 1]);

    const signed = await signVerdict<Answer>(engineer, b.id, { version: b.version + 1 });
    expect(signed.status).toBe(200);
    const c = await caseAwaitingSignoff(inspector, analyst);
    const toSigned = await engineer.json<Answer>("POST", `/api/cases/${c.id}/links`, { relatedId: b.number, note: "Same lot" });
    expect(toSigned.status).toBe(409);
    expect(toSigned.body.error).toMatch(new RegExp(`${b.number} is signed`));
    const unlink = await engineer.json<Answer>("DELETE", `/api/cases/${a.id}/links?relatedId=${b.id}`);
    expect(unlink.status).toBe(409);
    const still = await db
      .select()
      .from(t.caseLinks)
      .where(and(eq(t.caseLinks.caseId, a.id), eq(t.caseLinks.relatedId, b.id)));
    expect(still).toHaveLength(1);
    expect(await versionOf(c.id)).toBe(c.version);
  });
});

describe("own shop on every field save", () => {
  const pellham = "inspector.pellham@sable-river.example";
  afterAll(async () => {
    await db
      .update(t.user)
      .set({ siteId: await siteId("PYC") })
      .where(eq(t.user.email, pellham));
  });

  test("an inspector cannot move their case to another shop by saving the field section", async () => {
    const inspector = await as("inspector");
    const filed = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    expect(filed.status).toBe(201);
    const moved = await inspector.json<Answer>("PATCH", `/api/cases/${filed.body.case.id}`, {
      version: filed.body.case.version,
      section: "field",
      data: { siteId: await siteId("PYC") },
    });
    expect(moved.status).toBe(403);
    expect(moved.body.error).toMatch(/own shop/);
    const [row] = await db.select().from(t.cases).where(eq(t.cases.id, filed.body.case.id));
    expect(row.siteId).toBe(await siteId("MJC"));
    expect(row.version).toBe(filed.body.case.version);
    // Saving other fields of the same case at its own shop still works.
    const ok = await inspector.json<Answer>("PATCH", `/api/cases/${filed.body.case.id}`, {
      version: row.version,
      section: "field",
      data: { siteId: row.siteId, fieldNotes: "Checked again." },
    });
    expect(ok.status).toBe(200);
  });

  test("an inspector without a home shop cannot file for any shop", async () => {
    await db.update(t.user).set({ siteId: null }).where(eq(t.user.email, pellham));
    const homeless = await as("inspector.pellham");
    const before = (await db.select({ id: t.cases.id }).from(t.cases)).length;
    const filed = await homeless.json<Answer>("POST", "/api/cases", await fieldReport({ siteId: await siteId("OSW") }));
    expect(filed.status).toBe(403);
    expect(filed.body.error).toMatch(/no home shop/);
    expect((await db.select({ id: t.cases.id }).from(t.cases)).length).toBe(before);
  });

  test("an analyst may still record a case for any shop", async () => {
    const analyst = await as("analyst");
    const filed = await analyst.json<CaseBody>("POST", "/api/cases", await fieldReport({ siteId: await siteId("PYC") }));
    expect(filed.status).toBe(201);
  });
});

describe("codes and sites are the ones on record", () => {
  test("a trigger, cause or damage code not in its list answers 400 naming the field, and nothing is stored", async () => {
    const [inspector, analyst] = [await as("inspector"), await as("analyst")];
    const badTrigger = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport({ trigger: "moon-phase" }));
    expect(badTrigger.status).toBe(400);
    expect(badTrigger.body.error).toMatch(/“moon-phase” is not in the list of removal triggers/);
    expect(badTrigger.body.details?.fields).toHaveProperty("trigger");

    const filed = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    const id = filed.body.case.id;
    const received = await analyst.json<CaseBody>("POST", `/api/cases/${id}/transitions`, {
      version: filed.body.case.version,
      action: "receive",
    });
    const v = received.body.case.version;
    const badCause = await analyst.json<Answer>("PATCH", `/api/cases/${id}`, {
      version: v,
      section: "verdict",
      data: { primaryCause: "gremlins" },
    });
    expect(badCause.status).toBe(400);
    expect(badCause.body.error).toMatch(/not in the list of root causes/);
    const badDamage = await analyst.json<Answer>("POST", `/api/cases/${id}/findings`, {
      version: v,
      finding: { component: "cup", damageCode: "rust.imaginary", severity: 2 },
    });
    expect(badDamage.status).toBe(400);
    expect(badDamage.body.error).toMatch(/not in the list of damage codes/);
    expect(await versionOf(id)).toBe(v);
  });

  test("a retired code is refused on new data but a case that has it keeps saving", async () => {
    const admin = await as("admin");
    const code = `retire-test-${Date.now()}`;
    expect((await admin.json("POST", "/api/admin/codes", { list: "trigger", code, label: "Retire test trigger" })).status).toBe(201);
    const inspector = await as("inspector");
    const filed = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport({ trigger: code }));
    expect(filed.status).toBe(201);
    await db
      .update(t.codeEntries)
      .set({ retiredAt: new Date() })
      .where(and(eq(t.codeEntries.list, "trigger"), eq(t.codeEntries.code, code)));

    const fresh = await inspector.json<Answer>("POST", "/api/cases", await fieldReport({ trigger: code }));
    expect(fresh.status).toBe(400);
    expect(fresh.body.error).toMatch(/is retired/);
    const kept = await inspector.json<Answer>("PATCH", `/api/cases/${filed.body.case.id}`, {
      version: filed.body.case.version,
      section: "field",
      data: { trigger: code, fieldNotes: "Noted after the code was retired." },
    });
    expect(kept.status).toBe(200);
  });

  test("a well-formed id of a site that does not exist answers 400, not a server error", async () => {
    const analyst = await as("analyst");
    const create = await analyst.json<Answer>("POST", "/api/cases", await fieldReport({ siteId: MISSING_SITE }));
    expect(create.status).toBe(400);
    expect(create.body.error).toMatch(/removal site does not exist/);
    const lab = await analyst.json<Answer>("POST", "/api/cases", await fieldReport({ labSiteId: MISSING_SITE }));
    expect(lab.status).toBe(400);
    expect(lab.body.error).toMatch(/lab does not exist/);

    const inspector = await as("inspector");
    const filed = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    const receive = await analyst.json<Answer>("POST", `/api/cases/${filed.body.case.id}/transitions`, {
      version: filed.body.case.version,
      action: "receive",
      labSiteId: MISSING_SITE,
    });
    expect(receive.status).toBe(400);
    expect(await versionOf(filed.body.case.id)).toBe(filed.body.case.version);
  });
});
