// Removes photo objects that no photo row refers to (left by a crash mid-upload).
// Usage: tsx --conditions=react-server scripts/sweep-photos.ts [--older-than=<minutes>] [--dry-run]
// Run it from cron or a scheduler with the app's environment (DATABASE_URL, S3_*).
import { pool } from "@/db";
import { DEFAULT_SWEEP_GRACE_MINUTES } from "@/lib/photos/sweep";
import { sweepPhotoObjects } from "@/lib/photos/sweep-run";

const arg = (name: string) => process.argv.find((a) => a.startsWith(`--${name}`));
const olderRaw = arg("older-than")?.split("=")[1];
const olderThanMinutes = olderRaw === undefined ? DEFAULT_SWEEP_GRACE_MINUTES : Number(olderRaw);
if (!Number.isFinite(olderThanMinutes) || olderThanMinutes < 0) {
  console.error(`--older-than takes a number of minutes, not "${olderRaw}"`);
  process.exit(2);
}
const dryRun = Boolean(arg("dry-run"));

try {
  const report = await sweepPhotoObjects({ olderThanMinutes, dryRun });
  const verb = dryRun ? "would remove" : "removed";
  console.log(
    `photo sweep: ${report.foldersExamined} photo folders examined, ${report.orphanFolders} without a row older than ${olderThanMinutes} min; ${verb} ${report.removedKeys.length} objects`,
  );
  for (const key of report.removedKeys) console.log(`  ${key}`);
} finally {
  await pool.end();
}
