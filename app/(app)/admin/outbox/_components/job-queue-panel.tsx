// The background job queue beside the mail: what waits, what runs, what failed and why.
import { Card } from "@/components/ui/card";
import type { QueueState } from "@/lib/admin/outbox-service";
import { QUEUE_LABELS } from "@/lib/jobs/queues";
import { when } from "./when";

export function JobQueuePanel({ states, now }: { states: QueueState[] | null; now: number }) {
  return (
    <Card title="Background jobs">
      {!states ? (
        <p className="text-sm text-muted">The job queue has not started yet; it starts with the first server or worker.</p>
      ) : (
        <>
          <ul className="divide-y divide-line text-sm sm:hidden">
            {states.map((s) => (
              <li key={s.queue} className="py-2.5">
                <div className="flex items-baseline justify-between gap-3">
                  <span className="font-medium text-ink">{QUEUE_LABELS[s.queue]}</span>
                  <span className="text-xs text-muted">last done {when(s.lastDone, now)}</span>
                </div>
                <div className="mt-0.5 text-xs text-ink-2 tabular">
                  {s.waiting} waiting · {s.running} running ·{" "}
                  <span className={s.failed ? "text-danger" : ""}>{s.failed} failed in 7 days</span>
                </div>
                {s.lastError ? <div className="mt-0.5 text-xs text-danger">Last failure: {s.lastError.slice(0, 160)}</div> : null}
              </li>
            ))}
          </ul>
          <div className="hidden overflow-x-auto sm:block">
            <table className="w-full text-sm" data-testid="job-queue">
              <thead className="text-left text-xs uppercase tracking-wide text-muted">
                <tr>
                  <th className="py-2 pr-3 font-medium">Job</th>
                  <th className="py-2 pr-3 text-right font-medium">Waiting</th>
                  <th className="py-2 pr-3 text-right font-medium">Running</th>
                  <th className="py-2 pr-3 text-right font-medium">Failed (7 days)</th>
                  <th className="py-2 font-medium">Last done</th>
                </tr>
              </thead>
              <tbody className="divide-y divide-line">
                {states.map((s) => (
                  <tr key={s.queue}>
                    <td className="py-2 pr-3">
                      <div className="font-medium text-ink">{QUEUE_LABELS[s.queue]}</div>
                      {s.lastError ? <div className="text-xs text-danger">Last failure: {s.lastError.slice(0, 160)}</div> : null}
                    </td>
                    <td className="py-2 pr-3 text-right tabular">{s.waiting}</td>
                    <td className="py-2 pr-3 text-right tabular">{s.running}</td>
                    <td className={`py-2 pr-3 text-right tabular ${s.failed ? "text-danger" : ""}`}>{s.failed}</td>
                    <td className="py-2 text-ink-2">{when(s.lastDone, now)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </Card>
  );
}
