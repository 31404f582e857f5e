// The figures a manager reads first.
import { percent, percentRange } from "@/lib/tallies/labels";
import { outOfControl } from "@/lib/tallies/read-outs";
import type { TalliesData } from "@/lib/tallies/types";

function Tile({ label, value, note, tone = "ink" }: { label: string; value: string; note?: string; tone?: "ink" | "ok" | "danger" }) {
  const colour = tone === "ok" ? "text-ok" : tone === "danger" ? "text-danger" : "text-ink";
  return (
    <div className="rounded-xl border border-line bg-surface p-4">
      <p className="text-xs font-medium uppercase tracking-wide text-muted">{label}</p>
      <p className={`mt-1 text-2xl font-semibold tabular sm:text-3xl ${colour}`}>{value}</p>
      {note ? <p className="mt-0.5 text-xs text-muted">{note}</p> : null}
    </div>
  );
}

export function HeadlineTiles({ data }: { data: TalliesData }) {
  const t = data.totals;
  const o = data.byTrigger.overall;
  const recorded = t.confirmed + t.noDefect;
  // Signals worth a look: months of the last year above a c-chart upper limit, in any series.
  const complete = data.monthly.months.filter((m) => m !== data.monthly.partialMonth);
  const lastYear = new Set(complete.slice(-12));
  const alarms = outOfControl(data.monthly).filter((a) => a.side === "above" && lastYear.has(a.month));
  const n = (x: number) => x.toLocaleString("en-US");
  return (
    <div className="mb-5 grid grid-cols-2 gap-3 lg:grid-cols-5" data-headline>
      <Tile label="Removals" value={n(t.removals)} note="every stage" />
      <Tile label="Signed verdicts" value={n(t.signed)} note={t.removals ? `${percent(t.signed / t.removals)} of removals` : undefined} />
      <Tile
        label="Confirmed at teardown"
        value={percent(o.p)}
        note={o.p === null ? "no outcomes yet" : `95% interval ${percentRange(o.lower, o.upper)} · ${n(recorded)} teardowns`}
        tone="ok"
      />
      <Tile
        label="No defect found"
        value={recorded ? percent(t.noDefect / recorded) : "–"}
        note={`${n(t.noDefect)} removals not confirmed`}
        tone={t.noDefect ? "danger" : "ink"}
      />
      <Tile
        label="Above control limit"
        value={n(alarms.length)}
        note="months over a series' limit, counted once per series, latest 12 months"
        tone={alarms.length ? "danger" : "ink"}
      />
    </div>
  );
}
