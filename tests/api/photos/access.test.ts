// Who may see, retag and delete photos; photos are never public.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { as, ApiClient } from "../../support/api";
import { listKeys } from "../../support/bucket";
import { db, t } from "../../support/db";
import { createCase } from "../../support/factories";
import { twoToneJpeg } from "../../support/photo-files";
import { footprint, upload } from "./helpers";

let analyst: ApiClient;
beforeAll(async () => {
  analyst = await as("analyst");
});

async function casePhoto(status: "field" | "bench" | "signed" = "bench", seed = Math.floor(Math.random() * 250)) {
  const c = await createCase({ status: "bench", findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 3 }] });
  const res = await upload(analyst, c.id, await twoToneJpeg({ seed }), `p${seed}.jpg`);
  if (status !== "bench") await db.update(t.cases).set({ status }).where(eq(t.cases.id, c.id));
  return { caseRow: c, photo: res.body.photo! };
}

describe("serving photo bytes", () => {
  it("serves only signed-in people who may see the case", async () => {
    const { photo } = await casePhoto();
    expect((await new ApiClient().get(photo.urls.thumb)).status).toBe(401);
    expect((await (await as("inspector.pellham")).get(photo.urls.thumb)).status).toBe(404);
    const own = await (await as("inspector")).get(photo.urls.screen);
    expect(own.status).toBe(200);
    expect(own.headers.get("cache-control")).toBe("private, max-age=3600");
    expect(own.headers.get("x-content-type-options")).toBe("nosniff");
    expect((await (await as("manager")).get(photo.urls.original)).status).toBe(200);
  });

  it("answers a repeat request with 304 and refuses unknown variants", async () => {
    const { photo } = await casePhoto();
    const first = await analyst.get(photo.urls.thumb);
    const etag = first.headers.get("etag")!;
    const again = await analyst.request("GET", photo.urls.thumb, undefined, { "if-none-match": etag });
    expect(again.status).toBe(304);
    expect((await analyst.get(`/api/photos/${photo.id}/full`)).status).toBe(400);
    expect((await analyst.get(`/api/photos/00000000-0000-4000-8000-000000000000/thumb`)).status).toBe(404);
  });
});

describe("tags after upload", () => {
  it("change a photo's tags and link it to a finding of its case", async () => {
    const { caseRow, photo } = await casePhoto();
    const [finding] = await db.select().from(t.findings).where(eq(t.findings.caseId, caseRow.id));
    const res = await analyst.json<{ photo: { component: string; clockDeg: number; findingId: string } }>(
      "PATCH",
      `/api/photos/${photo.id}`,
      { component: "cup", clockDeg: 180, findingId: finding.id, caption: "6 o'clock spall" },
    );
    expect(res.status).toBe(200);
    expect(res.body.photo).toMatchObject({ component: "cup", clockDeg: 180, findingId: finding.id });
  });

  it("refuse a finding of another case", async () => {
    const { photo } = await casePhoto();
    const other = await createCase({ findings: [{ component: "cup" }] });
    const [f] = await db.select().from(t.findings).where(eq(t.findings.caseId, other.id));
    const res = await analyst.json<{ error: string }>("PATCH", `/api/photos/${photo.id}`, { findingId: f.id });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/belongs to another case/);
  });

  it("are refused on a signed case", async () => {
    const { photo } = await casePhoto("signed");
    const res = await analyst.json<{ error: string }>("PATCH", `/api/photos/${photo.id}`, { caption: "late note" });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/signed and read-only/);
  });
});

describe("deleting photos", () => {
  it("removes the row and all three objects", async () => {
    const { caseRow, photo } = await casePhoto();
    expect((await footprint(caseRow.id)).objects).toHaveLength(3);
    const res = await analyst.json<{ deleted: string }>("DELETE", `/api/photos/${photo.id}`);
    expect(res.status).toBe(200);
    expect(await footprint(caseRow.id)).toEqual({ rows: 0, objects: [] });
    expect((await analyst.get(photo.urls.thumb)).status).toBe(404);
  });

  it("is refused on a signed case with a clear 409, and nothing is removed", async () => {
    const { caseRow, photo } = await casePhoto("signed");
    const before = await footprint(caseRow.id);
    const res = await analyst.json<{ error: string }>("DELETE", `/api/photos/${photo.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error).toBe(
      "This case is signed and read-only, so its photos cannot be added, changed or deleted. An engineer can reopen it with a reason.",
    );
    expect(await footprint(caseRow.id)).toEqual(before);
  });

  it("lets an inspector delete only photos they uploaded", async () => {
    const { caseRow, photo } = await casePhoto();
    const inspector = await as("inspector");
    const res = await inspector.json<{ error: string }>("DELETE", `/api/photos/${photo.id}`);
    expect(res.status).toBe(403);
    expect(res.body.error).toMatch(/only photos you uploaded yourself/);
    const own = await upload(inspector, caseRow.id, await twoToneJpeg({ seed: 251 }), "mine.jpg");
    expect((await inspector.del(`/api/photos/${own.body.photo!.id}`)).status).toBe(200);
    expect(await listKeys(`cases/${caseRow.id}/${own.body.photo!.sha256}/`)).toEqual([]);
  });

  it("is refused to roles without the permission and to other shops", async () => {
    const { photo } = await casePhoto();
    expect((await (await as("engineer")).del(`/api/photos/${photo.id}`)).status).toBe(403);
    expect((await (await as("inspector.pellham")).del(`/api/photos/${photo.id}`)).status).toBe(404);
  });
});
