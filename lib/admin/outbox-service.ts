// What the admin's Outbox page shows: the stored mail (newest 100, by status), the counts per
// status and the state of each background job queue.
import "server-only";
import { jobQueueStates } from "@/db/queries/job-queue";
import { listOutbox, outboxCounts, type OutboxStatus } from "@/db/queries/outbox";

export { OUTBOX_STATUSES, type OutboxRow, type OutboxStatus } from "@/db/queries/outbox";
export type { QueueState } from "@/db/queries/job-queue";

export async function outboxBoard(status?: OutboxStatus) {
  const [rows, counts, jobs] = await Promise.all([listOutbox(status), outboxCounts(), jobQueueStates()]);
  return { rows, counts, jobs };
}
