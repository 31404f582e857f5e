// The ingest order and the sweeper, run against in-memory stand-ins for the bucket and the table
// (the real bucket and database are exercised by tests/api/photos).
import { describe, expect, it } from "vitest";
import { ingestPhoto, type NewPhotoRow, type PhotoObjectStore, type PhotoRowStore } from "@/lib/photos/ingest";
import { sweepOrphanPhotos } from "@/lib/photos/sweep";
import { DEFAULT_MAX_BYTES, DEFAULT_MAX_PIXELS } from "@/lib/photos/limits";
import { photoKeys } from "@/lib/photos/keys";
import { twoToneJpeg } from "../../support/photo-files";

const CASE = "5b0c4a52-3f0e-4f7a-9c7e-2a2f4b1d9e01";
const limits = { maxBytes: DEFAULT_MAX_BYTES, maxPixels: DEFAULT_MAX_PIXELS };

class MemoryBucket implements PhotoObjectStore {
  objects = new Map<string, { body: Buffer; at: Date }>();
  failOnPut?: (key: string) => boolean;
  async put(key: string, body: Buffer) {
    if (this.failOnPut?.(key)) throw new Error(`store refused ${key}`);
    this.objects.set(key, { body, at: new Date() });
  }
  async remove(keys: string[]) {
    for (const k of keys) this.objects.delete(k);
  }
}

class MemoryRows implements PhotoRowStore<NewPhotoRow & { id: number }> {
  rows: (NewPhotoRow & { id: number })[] = [];
  failInsert = false;
  events: string[] = [];
  async findByHash(caseId: string, sha: string) {
    return this.rows.find((r) => r.caseId === caseId && r.sha256 === sha) ?? null;
  }
  async exclusive<T>(_c: string, _s: string, fn: Parameters<PhotoRowStore<NewPhotoRow & { id: number }>["exclusive"]>[2]) {
    this.events.push("lock");
    return fn({
      findByHash: async (caseId, sha) => this.findByHash(caseId, sha),
      insert: async (values) => {
        this.events.push("insert");
        if (this.failInsert) throw new Error("insert failed");
        const row = { ...values, id: this.rows.length + 1 };
        this.rows.push(row);
        return row;
      },
    }) as Promise<T>;
  }
}

const input = async (seed = 1) => ({
  caseId: CASE,
  file: await twoToneJpeg({ seed }),
  fileName: "cup.jpg",
  tags: { component: "cup", caption: "Load zone" },
  uploadedBy: "u1",
  limits,
});

describe("ingestPhoto", () => {
  it("stores the original and both derivatives, then writes the row", async () => {
    const bucket = new MemoryBucket();
    const rows = new MemoryRows();
    const order: string[] = [];
    const spy: PhotoObjectStore = {
      put: async (k, b) => (order.push(k.split("/").pop()!), bucket.put(k, b)),
      remove: (k) => bucket.remove(k),
    };
    const res = await ingestPhoto(await input(), { store: spy, rows });
    expect(res.duplicate).toBe(false);
    expect(order[0]).toBe("original");
    expect([...bucket.objects.keys()].sort()).toEqual(Object.values(photoKeys(CASE, res.photo.sha256)).sort());
    expect(res.photo).toMatchObject({ component: "cup", caption: "Load zone", contentType: "image/jpeg", row: null });
  });

  it("recognises the same file twice in one case and stores it once", async () => {
    const bucket = new MemoryBucket();
    const rows = new MemoryRows();
    const first = await ingestPhoto(await input(3), { store: bucket, rows });
    const again = await ingestPhoto({ ...(await input(3)), fileName: "copy-of-cup.jpg" }, { store: bucket, rows });
    expect(again.duplicate).toBe(true);
    expect(again.photo.id).toBe(first.photo.id);
    expect(rows.rows).toHaveLength(1);
    expect(bucket.objects.size).toBe(3);
  });

  it("removes what it stored when a derivative cannot be stored, and writes no row", async () => {
    const bucket = new MemoryBucket();
    bucket.failOnPut = (k) => k.endsWith("thumb.webp");
    const rows = new MemoryRows();
    await expect(ingestPhoto(await input(4), { store: bucket, rows })).rejects.toThrow(/store refused/);
    expect(bucket.objects.size).toBe(0);
    expect(rows.events).toEqual([]);
  });

  it("stores every object before it opens the row transaction", async () => {
    const bucket = new MemoryBucket();
    const rows = new MemoryRows();
    const spy: PhotoObjectStore = {
      put: async (k, b) => (rows.events.push(`put ${k.split("/").pop()}`), bucket.put(k, b)),
      remove: (k) => bucket.remove(k),
    };
    await ingestPhoto(await input(6), { store: spy, rows });
    expect(rows.events.slice(0, 1)).toEqual(["put original"]);
    expect(rows.events.slice(3)).toEqual(["lock", "insert"]);
  });

  it("keeps the objects when the same file's row is already there", async () => {
    const bucket = new MemoryBucket();
    const rows = new MemoryRows();
    const first = await ingestPhoto(await input(7), { store: bucket, rows });
    rows.failInsert = true;
    // A second upload that lost the race: it finds the row under the lock and leaves the shared objects.
    const again = await ingestPhoto(await input(7), {
      store: bucket,
      rows: { ...rows, findByHash: async () => null, exclusive: rows.exclusive.bind(rows) },
    });
    expect(again).toEqual({ photo: first.photo, duplicate: true });
    expect(bucket.objects.size).toBe(3);
  });

  it("removes the stored objects when the row cannot be written", async () => {
    const bucket = new MemoryBucket();
    const rows = new MemoryRows();
    rows.failInsert = true;
    await expect(ingestPhoto(await input(5), { store: bucket, rows })).rejects.toThrow(/insert failed/);
    expect(bucket.objects.size).toBe(0);
  });
});

describe("sweepOrphanPhotos", () => {
  const sha = (c: string) => c.repeat(64);
  const at = (minutesAgo: number) => new Date(Date.UTC(2026, 5, 1, 12, 0) - minutesAgo * 60_000);
  const now = at(0);
  const objects = [
    { key: `cases/${CASE}/${sha("a")}/original`, lastModified: at(120) }, // orphan, old
    { key: `cases/${CASE}/${sha("a")}/thumb.webp`, lastModified: at(119) },
    { key: `cases/${CASE}/${sha("b")}/original`, lastModified: at(120) }, // has a row
    { key: `cases/${CASE}/${sha("c")}/original`, lastModified: at(5) }, // orphan but young: may be mid-ingest
    { key: "exports/monthly.csv", lastModified: at(999) }, // not a photo object
  ];

  it("removes only old folders without a row", async () => {
    const removed: string[] = [];
    const report = await sweepOrphanPhotos(
      {
        list: async function* () {
          yield* objects;
        },
        rowExists: async (_c, s) => s === sha("b"),
        remove: async (keys) => void removed.push(...keys),
      },
      { olderThanMinutes: 60, now },
    );
    expect(report).toEqual({ foldersExamined: 3, orphanFolders: 1, removedKeys: [objects[0].key, objects[1].key] });
    expect(removed).toEqual([objects[0].key, objects[1].key]);
  });

  it("only reports in a dry run", async () => {
    const removed: string[] = [];
    const report = await sweepOrphanPhotos(
      {
        list: async function* () {
          yield* objects;
        },
        rowExists: async () => false,
        remove: async (k) => void removed.push(...k),
      },
      { olderThanMinutes: 1, now, dryRun: true },
    );
    expect(report.orphanFolders).toBe(3);
    expect(removed).toEqual([]);
  });
});
