import { Badge } from "@/components/ui/badge";
import { Card, EmptyState } from "@/components/ui/card";
import type { FakeMessage } from "@/lib/mail/fake-mailbox";
import { when } from "./when";

/** What the local mail fake accepted, newest first, each opening to the message as it would look. */
export function FakeMailboxPanel({
  result,
  now,
}: {
  result: { messages: FakeMessage[]; refusing: boolean } | { error: string };
  now: number;
}) {
  return (
    <Card
      title="Test mailbox: mail caught on this installation, never delivered"
      action={"refusing" in result && result.refusing ? <Badge tone="warn">Refusing mail (test mode)</Badge> : null}
    >
      <p className="mb-3 text-sm text-muted">
        In development and tests, mail goes to a local stand-in for an SMTP server instead of real inboxes. These are the latest messages it
        accepted.
      </p>
      {"error" in result ? (
        <p role="alert" className="rounded-lg bg-danger-soft px-3 py-2 text-sm text-danger">
          Cannot show them: {result.error}.
        </p>
      ) : result.messages.length === 0 ? (
        <EmptyState title="The test mailbox has caught no mail yet." />
      ) : (
        <ul className="divide-y divide-line rounded-lg border border-line" data-testid="fake-mailbox">
          {result.messages.map((m) => (
            <li key={m.id}>
              <details className="group">
                <summary className="flex cursor-pointer list-none items-start justify-between gap-3 px-3 py-2.5 hover:bg-surface-2">
                  <span className="min-w-0">
                    <span className="block font-medium leading-snug">{m.subject || "(no subject)"}</span>
                    <span className="block break-all text-xs text-muted">to {m.to.join(", ")}</span>
                  </span>
                  <span className="flex shrink-0 items-center gap-2 text-xs text-muted tabular">
                    {when(m.receivedAt, now)}
                    <span aria-hidden className="transition group-open:rotate-90">
                      ›
                    </span>
                  </span>
                </summary>
                <div className="border-t border-line bg-surface-2 p-3">
                  {m.html ? (
                    <iframe
                      title={`Preview of ${m.subject}`}
                      sandbox=""
                      srcDoc={m.html}
                      className="h-[28rem] w-full rounded-md border border-line bg-white"
                    />
                  ) : null}
                  <details className="mt-2">
                    <summary className="cursor-pointer text-xs font-medium text-ink-2">Plain-text part</summary>
                    <pre className="mt-2 max-h-72 overflow-auto whitespace-pre-wrap rounded-md border border-line bg-surface p-3 text-xs">
                      {m.text}
                    </pre>
                  </details>
                </div>
              </details>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
