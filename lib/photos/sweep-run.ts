// The sweeper wired to the real bucket and photo table (scripts/sweep-photos.ts runs it).
import "server-only";
import { photoRowExists } from "@/db/queries/photos";
import { listStoredObjects, s3PhotoStore } from "./object-store";
import { DEFAULT_SWEEP_GRACE_MINUTES, sweepOrphanPhotos, type SweepReport } from "./sweep";

export function sweepPhotoObjects(options: { olderThanMinutes?: number; dryRun?: boolean } = {}): Promise<SweepReport> {
  return sweepOrphanPhotos(
    { list: listStoredObjects, rowExists: photoRowExists, remove: s3PhotoStore.remove },
    { olderThanMinutes: options.olderThanMinutes ?? DEFAULT_SWEEP_GRACE_MINUTES, dryRun: options.dryRun },
  );
}
