// Ingest: check and process the file, store its objects, and only then write its row (in a short
// transaction of its own, after the store has the bytes). A failure part-way removes whatever was
// stored, so there is never a row without objects nor (barring a crash, which the sweeper handles)
// objects without a row.
import type { PhotoLimits } from "./limits";
import { photoKeys, type PhotoKeys } from "./keys";
import { processPhoto, sha256Hex, type ProcessedPhoto } from "./process";
import type { PhotoTags } from "./tags";

export interface PhotoObjectStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  remove(keys: string[]): Promise<void>;
}

export type NewPhotoRow = {
  caseId: string;
  sha256: string;
  contentType: string;
  bytes: number;
  width: number;
  height: number;
  takenAt: Date | null;
  fileName: string;
  uploadedBy: string;
  originalKey: string;
  screenKey: string;
  thumbKey: string;
  component: string | null;
  row: string | null;
  clockDeg: number | null;
  findingId: string | null;
  caption: string;
};

export interface PhotoRowsInLock<Row> {
  findByHash(caseId: string, sha256: string): Promise<Row | null>;
  insert(values: NewPhotoRow): Promise<Row>;
}

export interface PhotoRowStore<Row> {
  /** A look without the lock, to skip all work for a file the case already has. */
  findByHash(caseId: string, sha256: string): Promise<Row | null>;
  /** Runs fn while no other ingest of the same file into the same case can run. */
  exclusive<T>(caseId: string, sha256: string, fn: (rows: PhotoRowsInLock<Row>) => Promise<T>): Promise<T>;
}

export type IngestInput = {
  caseId: string;
  file: Buffer;
  fileName: string;
  tags: PhotoTags;
  uploadedBy: string;
  limits: PhotoLimits;
};

export type IngestResult<Row> = { photo: Row; duplicate: boolean };

export function rowValues(input: IngestInput, p: ProcessedPhoto, keys: PhotoKeys): NewPhotoRow {
  const t = input.tags;
  return {
    caseId: input.caseId,
    sha256: p.sha256,
    contentType: p.contentType,
    bytes: p.bytes,
    width: p.width,
    height: p.height,
    takenAt: p.takenAt,
    fileName: input.fileName.slice(0, 255),
    uploadedBy: input.uploadedBy,
    originalKey: keys.original,
    screenKey: keys.screen,
    thumbKey: keys.thumb,
    component: t.component ?? null,
    row: t.row ?? null,
    clockDeg: t.clockDeg ?? null,
    findingId: t.findingId ?? null,
    caption: t.caption ?? "",
  };
}

export async function ingestPhoto<Row>(
  input: IngestInput,
  deps: { store: PhotoObjectStore; rows: PhotoRowStore<Row> },
): Promise<IngestResult<Row>> {
  // Identical bytes already in the case were checked when they came the first time.
  if (input.file.length > 0 && input.file.length <= input.limits.maxBytes) {
    const known = await deps.rows.findByHash(input.caseId, sha256Hex(input.file));
    if (known) return { photo: known, duplicate: true };
  }
  const processed = await processPhoto(input.file, input.fileName, input.limits);
  const keys = photoKeys(input.caseId, processed.sha256);

  // The bytes go to the store before any database work, so a slow or stalled store never holds a
  // connection or lock. The keys are content-addressed: a concurrent upload of the same file writes
  // the same bytes to the same keys, and whichever row lands first owns them.
  const stored: string[] = [];
  const put = async (key: string, body: Buffer, type: string) => {
    await deps.store.put(key, body, type);
    stored.push(key);
  };
  try {
    // The evidence first; derivatives can always be made again from it.
    await put(keys.original, input.file, processed.contentType);
    const results = await Promise.allSettled([
      put(keys.screen, processed.screen.data, "image/webp"),
      put(keys.thumb, processed.thumb.data, "image/webp"),
    ]);
    const failed = results.find((r): r is PromiseRejectedResult => r.status === "rejected");
    if (failed) throw failed.reason;

    // Then one short transaction: the row, under a lock per (case, file).
    return await deps.rows.exclusive(input.caseId, processed.sha256, async (rows) => {
      const existing = await rows.findByHash(input.caseId, processed.sha256);
      if (existing) return { photo: existing, duplicate: true };
      const photo = await rows.insert(rowValues(input, processed, keys));
      return { photo, duplicate: false };
    });
  } catch (err) {
    // Objects a row already uses (the same file, stored by another upload) stay. Whatever is left
    // behind if this removal fails too, or the process dies first, is found later by the sweeper.
    const owner = await deps.rows.findByHash(input.caseId, processed.sha256).catch(() => "unknown" as const);
    if (owner === null) await deps.store.remove(stored).catch(() => undefined);
    throw err;
  }
}
