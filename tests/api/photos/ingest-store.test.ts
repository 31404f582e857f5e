// The ingest order against the real database and bucket: a failure after some objects were stored
// removes them, and the sweeper removes objects whose row never came.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { photoRowExists, photoRows } from "@/db/queries/photos";
import { ingestPhoto, type PhotoObjectStore } from "@/lib/photos/ingest";
import { photoKeys } from "@/lib/photos/keys";
import { photoLimits } from "@/lib/photos/limits";
import { listStoredObjects, s3PhotoStore } from "@/lib/photos/object-store";
import { sha256Hex } from "@/lib/photos/process";
import { sweepOrphanPhotos } from "@/lib/photos/sweep";
import { listKeys } from "../../support/bucket";
import { db, t } from "../../support/db";
import { createCase, userId } from "../../support/factories";
import { twoToneJpeg } from "../../support/photo-files";
import { footprint } from "./helpers";

const input = async (caseId: string, seed: number) => ({
  caseId,
  file: await twoToneJpeg({ seed }),
  fileName: "x.jpg",
  tags: {},
  uploadedBy: await userId("analyst"),
  limits: photoLimits(),
});

describe("ingest against the real bucket and database", () => {
  it("removes the stored objects when the row is refused (the case was signed meanwhile)", async () => {
    const c = await createCase({ status: "signed" });
    await expect(ingestPhoto(await input(c.id, 61), { store: s3PhotoStore, rows: photoRows })).rejects.toThrow(/signed and read-only/);
    expect(await footprint(c.id)).toEqual({ rows: 0, objects: [] });
  });

  it("removes the original when a derivative cannot be stored, and writes no row", async () => {
    const c = await createCase({ status: "bench" });
    const failingThumb: PhotoObjectStore = {
      put: (key, body, type) =>
        key.endsWith("thumb.webp") ? Promise.reject(new Error("bucket refused the thumbnail")) : s3PhotoStore.put(key, body, type),
      remove: s3PhotoStore.remove,
    };
    await expect(ingestPhoto(await input(c.id, 62), { store: failingThumb, rows: photoRows })).rejects.toThrow(/bucket refused/);
    expect(await footprint(c.id)).toEqual({ rows: 0, objects: [] });
  });

  it("stores two concurrent uploads of the same file once", async () => {
    const c = await createCase({ status: "bench" });
    const same = await input(c.id, 63);
    const [a, b] = await Promise.all([
      ingestPhoto(same, { store: s3PhotoStore, rows: photoRows }),
      ingestPhoto(same, { store: s3PhotoStore, rows: photoRows }),
    ]);
    expect([a.duplicate, b.duplicate].sort()).toEqual([false, true]);
    expect(a.photo.id).toBe(b.photo.id);
    expect(await footprint(c.id)).toMatchObject({ rows: 1 });
    expect((await footprint(c.id)).objects).toHaveLength(3);
  });
});

describe("the sweeper", () => {
  it("removes old objects without a row and keeps those with one", async () => {
    const c = await createCase({ status: "bench" });
    const kept = await ingestPhoto(await input(c.id, 64), { store: s3PhotoStore, rows: photoRows });
    // Objects as a crash between storing and writing the row leaves them.
    const orphanBytes = await twoToneJpeg({ seed: 65 });
    const orphan = photoKeys(c.id, sha256Hex(orphanBytes));
    await s3PhotoStore.put(orphan.original, orphanBytes, "image/jpeg");
    await s3PhotoStore.put(orphan.thumb, orphanBytes, "image/webp");

    const deps = { list: listStoredObjects, rowExists: photoRowExists, remove: s3PhotoStore.remove };
    // Within the grace period the folder may belong to an upload still in progress.
    const young = await sweepOrphanPhotos(deps, { olderThanMinutes: 60 });
    expect(young.removedKeys).not.toContain(orphan.original);

    const later = new Date(Date.now() + 61 * 60_000);
    const swept = await sweepOrphanPhotos(deps, { olderThanMinutes: 60, now: later });
    expect(swept.removedKeys).toEqual(expect.arrayContaining([orphan.original, orphan.thumb]));
    expect(await listKeys(`cases/${c.id}/`)).toEqual(Object.values(photoKeys(c.id, kept.photo.sha256)).sort());
    const [row] = await db.select().from(t.photos).where(eq(t.photos.caseId, c.id));
    expect(row.id).toBe(kept.photo.id);
  });
});
