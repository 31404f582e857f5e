// Retries mail the outbox could not send yet. Started once per server process from instrumentation.ts.
import "server-only";
import { deliverDue } from "./outbox";
import { mailRetryIntervalMs } from "./retry-interval";

const RUNNING = Symbol.for("tearline.mailRetryLoop");
type Holder = { [RUNNING]?: NodeJS.Timeout };


/** Starts the timer unless this process already has one; returns whether it started now. */
export function startMailRetryLoop(intervalMs = mailRetryIntervalMs()): boolean {
  const holder = globalThis as Holder;
  if (holder[RUNNING]) return false;
  let busy = false;
  const timer = setInterval(() => {
    // A slow SMTP server must not stack up overlapping runs.
    if (busy) return;
    busy = true;
    deliverDue()
      .catch((err: unknown) => console.error("mail retry failed:", err instanceof Error ? err.message : err))
      .finally(() => {
        busy = false;
      });
  }, intervalMs);
  timer.unref?.();
  holder[RUNNING] = timer;
  return true;
}

export function stopMailRetryLoop(): void {
  const holder = globalThis as Holder;
  if (holder[RUNNING]) clearInterval(holder[RUNNING]);
  delete holder[RUNNING];
}
