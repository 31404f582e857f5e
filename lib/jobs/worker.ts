// Takes Tearline's background jobs: mail, the weekly digest and the photo sweep. Runs inside each
// server process unless TEARLINE_WORKER=separate, in which case `npm run worker` runs it alone.
// pg-boss hands each job to one worker, and each mail claims its outbox row, so nothing runs twice.
import "server-only";
import { deliverDue } from "@/lib/mail/outbox";
import { sendDigestIfDue } from "@/lib/digest/schedule";
import { sweepPhotoObjects } from "@/lib/photos/sweep-run";
import { getBoss } from "./boss";
import { QUEUES, SCHEDULES } from "./queues";

const holder = globalThis as unknown as { tearlineWorker?: boolean };
const POLL = { pollingIntervalSeconds: 1 };

export async function startJobWorker(): Promise<void> {
  if (holder.tearlineWorker) return;
  holder.tearlineWorker = true;
  try {
    const boss = await getBoss();
    await boss.work(QUEUES.mailSend, POLL, async () => void (await deliverDue()));
    await boss.work(QUEUES.mailRetry, POLL, async () => void (await deliverDue()));
    await boss.work(QUEUES.weeklyDigest, POLL, async () => void (await sendDigestIfDue()));
    await boss.work(QUEUES.photoSweep, POLL, async () => {
      const r = await sweepPhotoObjects();
      if (r.removedKeys.length) console.log(`photo sweep removed ${r.removedKeys.length} objects without a row`);
    });
    for (const s of SCHEDULES) await boss.schedule(s.queue, s.cron, {}, { tz: "UTC" });
  } catch (err) {
    // The database may not be up yet: try again shortly rather than run without jobs.
    holder.tearlineWorker = false;
    console.error(`job worker could not start (${err instanceof Error ? err.message : err}); retrying in 10 s`);
    setTimeout(() => void startJobWorker(), 10_000).unref();
  }
}

export function workerRunsInServer(): boolean {
  return process.env.TEARLINE_WORKER !== "separate";
}
