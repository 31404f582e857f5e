import { COMPONENTS, SEVERITIES } from "@/lib/classification/bearing-parts";
import { zoneLabel } from "@/lib/classification/labels";

// Warmer as it gets worse; the same tokens as the rest of the app, so dark mode follows.
const SEVERITY_TONE = [
  "bg-surface-2 text-ink-2",
  "bg-ok-soft text-ok",
  "bg-warn-soft text-warn",
  "bg-accent-soft text-accent",
  "bg-danger-soft text-danger",
];

export function SeverityScale() {
  return (
    <section id="severity" aria-labelledby="severity-title" className="scroll-mt-28">
      <h2 id="severity-title" className="text-lg font-semibold text-ink">
        Severity scale
      </h2>
      <p className="mt-1 text-sm text-muted">Tearline&apos;s own 0–4 scale, given to each teardown finding.</p>
      <ol className="mt-3 grid gap-2 sm:grid-cols-5">
        {SEVERITIES.map((s) => (
          <li key={s.code} className="flex items-center gap-3 rounded-xl border border-line bg-surface p-3 sm:flex-col sm:items-start">
            <span
              className={`flex h-9 w-9 shrink-0 items-center justify-center rounded-lg text-lg font-semibold tabular ${SEVERITY_TONE[s.code]}`}
            >
              {s.code}
            </span>
            <span className="text-sm font-medium text-ink">{s.label}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}

export function PartList() {
  return (
    <section id="parts" aria-labelledby="parts-title" className="scroll-mt-28">
      <h2 id="parts-title" className="text-lg font-semibold text-ink">
        Parts of the bearing
      </h2>
      <p className="mt-1 text-sm text-muted">
        Each finding names the part it was seen on. Cup and cones carry the raceways the damage map draws.
      </p>
      <ul className="mt-3 grid overflow-hidden rounded-xl border border-line bg-surface sm:grid-cols-2">
        {COMPONENTS.map((c) => (
          <li key={c.code} className="border-b border-line px-4 py-3 sm:odd:border-r">
            <p className="flex flex-wrap items-center gap-2">
              <span className="font-medium text-ink">{c.label}</span>
              <code className="font-mono text-xs text-muted">{c.code}</code>
              {c.hasRaceway ? (
                <span className="rounded-full bg-accent-soft px-2 py-0.5 text-[11px] font-medium text-accent">raceway</span>
              ) : null}
            </p>
            <p className="mt-0.5 text-xs text-muted">Where on it: {c.zones.map((z) => zoneLabel(z)).join(", ")}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}
