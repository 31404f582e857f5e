// One pg-boss per process, started on first use. Every process may send jobs; only a worker
// (lib/jobs/worker.ts: inside the server by default, or `npm run worker`) takes them.
import "server-only";
import PgBoss from "pg-boss";
import { QUEUES } from "./queues";

const holder = globalThis as unknown as { tearlineBoss?: Promise<PgBoss> };

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: process.env.DATABASE_URL, schema: "pgboss", max: 4 });
  boss.on("error", (err: Error) => console.error(`job queue: ${err.message}`));
  await boss.start();
  // A queue that pg-boss already has is kept as it is.
  await boss.createQueue(QUEUES.mailSend, { name: QUEUES.mailSend, policy: "stately" }).catch(() => undefined);
  await boss.createQueue(QUEUES.mailRetry, { name: QUEUES.mailRetry, policy: "standard" }).catch(() => undefined);
  await boss.createQueue(QUEUES.weeklyDigest, { name: QUEUES.weeklyDigest, policy: "standard" }).catch(() => undefined);
  await boss.createQueue(QUEUES.photoSweep, { name: QUEUES.photoSweep, policy: "stately" }).catch(() => undefined);
  return boss;
}

export function getBoss(): Promise<PgBoss> {
  if (!holder.tearlineBoss) {
    const started = startBoss();
    holder.tearlineBoss = started;
    // If the database was down, the next caller tries again instead of inheriting the failure.
    started.catch(() => {
      if (holder.tearlineBoss === started) holder.tearlineBoss = undefined;
    });
  }
  return holder.tearlineBoss;
}

export async function stopBoss(): Promise<void> {
  const boss = await holder.tearlineBoss?.catch(() => undefined);
  holder.tearlineBoss = undefined;
  await boss?.stop({ graceful: true, timeout: 10_000 });
}
