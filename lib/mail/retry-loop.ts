// Retries mail the outbox could not send yet. Started once per server process from instrumentation.ts.
import "server-only";
import { startBackgroundTimer, stopBackgroundTimer } from "@/lib/background-timer";
import { deliverDue } from "./outbox";
import { mailRetryIntervalMs } from "./retry-interval";

/** Starts the timer unless this process already has one; returns whether it started now. */
export function startMailRetryLoop(intervalMs = mailRetryIntervalMs()): boolean {
  return startBackgroundTimer("mail retry", intervalMs, () => deliverDue());
}

export function stopMailRetryLoop(): void {
  stopBackgroundTimer("mail retry");
}
