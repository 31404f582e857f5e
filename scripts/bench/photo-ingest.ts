// Median time to ingest one 12-megapixel phone JPEG: checks, SHA-256, upright screen image and
// thumbnail, three objects into the bucket and the row (with its history entry).
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { db, pool } from "@/db";
import { nextCaseNumber } from "@/db/queries/case-number";
import { photoRows } from "@/db/queries/photos";
import { cases, photos, user } from "@/db/schema";
import { ingestPhoto } from "@/lib/photos/ingest";
import { photoLimits } from "@/lib/photos/limits";
import { s3PhotoStore } from "@/lib/photos/object-store";
import { GROWTH_PASS, percentile, record } from "./support/figures";

const RUNS = 7;
const TARGET_S = 1.0;

/** 4000 × 3000 with softened noise: compresses like a phone photo (≈ 5–6 MB), with EXIF and GPS. */
async function twelveMegapixelJpeg(): Promise<Buffer> {
  const noisy = await sharp({
    create: { width: 4000, height: 3000, channels: 3, background: "#000", noise: { type: "gaussian", mean: 120, sigma: 60 } },
  })
    .jpeg({ quality: 92 })
    .toBuffer();
  return sharp(noisy)
    .blur(0.8)
    .jpeg({ quality: 92 })
    .withExif({
      IFD0: { Make: "Bench", Model: "12MP" },
      IFD2: { DateTimeOriginal: "2026:04:02 10:15:00" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "45/1 30/1 0/1" },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

async function freshCase(): Promise<string> {
  const number = await nextCaseNumber(db, 2026);
  const [row] = await db
    .insert(cases)
    .values({ number, status: "bench", serial: `BENCH-${number}` })
    .returning({ id: cases.id });
  return row.id;
}

try {
  // The photo path does not grow with the casebook: timed once, at the full size.
  if (GROWTH_PASS) process.exit(0);
  const file = await twelveMegapixelJpeg();
  const meta = await sharp(file).metadata();
  const [someone] = await db.select({ id: user.id }).from(user).limit(1);
  const limits = photoLimits();
  const once = async () => {
    const caseId = await freshCase(); // a fresh case each run, so the file is never a duplicate
    const started = performance.now();
    const res = await ingestPhoto(
      { caseId, file, fileName: "bench-12mp.jpg", tags: { component: "cup" }, uploadedBy: someone.id, limits },
      { store: s3PhotoStore, rows: photoRows },
    );
    const seconds = (performance.now() - started) / 1000;
    if (res.duplicate) throw new Error("bench run was taken for a duplicate");
    return { seconds, caseId };
  };

  await once(); // warm-up: first sharp call, first bucket and database connections
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) times.push((await once()).seconds);
  console.log(
    `photo ingest: ${meta.width}×${meta.height} JPEG, ${(file.length / 1024 / 1024).toFixed(1)} MB, ${RUNS} runs: ${times.map((t) => t.toFixed(2)).join(" ")} s`,
  );
  record({
    name: "photo ingest, 12-megapixel JPEG",
    runs: RUNS,
    p50: percentile(times, 50),
    p95: percentile(times, 95),
    unit: "s",
    target: TARGET_S,
    targetOn: "p50",
  });
  const n = await db.$count(photos, eq(photos.fileName, "bench-12mp.jpg"));
  if (n < RUNS) throw new Error(`expected ${RUNS + 1} bench photos stored, found ${n}`);
} finally {
  await pool.end();
}
