// The sweeper: removes photo objects that no row refers to (left by a crash between storing the
// objects and writing the row). Only folders older than the grace period are touched, so an
// ingest still in progress is never swept from under itself.
import { parsePhotoKey, PHOTO_KEY_PREFIX } from "./keys";

export type StoredObject = { key: string; lastModified: Date };

export interface SweepDeps {
  list(prefix: string): AsyncIterable<StoredObject>;
  /** Whether a photo row still uses this case's folder for this digest. */
  rowExists(caseId: string, sha256: string): Promise<boolean>;
  remove(keys: string[]): Promise<void>;
}

export type SweepOptions = { olderThanMinutes: number; now?: Date; dryRun?: boolean };
export type SweepReport = { foldersExamined: number; orphanFolders: number; removedKeys: string[] };

export const DEFAULT_SWEEP_GRACE_MINUTES = 60;

export async function sweepOrphanPhotos(deps: SweepDeps, options: SweepOptions): Promise<SweepReport> {
  const now = options.now ?? new Date();
  const cutoff = now.getTime() - options.olderThanMinutes * 60_000;
  const folders = new Map<string, { caseId: string; sha256: string; keys: string[]; newest: number }>();

  for await (const obj of deps.list(PHOTO_KEY_PREFIX)) {
    const parsed = parsePhotoKey(obj.key);
    if (!parsed) continue; // not laid out like a photo object: not ours to judge
    const id = `${parsed.caseId}/${parsed.sha256}`;
    const folder = folders.get(id) ?? { caseId: parsed.caseId, sha256: parsed.sha256, keys: [], newest: 0 };
    folder.keys.push(obj.key);
    folder.newest = Math.max(folder.newest, obj.lastModified.getTime());
    folders.set(id, folder);
  }

  const report: SweepReport = { foldersExamined: folders.size, orphanFolders: 0, removedKeys: [] };
  for (const folder of folders.values()) {
    if (folder.newest > cutoff) continue;
    if (await deps.rowExists(folder.caseId, folder.sha256)) continue;
    report.orphanFolders++;
    if (!options.dryRun) await deps.remove(folder.keys);
    report.removedKeys.push(...folder.keys);
  }
  return report;
}
