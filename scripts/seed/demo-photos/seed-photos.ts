// Attaches the invented photos to the demo casebook through the app's own ingest: the same checks,
// derivatives, bucket keys, photo rows and history entries an upload gets.
// Needs the object store (S3_* in the environment) and runs under `tsx --conditions=react-server`.
import { and, eq, inArray, sql } from "drizzle-orm";
import type { Db } from "@/db";
import { photoRows } from "@/db/queries/photos";
import { cases, caseEvents, findings, photos, user } from "@/db/schema";
import { ingestPhoto } from "@/lib/photos/ingest";
import { photoLimits } from "@/lib/photos/limits";
import { s3PhotoStore } from "@/lib/photos/object-store";
import { sweepPhotoObjects } from "@/lib/photos/sweep-run";
import { photoTagsSchema } from "@/lib/photos/tags";
import { storageReachable } from "@/lib/storage/s3";
import { DEMO_USERS } from "../demo-people";
import { drawDemoPhoto } from "./draw-photo";
import { planDemoPhotos, type PlanCase, type PlannedPhoto } from "./photo-plan";

export type DemoPhotoResult = { photos: number; cases: number };

/** Throws a message that says what to start when the bucket cannot be reached. */
export async function requireObjectStore(): Promise<void> {
  const where = `${process.env.S3_ENDPOINT ?? "(S3_ENDPOINT not set)"} bucket ${process.env.S3_BUCKET ?? "(S3_BUCKET not set)"}`;
  try {
    await Promise.race([storageReachable(), new Promise((_, reject) => setTimeout(() => reject(new Error("no answer in 5 s")), 5000))]);
  } catch (err) {
    throw new Error(
      `Demo photos need the object store, which did not answer at ${where}: ${(err as Error).message}. ` +
        "Start Tearline through scripts/start.sh (it starts the local store), set S3_* to a reachable bucket, or pass --no-photos.",
    );
  }
}

async function loadCases(db: Db): Promise<PlanCase[]> {
  const caseRows = await db.select({ id: cases.id, number: cases.number, status: cases.status, removedOn: cases.removedOn }).from(cases);
  const found = await db
    .select()
    .from(findings)
    .where(
      inArray(
        findings.caseId,
        caseRows.map((c) => c.id),
      ),
    );
  return caseRows.map((c) => ({
    ...c,
    findings: found.filter((f) => f.caseId === c.id).map((f) => ({ ...f, row: f.row ?? null })),
  }));
}

/** One case's photos. A signed case is read-only, as in the app; the photos were taken at the bench,
 * so the case stands at sign-off while they go in and is signed again after. */
async function ingestCase(db: Db, shots: PlannedPhoto[], uploadedBy: string): Promise<void> {
  const caseId = shots[0].caseId;
  const [{ status }] = await db.select({ status: cases.status }).from(cases).where(eq(cases.id, caseId));
  if (status === "signed") await db.update(cases).set({ status: "signoff" }).where(eq(cases.id, caseId));
  try {
    for (const shot of shots) {
      const file = await drawDemoPhoto(shot.spec);
      const tags = photoTagsSchema.parse(shot.tags);
      const { photo } = await ingestPhoto(
        { caseId, file, fileName: shot.fileName, tags, uploadedBy, limits: photoLimits() },
        { store: s3PhotoStore, rows: photoRows },
      );
      // Dates as if uploaded at the bench: the row and its history entry.
      const label = `${photo.fileName} (${photo.sha256.slice(0, 12)})`;
      await db.update(photos).set({ createdAt: shot.uploadedAt }).where(eq(photos.id, photo.id));
      await db
        .update(caseEvents)
        .set({ at: shot.uploadedAt })
        .where(
          and(
            eq(caseEvents.caseId, caseId),
            eq(caseEvents.action, "photo-added"),
            sql`${caseEvents.changes} @> ${JSON.stringify([{ field: "photo", to: label }])}::jsonb`,
          ),
        );
    }
  } finally {
    if (status === "signed") await db.update(cases).set({ status: "signed" }).where(eq(cases.id, caseId));
  }
}

/** Call requireObjectStore first: this assumes the bucket answers. */
export async function seedDemoPhotos(db: Db, concurrency = 3): Promise<DemoPhotoResult> {
  const analystEmail = DEMO_USERS.find((u) => u.role === "analyst")!.email;
  const [analyst] = await db.select({ id: user.id }).from(user).where(eq(user.email, analystEmail));
  if (!analyst) throw new Error(`demo analyst ${analystEmail} is missing: load the demo people first`);

  const plan = planDemoPhotos(await loadCases(db));
  const grouped = new Map<string, PlannedPhoto[]>();
  for (const p of plan) grouped.set(p.caseId, [...(grouped.get(p.caseId) ?? []), p]);
  const byCase = [...grouped.values()];
  // Two cases at a time: drawing is JavaScript, encoding and storing wait on libvips and the network.
  let next = 0;
  const worker = async () => {
    while (next < byCase.length) await ingestCase(db, byCase[next++], analyst.id);
  };
  await Promise.all([...Array(concurrency)].map(worker));
  return { photos: plan.length, cases: byCase.length };
}

/** After a reset every photo row is gone: the sweeper removes the objects they left, at once. */
export async function removeUnusedPhotoObjects(): Promise<number> {
  const report = await sweepPhotoObjects({ olderThanMinutes: 0 });
  return report.removedKeys.length;
}
