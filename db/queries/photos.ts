// Photo rows: the locked insert used by ingest, lists for the case page, tag edits and removal.
// Every change is written to the case history in the same transaction.
import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { caseEvents, cases, findings, photos, type Photo } from "@/db/schema";
import { RowMissing, WriteRefused } from "@/db/refusals";
import type { NewPhotoRow, PhotoRowStore } from "@/lib/photos/ingest";
import type { PhotoTags } from "@/lib/photos/tags";
import { diffFields } from "@/lib/cases/diff";
import { readableCases, type CaseViewer } from "./case-scope";
import { findingLabel } from "@/lib/photos/grouping";

export const SIGNED_REFUSAL =
  "This case is signed and read-only, so its photos cannot be added, changed or deleted. An engineer can reopen it with a reason.";

/** Locks the case, refuses a signed one, and moves its version: a photo is evidence, so a sign-off
 * at the version the engineer saw before this change is refused as stale. */
async function touchOpenCase(tx: Tx, caseId: string, actorId: string) {
  const [c] = await tx.select({ status: cases.status }).from(cases).where(eq(cases.id, caseId)).for("update");
  if (!c) throw new RowMissing("That case");
  if (c.status === "signed") throw new WriteRefused(SIGNED_REFUSAL);
  await tx
    .update(cases)
    .set({ version: sql`${cases.version} + 1`, updatedBy: actorId, updatedAt: new Date() })
    .where(eq(cases.id, caseId));
}

const photoLabel = (p: Pick<Photo, "fileName" | "sha256">) => `${p.fileName || "photo"} (${p.sha256.slice(0, 12)})`;

async function findByHash(tx: Tx | typeof db, caseId: string, sha256: string): Promise<Photo | null> {
  return (
    (
      await tx
        .select()
        .from(photos)
        .where(and(eq(photos.caseId, caseId), eq(photos.sha256, sha256)))
    )[0] ?? null
  );
}

export const photoRows: PhotoRowStore<Photo> = {
  findByHash: (caseId, sha256) => findByHash(db, caseId, sha256),
  exclusive: (caseId, sha256, fn) =>
    db.transaction(async (tx) => {
      // One ingest per (case, file) at a time: a second upload of the same file waits, then finds the row.
      await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${`photo:${caseId}:${sha256}`}, 0))`);
      return fn({
        findByHash: (c, s) => findByHash(tx, c, s),
        insert: async (values: NewPhotoRow) => {
          await touchOpenCase(tx, values.caseId, values.uploadedBy);
          const [row] = await tx.insert(photos).values(values).returning();
          await tx.insert(caseEvents).values({
            caseId: values.caseId,
            userId: values.uploadedBy,
            action: "photo-added",
            changes: [{ field: "photo", from: null, to: photoLabel(row) }],
          });
          return row;
        },
      });
    }),
};

export async function listCasePhotos(caseId: string): Promise<Photo[]> {
  return db.select().from(photos).where(eq(photos.caseId, caseId)).orderBy(asc(photos.takenAt), asc(photos.createdAt));
}

/** A photo with its case's stage and number, only if the viewer may read that case. */
export async function getReadablePhoto(photoId: string, viewer: CaseViewer) {
  const [row] = await db
    .select({
      photo: photos,
      caseRow: { id: cases.id, number: cases.number, status: cases.status, siteId: cases.siteId, createdBy: cases.createdBy },
    })
    .from(photos)
    .innerJoin(cases, eq(cases.id, photos.caseId))
    .where(and(eq(photos.id, photoId), readableCases(viewer)));
  return row ?? null;
}

export async function findingInCase(findingId: string, caseId: string): Promise<boolean> {
  const [f] = await db
    .select({ id: findings.id })
    .from(findings)
    .where(and(eq(findings.id, findingId), eq(findings.caseId, caseId)));
  return Boolean(f);
}

export async function updatePhotoTags(photoId: string, tags: PhotoTags, actorId: string): Promise<Photo> {
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(photos).where(eq(photos.id, photoId)).for("update");
    if (!before) throw new RowMissing("That photo");
    const changes = diffFields(before as Record<string, unknown>, tags as Record<string, unknown>).map((c) => ({
      ...c,
      field: `photo ${photoLabel(before)}: ${c.field}`,
    }));
    if (!changes.length) return before;
    await touchOpenCase(tx, before.caseId, actorId);
    const [after] = await tx.update(photos).set(tags).where(eq(photos.id, photoId)).returning();
    await tx.insert(caseEvents).values({ caseId: before.caseId, userId: actorId, action: "photo-tagged", changes });
    return after;
  });
}

/** Deletes the row (the objects go after it, by the caller); refuses on a signed case. */
export async function deletePhotoRow(photoId: string, actorId: string): Promise<Photo> {
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(photos).where(eq(photos.id, photoId)).for("update");
    if (!before) throw new RowMissing("That photo");
    await touchOpenCase(tx, before.caseId, actorId);
    await tx.delete(photos).where(eq(photos.id, photoId));
    await tx.insert(caseEvents).values({
      caseId: before.caseId,
      userId: actorId,
      action: "photo-removed",
      changes: [{ field: "photo", from: photoLabel(before), to: null }],
    });
    return before;
  });
}

/** The case's findings as the photo tag picker names them. */
export async function findingOptions(caseId: string): Promise<{ id: string; label: string }[]> {
  const rows = await db.select().from(findings).where(eq(findings.caseId, caseId)).orderBy(asc(findings.createdAt));
  return rows.map((f) => ({ id: f.id, label: findingLabel(f) }));
}

export async function photoRowExists(caseId: string, sha256: string): Promise<boolean> {
  const [r] = await db
    .select({ id: photos.id })
    .from(photos)
    .where(and(eq(photos.caseId, caseId), eq(photos.sha256, sha256)));
  return Boolean(r);
}
