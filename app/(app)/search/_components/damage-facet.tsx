"use client";
// The damage facet with a finder: a shop word or a misspelt name ("rust", "spaling") picks
// out the damage codes it means among those in the results, using the code picker's fuzzy
// search over the stored labels and shop words.
import Link from "next/link";
import { useMemo, useState } from "react";
import { createCodeSearch, type CodeSearchEntry } from "@/lib/classification/code-search";

export type LinkedFacetValue = { value: string; label: string; count: number; selected: boolean; href: string };

const SHOWN = 6;
// Weaker fuzzy hits are other words that merely share letters.
const MIN_SCORE = 0.7;

function Row({ v }: { v: LinkedFacetValue }) {
  return (
    <li>
      <Link
        href={v.href}
        scroll={false}
        aria-current={v.selected ? "true" : undefined}
        data-testid="facet-value"
        className={`flex min-h-10 items-center gap-2.5 rounded-md px-2 py-1.5 text-sm hover:bg-surface-2 lg:min-h-8 ${v.selected ? "font-medium text-ink" : "text-ink-2"}`}
      >
        <span
          aria-hidden
          className={`grid h-4 w-4 shrink-0 place-items-center rounded border ${v.selected ? "border-accent bg-accent text-accent-ink" : "border-line-strong bg-surface"}`}
        >
          {v.selected ? (
            <svg viewBox="0 0 24 24" className="h-3 w-3" fill="none" stroke="currentColor" strokeWidth="3">
              <path d="M5 12l5 5 9-10" />
            </svg>
          ) : null}
        </span>
        <span className="min-w-0 flex-1 truncate" title={v.label}>
          {v.label}
        </span>
        <span className="text-xs tabular text-muted">{v.count.toLocaleString("en-US")}</span>
      </Link>
    </li>
  );
}

export function DamageFacet({ values, entries, chosen }: { values: LinkedFacetValue[]; entries: CodeSearchEntry[]; chosen: number }) {
  const [query, setQuery] = useState("");
  const [all, setAll] = useState(false);
  const search = useMemo(() => createCodeSearch(entries), [entries]);
  const found = useMemo(() => {
    if (!query.trim()) return null;
    const byCode = new Map(values.map((v) => [v.value, v]));
    return search(query, { includeRetired: true, limit: 8 })
      .filter((h) => h.score >= MIN_SCORE)
      .map((h) => ({ hit: h, v: byCode.get(h.entry.code) }));
  }, [query, search, values]);
  if (values.length === 0) return null;
  const list = found ? found.filter((f) => f.v).map((f) => f.v!) : all ? values : values.slice(0, SHOWN);
  const missing = found?.filter((f) => !f.v).map((f) => f.hit.entry.label) ?? [];

  return (
    <section className="border-b border-line py-3">
      <h3 className="mb-1 flex items-center justify-between px-2 text-xs font-semibold uppercase tracking-wide text-muted">
        Damage
        {chosen ? <span className="rounded-full bg-accent-soft px-1.5 text-[11px] text-accent">{chosen}</span> : null}
      </h3>
      {values.length > SHOWN ? (
        <div className="px-2 pb-1">
          <input
            type="search"
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            placeholder="Find: rust, pitting, flaking…"
            aria-label="Find a damage code"
            data-testid="damage-finder"
            className="h-9 w-full rounded-md border border-line-strong bg-surface px-2.5 text-sm text-ink placeholder:text-muted focus:outline-2 focus:outline-accent"
          />
        </div>
      ) : null}
      <ul>
        {list.map((v) => (
          <Row key={v.value} v={v} />
        ))}
      </ul>
      {found && list.length === 0 ? (
        <p className="px-2 py-1 text-xs text-muted">No case here is coded {missing.slice(0, 2).join(" or ") || "that way"}.</p>
      ) : null}
      {!found && values.length > SHOWN ? (
        <button type="button" onClick={() => setAll(!all)} className="px-2 py-1 text-sm text-accent hover:underline">
          {all ? "Fewer" : `${values.length - SHOWN} more`}
        </button>
      ) : null}
    </section>
  );
}
