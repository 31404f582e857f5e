// The job queue as the admin Outbox page shows it, read straight from pg-boss's tables.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { QUEUES, type QueueName } from "@/lib/jobs/queues";

export type QueueState = {
  queue: QueueName;
  waiting: number;
  running: number;
  failed: number;
  lastDone: Date | null;
  lastError: string | null;
};

export async function jobQueueStates(): Promise<QueueState[] | null> {
  const { rows: exists } = await db.execute<{ t: string | null }>(sql`select to_regclass('pgboss.job')::text as t`);
  if (!exists[0]?.t) return null; // the queue has not started yet
  const { rows } = await db.execute<{
    name: string;
    waiting: number;
    running: number;
    failed: number;
    last_done: string | null;
    last_error: string | null;
  }>(sql`
    select name,
      count(*) filter (where state in ('created', 'retry'))::int as waiting,
      count(*) filter (where state = 'active')::int as running,
      count(*) filter (where state = 'failed' and completed_on > now() - interval '7 days')::int as failed,
      max(completed_on) filter (where state = 'completed')::text as last_done,
      (array_agg(output->>'message' order by completed_on desc) filter (where state = 'failed'))[1] as last_error
    from pgboss.job
    where name = any(${sql.param(Object.values(QUEUES))}::text[])
    group by name`);
  return Object.values(QUEUES).map((queue) => {
    const r = rows.find((x) => x.name === queue);
    return {
      queue,
      waiting: r?.waiting ?? 0,
      running: r?.running ?? 0,
      failed: r?.failed ?? 0,
      lastDone: r?.last_done ? new Date(r.last_done) : null,
      lastError: r?.last_error ?? null,
    };
  });
}
