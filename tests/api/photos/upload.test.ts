import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import exifReader from "exif-reader";
import { beforeAll, describe, expect, it } from "vitest";
import { as, type ApiClient } from "../../support/api";
import { readObject } from "../../support/bucket";
import { db, t } from "../../support/db";
import { createCase } from "../../support/factories";
import { noisyJpeg, pixelAt, smallPng, smallWebp, twoToneJpeg } from "../../support/photo-files";
import { footprint, upload } from "./helpers";

let analyst: ApiClient;
beforeAll(async () => {
  analyst = await as("analyst");
});

async function fetchBytes(client: ApiClient, url: string) {
  const res = await client.get(url);
  return { res, bytes: Buffer.from(await res.arrayBuffer()) };
}

describe("uploading a phone photo", () => {
  it("keeps the original byte for byte with GPS, and serves upright derivatives without it", async () => {
    const c = await createCase({ status: "bench" });
    const file = await twoToneJpeg({ width: 400, height: 200, orientation: 6, gps: true, takenAt: "2026:03:14 09:26:53", seed: 11 });
    const sha = createHash("sha256").update(file).digest("hex");
    const { status, body } = await upload(analyst, c.id, file, "IMG_2201.JPG", {
      component: "cup",
      row: "inboard",
      clockDeg: "90",
      caption: "Spall, load zone",
    });
    expect(status).toBe(201);
    expect(body.photo!.sha256).toBe(sha);
    expect(body.photo!.takenAt).toBe("2026-03-14T09:26:53.000Z");
    expect([body.photo!.width, body.photo!.height]).toEqual([200, 400]);

    const [row] = await db.select().from(t.photos).where(eq(t.photos.id, body.photo!.id));
    expect(row).toMatchObject({
      component: "cup",
      row: "inboard",
      clockDeg: 90,
      caption: "Spall, load zone",
      bytes: file.length,
      contentType: "image/jpeg",
    });

    // The bucket, read through the SDK, holds exactly the bytes that were sent.
    const stored = await readObject(row.originalKey);
    expect(createHash("sha256").update(stored).digest("hex")).toBe(sha);
    expect(exifReader((await sharp(stored).metadata()).exif!).GPSInfo?.GPSLatitude).toEqual([45, 30, 12]);

    const original = await fetchBytes(analyst, body.photo!.urls.original);
    expect(original.res.headers.get("content-type")).toBe("image/jpeg");
    expect(original.res.headers.get("cache-control")).toMatch(/^private/);
    expect(original.bytes.equals(file)).toBe(true);

    for (const variant of ["screen", "thumb"] as const) {
      const d = await fetchBytes(analyst, body.photo!.urls[variant]);
      expect(d.res.headers.get("content-type")).toBe("image/webp");
      const m = await sharp(d.bytes).metadata();
      expect(m.exif).toBeUndefined(); // no GPS position leaves the original
      expect(m.height).toBeGreaterThan(m.width!); // EXIF orientation 6 applied: portrait
      const [r, , b] = await pixelAt(d.bytes, Math.floor(m.width! / 2), 4);
      expect(r > 180 && b < 70).toBe(true); // the stored left (red) half is on top
    }
  });

  it("recognises the same file twice in one case and stores it once", async () => {
    const c = await createCase({ status: "bench" });
    const file = await twoToneJpeg({ seed: 12 });
    const first = await upload(analyst, c.id, file, "a.jpg");
    const before = await footprint(c.id);
    const again = await upload(analyst, c.id, file, "same-again.jpg");
    expect(again.status).toBe(200);
    expect(again.body.duplicate).toBe(true);
    expect(again.body.photo!.id).toBe(first.body.photo!.id);
    expect(again.body.message).toMatch(/already in TL-\d\d-\d{5} as “a.jpg”; it was not stored twice/);
    expect(await footprint(c.id)).toEqual(before);
    expect(before).toEqual({ rows: 1, objects: expect.arrayContaining([expect.stringMatching(/original$/)]) });
    expect(before.objects).toHaveLength(3);

    // The same file in another case is that case's evidence too.
    const other = await createCase({ status: "bench" });
    expect((await upload(analyst, other.id, file, "a.jpg")).status).toBe(201);
  });

  it("takes a full-size 12-megapixel phone JPEG through HTTP", async () => {
    const c = await createCase({ status: "bench" });
    const file = await noisyJpeg(4000, 3000, 80);
    expect(file.length).toBeGreaterThan(4 * 1024 * 1024);
    const res = await upload(analyst, c.id, file, "IMG_12MP.jpg");
    expect(res.status).toBe(201);
    expect([res.body.photo!.width, res.body.photo!.height]).toEqual([4000, 3000]);
    const [row] = await db.select().from(t.photos).where(eq(t.photos.id, res.body.photo!.id));
    expect((await readObject(row.originalKey)).equals(file)).toBe(true);
  });

  it("accepts PNG and WebP, judged by content even under a wrong name", async () => {
    const c = await createCase();
    const png = await upload(analyst, c.id, await smallPng(33), "scan.jpg", {}, "image/jpeg");
    expect(png.status).toBe(201);
    const webp = await upload(analyst, c.id, await smallWebp(34), "grease", {}, "application/octet-stream");
    expect(webp.status).toBe(201);
    const [p] = await db.select().from(t.photos).where(eq(t.photos.id, png.body.photo!.id));
    expect(p.contentType).toBe("image/png");
  });

  it("lists a case's photos with their tags, and records uploads in the history", async () => {
    const c = await createCase({ status: "bench" });
    await upload(analyst, c.id, await twoToneJpeg({ seed: 14 }), "roller-end.jpg", {
      component: "rollers-outboard",
      caption: "Roller end scoring",
    });
    const res = await analyst.json<{ photos: Array<{ component: string; row: string; caption: string; urls: Record<string, string> }> }>(
      "GET",
      `/api/cases/${c.id}/photos`,
    );
    expect(res.status).toBe(200);
    expect(res.body.photos).toHaveLength(1);
    expect(res.body.photos[0]).toMatchObject({ component: "rollers-outboard", row: "outboard", caption: "Roller end scoring" });
    const events = await db.select().from(t.caseEvents).where(eq(t.caseEvents.caseId, c.id));
    expect(events.map((e) => e.action)).toContain("photo-added");
  });

  it("lets an inspector add photos to a case of their own shop", async () => {
    const c = await createCase({ status: "field" });
    const res = await upload(await as("inspector"), c.id, await twoToneJpeg({ seed: 15 }), "from-the-shop.jpg", {
      component: "seal-outboard",
    });
    expect(res.status).toBe(201);
  });
});
