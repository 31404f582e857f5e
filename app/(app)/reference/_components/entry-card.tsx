import { Badge } from "@/components/ui/badge";
import type { RefEntry } from "./types";

const LIST_TAG: Record<RefEntry["list"], string> = { damage: "Damage", cause: "Root cause", trigger: "Trigger" };

/** One code as people read it: the name, what it looks like or means, and the words shops use for it. */
export function EntryCard({ entry, matched, showList = false }: { entry: RefEntry; matched?: string; showList?: boolean }) {
  return (
    <article
      id={`code-${entry.code}`}
      className={`flex h-full flex-col gap-2 rounded-xl border p-4 ${entry.retired ? "border-dashed border-line-strong bg-surface-2 text-muted" : "border-line bg-surface"}`}
      data-testid={`ref-${entry.list}-${entry.code}`}
    >
      <header className="flex flex-wrap items-start justify-between gap-x-3 gap-y-1">
        <h3 className={`font-semibold leading-snug ${entry.retired ? "text-muted" : "text-ink"}`}>{entry.label}</h3>
        <span className="flex items-center gap-1.5">
          {showList ? <Badge>{LIST_TAG[entry.list]}</Badge> : null}
          {entry.retired ? <Badge tone="warn">Retired</Badge> : null}
        </span>
      </header>
      <code className="-mt-1 font-mono text-xs text-muted">{entry.code}</code>
      {entry.description ? (
        <p className="text-sm leading-relaxed text-ink-2">
          {entry.list === "damage" ? <span className="font-medium text-ink">Looks like: </span> : null}
          {entry.description}
        </p>
      ) : null}
      {entry.isoMode ? <p className="text-xs text-muted">ISO 15243:2017 mode: {entry.isoMode}</p> : null}
      {matched ? <p className="text-xs font-medium text-accent">Matched “{matched}”</p> : null}
      {entry.synonyms.length ? (
        <div className="mt-auto pt-1">
          <p className="sr-only">Shop words</p>
          <ul className="flex flex-wrap gap-1.5">
            {entry.synonyms.map((s) => (
              <li
                key={s}
                className={`rounded-full px-2 py-0.5 text-xs ring-1 ${s === matched ? "bg-accent-soft text-accent ring-accent/40" : "bg-surface-2 text-ink-2 ring-line"}`}
              >
                {s}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </article>
  );
}
