// Photo operations as routes and pages call them: who may touch which case, then ingest,
// tag and remove with the real bucket and database.
import "server-only";
import {
  deletePhotoRow,
  findingInCase,
  findingOptions,
  getReadablePhoto,
  listCasePhotos,
  photoRowExists,
  photoRows,
  SIGNED_REFUSAL,
  updatePhotoTags,
} from "@/db/queries/photos";
import type { Case, Photo } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import { badRequest, conflict, forbidden, notFound } from "@/lib/http/errors";
import { ingestPhoto } from "./ingest";
import { photoLimits } from "./limits";
import { mayDeletePhoto } from "./rules";
import { s3PhotoStore } from "./object-store";
import type { PhotoTags } from "./tags";

/** Photos of a signed case are evidence under a signature: refused until an engineer reopens it. */
export function assertPhotosOpen(c: Pick<Case, "status">): void {
  if (c.status === "signed") throw conflict(SIGNED_REFUSAL);
}

/** The photos of a case already loaded as readable by the caller. */
export async function photosOfCase(c: Pick<Case, "id">): Promise<Photo[]> {
  return listCasePhotos(c.id);
}

/** The findings of a readable case, for the photo tag picker. */
export async function findingChoices(c: Pick<Case, "id">): Promise<{ id: string; label: string }[]> {
  return findingOptions(c.id);
}

/** A photo with its case, or null when it does not exist or the user may not see its case. */
export async function findReadablePhoto(photoId: string, user: CurrentUser) {
  return /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(photoId) ? getReadablePhoto(photoId, user) : null;
}

/** As findReadablePhoto, for routes: others answer as if it did not exist. */
export async function loadReadablePhoto(photoId: string, user: CurrentUser) {
  const hit = await findReadablePhoto(photoId, user);
  if (!hit) throw notFound("That photo");
  return hit;
}

async function checkFinding(tags: PhotoTags, caseId: string) {
  if (tags.findingId && !(await findingInCase(tags.findingId, caseId)))
    throw badRequest("That finding belongs to another case; choose one of this case's findings.");
}

export async function uploadPhoto(c: Case, file: { bytes: Buffer; name: string }, tags: PhotoTags, user: CurrentUser) {
  await checkFinding(tags, c.id);
  return ingestPhoto(
    { caseId: c.id, file: file.bytes, fileName: file.name, tags, uploadedBy: user.id, limits: photoLimits() },
    { store: s3PhotoStore, rows: photoRows },
  );
}

export async function retagPhoto(photoId: string, tags: PhotoTags, user: CurrentUser): Promise<Photo> {
  const { photo, caseRow } = await loadReadablePhoto(photoId, user);
  if (caseRow.status === "signed") throw conflict(SIGNED_REFUSAL);
  await checkFinding(tags, photo.caseId);
  return updatePhotoTags(photo.id, tags, user.id);
}

export async function removePhoto(photoId: string, user: CurrentUser): Promise<Photo> {
  const { photo, caseRow } = await loadReadablePhoto(photoId, user);
  if (caseRow.status === "signed") throw conflict(SIGNED_REFUSAL);
  if (!mayDeletePhoto(user, photo, caseRow.status)) {
    throw forbidden("You can delete only photos you uploaded yourself; ask the lab to remove this one.");
  }
  const removed = await deletePhotoRow(photo.id, user.id);
  // The same file may have been uploaded again meanwhile; then its objects belong to the new row.
  if (!(await photoRowExists(removed.caseId, removed.sha256))) {
    await s3PhotoStore.remove([removed.originalKey, removed.screenKey, removed.thumbKey]).catch((err) => {
      console.error(`photo objects left for the sweeper: ${(err as Error).message}`);
    });
  }
  return removed;
}
