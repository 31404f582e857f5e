import type { Metadata } from "next";
import Link from "next/link";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { OUTBOX_STATUSES, outboxBoard, type OutboxStatus } from "@/lib/admin/outbox-service";
import { requirePageUser } from "@/lib/auth/session";
import { readFakeMailbox } from "@/lib/mail/fake-mailbox";
import { FakeMailboxPanel } from "./_components/fake-mailbox-panel";
import { JobQueuePanel } from "./_components/job-queue-panel";
import { OutboxTable } from "./_components/outbox-table";
import { RetryButton } from "./_components/retry-button";

export const metadata: Metadata = { title: "Outbox" };
export const dynamic = "force-dynamic";

const FILTER_LABELS: Record<OutboxStatus | "all", string> = { all: "All", pending: "Waiting", failed: "Given up", sent: "Sent" };

export default async function OutboxPage({ searchParams }: { searchParams: Promise<{ status?: string }> }) {
  await requirePageUser("admin:outbox");
  const raw = (await searchParams).status;
  const status = (OUTBOX_STATUSES as readonly string[]).includes(raw ?? "") ? (raw as OutboxStatus) : undefined;
  const [{ rows, counts, jobs }, fake] = await Promise.all([outboxBoard(status), readFakeMailbox()]);
  const total = counts.pending + counts.failed + counts.sent;
  const now = Date.now();

  return (
    <>
      <PageHeader
        title="Outbox"
        subtitle="Every e-mail is stored here before it is sent, in the same save as the step that caused it. The job queue sends it and retries a failed send on its own, waiting longer each time; Retry now sends everything unsent at once."
        actions={<RetryButton unsent={counts.pending + counts.failed} />}
      />
      <div className="flex flex-col gap-5">
        <Card title="Mail">
          <nav aria-label="Filter by status" className="-mt-1 mb-3 flex gap-1 overflow-x-auto text-sm [scrollbar-width:none]">
            {(["all", ...OUTBOX_STATUSES] as const).map((s) => {
              const active = (status ?? "all") === s;
              const n = s === "all" ? total : counts[s];
              return (
                <Link
                  key={s}
                  href={s === "all" ? "/admin/outbox" : `/admin/outbox?status=${s}`}
                  aria-current={active ? "page" : undefined}
                  className={`shrink-0 rounded-md px-2.5 py-1.5 ${active ? "bg-ink text-surface" : "text-ink-2 hover:bg-surface-2"}`}
                >
                  {FILTER_LABELS[s]} <span className="tabular opacity-70">{n}</span>
                </Link>
              );
            })}
          </nav>
          {rows.length ? (
            <OutboxTable rows={rows} now={now} />
          ) : (
            <EmptyState title={status ? `No mail is ${FILTER_LABELS[status].toLowerCase()}.` : "No mail has been sent yet."} />
          )}
          {rows.length === 100 ? <p className="mt-3 text-xs text-muted">Showing the newest 100.</p> : null}
        </Card>
        <JobQueuePanel states={jobs} now={now} />
        {fake ? <FakeMailboxPanel result={fake} now={now} /> : null}
      </div>
    </>
  );
}
