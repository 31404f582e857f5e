// The case's history: every change, who made it, when, and what it was before.
import { componentLabel } from "./labels";

type Event = { id: string; at: Date; action: string; changes: { field: string; from: unknown; to: unknown }[]; reason: string | null; userName: string | null };

const ACTION_WORDS: Record<string, string> = {
  created: "filed the field report",
  "field-saved": "changed the field report",
  "teardown-saved": "changed the teardown",
  "verdict-saved": "changed the verdict",
  "finding-added": "added a finding",
  "finding-changed": "changed a finding",
  "finding-removed": "removed a finding",
  receive: "marked the bearing received at the lab",
  received: "marked the bearing received at the lab",
  propose: "sent the verdict for sign-off",
  proposed: "sent the verdict for sign-off",
  sign: "signed the verdict",
  signed: "signed the verdict",
  return: "returned the verdict to the bench",
  returned: "returned the verdict to the bench",
  reopen: "reopened the case",
  reopened: "reopened the case",
  linked: "linked a related case",
  unlinked: "unlinked a related case",
};

function show(v: unknown): string {
  if (v === null || v === undefined || v === "") return "∅";
  if (typeof v === "object") return JSON.stringify(v).slice(0, 120);
  return String(v);
}

const HIDDEN = new Set(["fieldCallReasons", "version"]);

export function HistoryList({ events }: { events: Event[] }) {
  return (
    <ol className="relative flex flex-col gap-4 border-l border-line pl-5" data-testid="history">
      {events.map((e) => (
        <li key={e.id} className="relative">
          <span className="absolute -left-[25px] top-1.5 h-2.5 w-2.5 rounded-full border-2 border-surface bg-accent" aria-hidden />
          <p className="text-sm">
            <strong>{e.userName ?? "Someone"}</strong> {ACTION_WORDS[e.action] ?? e.action}
            <time className="ml-2 text-xs text-muted" dateTime={new Date(e.at).toISOString()}>{new Date(e.at).toISOString().slice(0, 16).replace("T", " ")} UTC</time>
          </p>
          {e.reason ? <p className="mt-1 rounded bg-surface-2 px-2 py-1 text-sm italic text-ink-2">“{e.reason}”</p> : null}
          {e.changes.filter((c) => !HIDDEN.has(c.field)).length ? (
            <details className="mt-1 text-xs text-muted">
              <summary className="cursor-pointer">{e.changes.filter((c) => !HIDDEN.has(c.field)).length} field(s)</summary>
              <ul className="mt-1 flex flex-col gap-0.5">
                {e.changes.filter((c) => !HIDDEN.has(c.field)).map((c, i) => (
                  <li key={i} className="break-words">
                    <span className="font-medium text-ink-2">{c.field.startsWith("finding ") ? c.field.replace(/^finding (\S+)/, (_, p) => `finding on ${componentLabel(p).toLowerCase()}`) : c.field}</span>: {show(c.from)} → {show(c.to)}
                  </li>
                ))}
              </ul>
            </details>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
