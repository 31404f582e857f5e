// The case's history: every change, who made it, when, and what it was before.
import { componentLabel } from "@/lib/classification/labels";
import { formatMoment } from "@/lib/dates";

type Event = {
  id: string;
  at: Date;
  action: string;
  changes: { field: string; from: unknown; to: unknown }[];
  reason: string | null;
  userName: string | null;
};

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
  "photo-added": "added a photo",
  "photo-removed": "removed a photo",
  "photo-tagged": "tagged a photo",
};

/** A step not listed above still reads as words: "photo-moved" → "photo moved". */
export const actionWords = (action: string) => ACTION_WORDS[action] ?? action.replace(/[-_]/g, " ");

// Stored field names as people say them; anything else is split from camelCase.
const FIELD_WORDS: Record<string, string> = {
  status: "stage",
  primaryCause: "primary cause",
  contributingCauses: "contributing causes",
  removalConfirmed: "removal",
  signedBy: "signed by",
  signedAt: "signed at",
  signedMeaning: "signature meaning",
  signedContentHash: "signed content (SHA-256)",
  proposedBy: "proposed by",
  proposedAt: "proposed at",
  receivedBy: "received by",
  receivedAt: "received at",
  returnReason: "reason returned",
};

export function fieldWords(field: string): string {
  if (field.startsWith("finding ")) return field.replace(/^finding (\S+)/, (_, p) => `finding on ${componentLabel(p).toLowerCase()}`);
  return FIELD_WORDS[field] ?? field.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();
}

const changeCount = (n: number) => (n === 1 ? "1 change" : `${n} changes`);

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
            <strong>{e.userName ?? "Someone"}</strong> {actionWords(e.action)}
            <time className="ml-2 inline-block whitespace-nowrap text-xs text-muted" dateTime={new Date(e.at).toISOString()}>
              {formatMoment(e.at)}
            </time>
          </p>
          {e.reason ? <p className="mt-1 rounded bg-surface-2 px-2 py-1 text-sm italic text-ink-2">“{e.reason}”</p> : null}
          {e.changes.filter((c) => !HIDDEN.has(c.field)).length ? (
            <details className="mt-1 text-xs text-muted">
              <summary className="flex min-h-11 cursor-pointer items-center lg:min-h-0">
                {changeCount(e.changes.filter((c) => !HIDDEN.has(c.field)).length)}
              </summary>
              <ul className="mt-1 flex flex-col gap-0.5">
                {e.changes
                  .filter((c) => !HIDDEN.has(c.field))
                  .map((c, i) => (
                    <li key={i} className="break-words">
                      <span className="font-medium text-ink-2">{fieldWords(c.field)}</span>: {show(c.from)} → {show(c.to)}
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
