// Runs the photo sweeper once an hour inside the server process (started from instrumentation.ts),
// so objects left by a crash mid-upload do not pile up. scripts/sweep-photos.ts runs it by hand.
import "server-only";
import { startBackgroundTimer } from "@/lib/background-timer";
import { sweepPhotoObjects } from "./sweep-run";

const HOUR_MS = 3600_000;

export function startPhotoSweepSchedule(intervalMs = HOUR_MS): boolean {
  return startBackgroundTimer("photo sweep", intervalMs, async () => {
    const r = await sweepPhotoObjects();
    if (r.removedKeys.length) console.log(`photo sweep removed ${r.removedKeys.length} objects without a row`);
  });
}
