import { Badge } from "@/components/ui/badge";
import type { RefEntry } from "./types";

/** Root causes or triggers: a compact two-column list of label, code and meaning. */
export function SimpleList({ id, title, intro, entries }: { id: string; title: string; intro: string; entries: RefEntry[] }) {
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="scroll-mt-28">
      <h2 id={`${id}-title`} className="text-lg font-semibold text-ink">
        {title}
      </h2>
      <p className="mt-1 text-sm text-muted">{intro}</p>
      <dl className="mt-3 grid overflow-hidden rounded-xl border border-line bg-surface sm:grid-cols-2">
        {entries.map((e) => (
          <div
            key={e.code}
            className={`border-b border-line px-4 py-3 sm:odd:border-r ${e.retired ? "bg-surface-2 text-muted" : ""}`}
            data-testid={`ref-${e.list}-${e.code}`}
          >
            <dt className="flex flex-wrap items-center gap-2">
              <span className={`font-medium ${e.retired ? "text-muted" : "text-ink"}`}>{e.label}</span>
              <code className="font-mono text-xs text-muted">{e.code}</code>
              {e.retired ? <Badge tone="warn">Retired</Badge> : null}
            </dt>
            {e.description ? <dd className="mt-0.5 text-sm text-ink-2">{e.description}</dd> : null}
          </div>
        ))}
      </dl>
    </section>
  );
}
