// Runs the photo sweeper once an hour inside the server process (started from instrumentation.ts),
// so objects left by a crash mid-upload do not pile up. scripts/sweep-photos.ts runs it by hand.
import "server-only";
import { sweepPhotoObjects } from "./sweep-run";

const RUNNING = Symbol.for("tearline.photoSweep");
type Holder = { [RUNNING]?: NodeJS.Timeout };
const HOUR_MS = 3600_000;

export function startPhotoSweepSchedule(intervalMs = HOUR_MS): boolean {
  const holder = globalThis as Holder;
  if (holder[RUNNING]) return false;
  let busy = false;
  const timer = setInterval(() => {
    if (busy) return;
    busy = true;
    sweepPhotoObjects()
      .then((r) => {
        if (r.removedKeys.length) console.log(`photo sweep removed ${r.removedKeys.length} objects without a row`);
      })
      .catch((err: unknown) => console.error("photo sweep failed:", err instanceof Error ? err.message : err))
      .finally(() => {
        busy = false;
      });
  }, intervalMs);
  timer.unref?.();
  holder[RUNNING] = timer;
  return true;
}
